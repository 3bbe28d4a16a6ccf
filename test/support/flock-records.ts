// Flock and demand records on a given site for the role matrix: houses, flocks, vaccinations, planned transfers.
import { PlannedTransfer, Site } from '../../database/models/index.js';
import { createFlock, createHouse, createPresentation, createProduct, createSiteFridge, createVaccination, siteDay, stockLot } from './flock-fixtures.js';

type RecordMaker = (siteId: number) => Promise<number>;

const site = async (siteId: number) => (await Site.findByPk(siteId))!;

async function makeHouse(siteId: number): Promise<number> {
  return (await createHouse(await site(siteId))).id;
}

async function makeFlock(siteId: number): Promise<number> {
  return (await createFlock(await createHouse(await site(siteId)))).id;
}

async function makeVaccination(siteId: number): Promise<number> {
  const flock = await createFlock(await createHouse(await site(siteId)));
  return (await createVaccination(flock, await createProduct(), siteDay(await site(siteId), 10))).id;
}

/** A transfer into the given site, from a second site made for it. */
async function makeTransfer(siteId: number): Promise<number> {
  const to = await site(siteId);
  const from = await Site.create({ code: `S${String(Date.now() % 100000)}`, name: 'Lending site', timeZone: to.timeZone });
  const lot = await stockLot(await createSiteFridge(from), await createPresentation(await createProduct(), 1000), 5, siteDay(to, 200));
  const transfer = await PlannedTransfer.create({ lotId: lot.id, fromSiteId: from.id, toSiteId: to.id, vials: 2, plannedOn: siteDay(to, 3), createdBy: null });
  return transfer.id;
}

export const flockRecordMakers: Record<string, RecordMaker> = {
  houseId: makeHouse,
  flockId: makeFlock,
  vaccinationId: makeVaccination,
  transferId: makeTransfer,
};
