// The invented demo company: a layer farm business with two sites in different time zones, houses, fridges, one user per role.
import type { Sequelize } from 'sequelize';
import type { Role } from '../../shared/auth/roles.js';
import { Fridge, House, Site, User, UserSite } from '../models/index.js';
import { seedDemoReceiving } from './demo-receiving.js';
import { seedDemoFridgeLogs } from './demo-fridge-logs.js';
import { seedDemoFlocks } from './demo-flocks.js';
import { seedDemoReview } from './demo-review.js';
import { seedDemoVaccinationDay } from './demo-vaccination-day.js';

export interface DemoAccount {
  email: string;
  name: string;
  roles: Role[];
  /** Demo only: these passwords are published in the README. */
  password: string;
  siteCodes?: string[];
}

export const demoAccounts: DemoAccount[] = [
  { email: 'admin@larkmoor.example', name: 'Dana Whitlock', roles: ['admin'], password: 'admin-demo-passphrase' },
  { email: 'receiving@larkmoor.example', name: 'Ravi Okafor', roles: ['receiving'], password: 'receiving-demo-passphrase', siteCodes: ['LKN'] },
  { email: 'storage@larkmoor.example', name: 'Greta Lindqvist', roles: ['storage'], password: 'storage-demo-passphrase' },
  { email: 'purchasing@larkmoor.example', name: 'Tomas Reyes', roles: ['purchasing'], password: 'purchasing-demo-passphrase' },
  { email: 'vet@larkmoor.example', name: 'Dr. Imani Castell', roles: ['veterinarian'], password: 'veterinarian-demo-passphrase' },
  { email: 'crew@larkmoor.example', name: 'Joel Brandt', roles: ['crew'], password: 'crew-lead-demo-passphrase' },
];

const sites = [
  { code: 'LKN', name: 'Larkmoor North (layers)', timeZone: 'America/Chicago' },
  { code: 'FCP', name: 'Fennel Creek (pullets)', timeZone: 'America/Denver' },
];

const houses: { site: string; name: string; housing: 'cage' | 'aviary' | 'floor' }[] = [
  { site: 'LKN', name: 'House 1', housing: 'cage' },
  { site: 'LKN', name: 'House 2', housing: 'cage' },
  { site: 'LKN', name: 'House 3', housing: 'aviary' },
  { site: 'FCP', name: 'Pullet barn A', housing: 'floor' },
  { site: 'FCP', name: 'Pullet barn B', housing: 'floor' },
];

const fridges = [
  { site: 'LKN', code: 'LKN-F1', name: 'Vaccine room fridge', place: 'Service building, vaccine room' },
  { site: 'LKN', code: 'LKN-F2', name: 'Office backup fridge', place: 'Farm office' },
  { site: 'FCP', code: 'FCP-F1', name: 'Brooder office fridge', place: 'Brooder office' },
  { site: 'FCP', code: 'FCP-F2', name: 'Shop fridge', place: 'Workshop, north wall' },
];

/** Seeds the demo company when the database has no users yet; returns whether it seeded. */
export async function seedDemoScenario(sequelize: Sequelize, hash: (password: string) => Promise<string>): Promise<boolean> {
  if ((await User.count()) > 0) return false;
  const hashes = await Promise.all(demoAccounts.map((account) => hash(account.password)));
  await sequelize.transaction(async (transaction) => {
    const siteIds = new Map<string, number>();
    for (const site of sites) siteIds.set(site.code, (await Site.create(site, { transaction })).id);
    for (const house of houses) {
      await House.create({ siteId: siteIds.get(house.site)!, name: house.name, housing: house.housing }, { transaction });
    }
    for (const fridge of fridges) {
      await Fridge.create({ siteId: siteIds.get(fridge.site)!, code: fridge.code, name: fridge.name, place: fridge.place }, { transaction });
    }
    for (const [index, account] of demoAccounts.entries()) {
      const user = await User.create(
        { email: account.email, name: account.name, roles: account.roles, passwordHash: hashes[index], allSites: !account.siteCodes },
        { transaction },
      );
      for (const code of account.siteCodes ?? []) {
        await UserSite.create({ userId: user.id, siteId: siteIds.get(code)! }, { transaction });
      }
    }
    await seedDemoReceiving(transaction);
    await seedDemoFlocks(transaction);
    await seedDemoVaccinationDay(transaction);
  });
  await seedDemoFridgeLogs(sequelize);
  await seedDemoReview(sequelize);
  return true;
}
