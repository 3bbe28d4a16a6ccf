// A vaccination day ready to run: a site with a fridge and a lot of a spray vaccine, a flock with a confirmed vaccination today, a crew lead.
import { Presentation, Product, type Site, type Lot, type Fridge, type Vaccination } from '../../database/models/index.js';
import { gs1CheckDigit } from '../../shared/barcode/gs1-check-digit.js';
import { createFlock, createHouse, createPresentation, createProduct, createSiteFridge, createVaccination, siteDay, stockLot } from './flock-fixtures.js';
import { createSite, signInAs, type SignedIn } from './test-app.js';
import type { User } from '../../database/models/index.js';

let gtinSeq = 100;

/** A valid 14-digit GTIN made for tests. */
export function testGtin(): string {
  const body = `0950600${String(gtinSeq++).padStart(6, '0')}`;
  return body + gs1CheckDigit(body);
}

export interface DaySetup {
  site: Site;
  fridge: Fridge;
  product: Product;
  presentation: Presentation;
  gtin: string;
  lot: Lot;
  vaccination: Vaccination;
  lead: SignedIn & { user: User };
}

export async function setUpDay(options: { code?: string; site?: Site; vials?: number; birds?: number; hatchDays?: number; timeOutLimitMinutes?: number | null; lead?: SignedIn & { user: User } } = {}): Promise<DaySetup> {
  const site = options.site ?? (await createSite(options.code ?? 'NORTH'));
  const fridge = await createSiteFridge(site);
  const product = await createProduct();
  await product.update({ useWithinMinutes: 60, timeOutLimitMinutes: options.timeOutLimitMinutes === undefined ? 120 : options.timeOutLimitMinutes });
  const presentation = await createPresentation(product, 1000);
  const gtin = testGtin();
  await presentation.update({ packGtin: gtin });
  const lot = await stockLot(fridge, presentation, options.vials ?? 30, siteDay(site, 200));
  const flock = await createFlock(await createHouse(site, 'House 1'), { birds: options.birds ?? 9_500, hatchDays: options.hatchDays ?? -100, placementDays: (options.hatchDays ?? -100) + 1 });
  const vaccination = await createVaccination(flock, product, siteDay(site, 0), 'confirmed');
  const lead = options.lead ?? (await signInAs(['crew'], [site]));
  const crew = await lead.agent.post('/api/vaccination-day/crews').set('X-XSRF-TOKEN', lead.csrf).send({ siteId: site.id, day: siteDay(site, 0), leadId: lead.user.id, memberIds: [] });
  if (crew.status !== 200) throw new Error(`crew assignment failed: ${JSON.stringify(crew.body)}`);
  return { site, fridge, product, presentation, gtin, lot, vaccination, lead };
}

const allTrue = (keys: string[]) => Object.fromEntries(keys.map((k) => [k, true]));

/** Records every readiness check as passed for the lead (the only crew member) and the vaccination. */
export async function passAllChecks(day: DaySetup): Promise<void> {
  const { lead, vaccination, site } = day;
  const post = (path: string, body: object) => lead.agent.post(`/api/vaccination-day/vaccinations/${vaccination.id}/${path}`).set('X-XSRF-TOKEN', lead.csrf).send(body);
  const member = (kind: string, answers: object) => post('member-checks', { day: siteDay(site, 0), memberId: lead.user.id, kind, answers });
  const results = [
    await member('twelve_hour', { visits: [] }),
    await member('hygiene', allTrue(['showered', 'cleanClothes', 'bootsSanitized'])),
    await member('ppe', allTrue(['hairnet', 'mask', 'eyeProtection', 'gloves', 'longSleeves', 'boots'])),
    await post('checks', { kind: 'flock_health', answers: { healthy: true } }),
    await post('checks', { kind: 'withdrawal', answers: {} }),
    await post('checks', { kind: 'water_treatments', answers: { suspended: true } }),
    await post('checks', { kind: 'heat', answers: { expectedTemperature: { value: 70, unit: 'F' } } }),
    await post('checks', { kind: 'battery', answers: { charged: true } }),
    await post('checks', { kind: 'enough_vaccine', answers: { equipmentAssembled: true } }),
  ];
  for (const r of results) if (r.status !== 201) throw new Error(`check failed: ${r.status} ${JSON.stringify(r.body)}`);
}

export async function startDay(day: DaySetup): Promise<void> {
  await passAllChecks(day);
  const started = await day.lead.agent.post(`/api/vaccination-day/vaccinations/${day.vaccination.id}/start`).set('X-XSRF-TOKEN', day.lead.csrf).send({});
  if (started.status !== 200) throw new Error(`start failed: ${JSON.stringify(started.body)}`);
}
