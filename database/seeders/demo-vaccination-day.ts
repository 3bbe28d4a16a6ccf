// Invented vaccination-day data for the demo: today the crew lead has a spray vaccination on each site, water volumes are
// entered, the sites have a heat limit, and one pullet flock has a finished, signed vaccination from a past day.
import { DateTime } from 'luxon';
import { QueryTypes, type Transaction } from 'sequelize';
import { addDays } from '../../shared/planning/iso-date.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { recordSignatureMeaning } from '../../api/vaccination-day/record-service.js';
import { Flock, Fridge, House, Lot, Product, ProgrammeStep, Site, StockMovement, User, Vaccination } from '../models/index.js';

const ND = 'Meadowline ND spray';
const IB = 'Fernhollow IB drinking-water vaccine';

/** Entered water per 1,000 birds (invented demo values, each said to come from the label or the veterinarian). */
const waterVolumes = [
  { product: ND, from: 0, to: 42, ml: 250, source: 'label', note: 'Coarse spray, chicks and young pullets (demo label).' },
  { product: ND, from: 43, to: 1050, ml: 500, source: 'veterinarian', note: 'Older birds in cages and aviaries: more water for an even coat.' },
  { product: IB, from: 0, to: 35, ml: 9000, source: 'label', note: 'Drinking water taken within two hours (demo label).' },
] as const;

export async function seedDemoVaccinationDay(transaction: Transaction): Promise<void> {
  const sequelize = Site.sequelize!;
  const q = (sql: string, replacements: Record<string, unknown>) => sequelize.query(sql, { replacements, transaction, type: QueryTypes.SELECT }) as Promise<{ id: number }[]>;
  const vet = (await User.findOne({ where: { email: 'vet@larkmoor.example' }, transaction }))!;
  const lead = (await User.findOne({ where: { email: 'crew@larkmoor.example' }, transaction }))!;
  const admin = (await User.findOne({ where: { email: 'admin@larkmoor.example' }, transaction }))!;
  const product = async (name: string) => (await Product.findOne({ where: { name }, transaction }))!;
  const nd = await product(ND);
  const sites = new Map((await Site.findAll({ transaction })).map((s) => [s.code, s]));
  const today = (code: string) => siteLocalDate(new Date(), sites.get(code)!.timeZone);
  const flock = async (name: string) => (await Flock.findOne({ where: { name }, transaction }))!;

  // The heat limits (°F) the sites chose with their veterinarian.
  for (const [code, limit] of [['LKN', 86], ['FCP', 82]] as const) {
    const site = sites.get(code)!;
    await site.update({ settings: { ...site.settings, sprayHeatLimitF: limit } }, { transaction });
  }

  for (const w of waterVolumes) {
    await q(
      `INSERT INTO water_volumes (product_id, age_from_days, age_to_days, ml_per_1000_birds, source, note, entered_by, entered_at)
       VALUES (:productId, :from, :to, :ml, :source, :note, :by, now() - interval '30 days') RETURNING id`,
      { productId: (await product(w.product)).id, from: w.from, to: w.to, ml: w.ml, source: w.source, note: w.note, by: vet.id },
    );
  }

  // Today, Larkmoor North: the 18-week spray booster of House 3, as the programme planned it, confirmed by the veterinarian.
  const layers = await flock('H3-2026A');
  const booster = (await Vaccination.findOne({ where: { flockId: layers.id, productId: nd.id, plannedDate: today('LKN') }, transaction }))!;
  await booster.update({ status: 'confirmed', confirmedBy: vet.id, confirmedAt: new Date() }, { transaction });
  // Today, Fennel Creek: a spray the veterinarian added by hand for barn A, in place of the 14-day one postponed.
  const pullets = await flock('PA-2026-03');
  await Vaccination.create(
    { flockId: pullets.id, programmeStepId: null, productId: nd.id, route: 'spray', plannedDate: today('FCP'), notes: 'Added by the veterinarian: catch-up for the postponed 14-day spray; field challenge reported nearby.', status: 'confirmed', confirmedBy: vet.id, confirmedAt: new Date(), createdBy: vet.id },
    { transaction },
  );
  await postponedPulletSteps(transaction, { vet, pullets, today: today('FCP'), zone: sites.get('FCP')!.timeZone });
  for (const code of ['LKN', 'FCP']) {
    await q('INSERT INTO crew_assignments (site_id, day, lead_id, assigned_by) VALUES (:siteId, :day, :leadId, :by) RETURNING id', { siteId: sites.get(code)!.id, day: today(code), leadId: lead.id, by: vet.id });
  }

  await seedPastRecord(transaction, { q, lead, admin, pullets, fcp: sites.get('FCP')!, day: addDays(today('FCP'), -20) });
}

/** The generated vaccination of a flock's programme step, found by product and age. */
async function stepVaccination(transaction: Transaction, flock: Flock, productName: string, ageValue: number, ageUnit: 'days' | 'weeks'): Promise<Vaccination> {
  const product = (await Product.findOne({ where: { name: productName }, transaction }))!;
  const step = (await ProgrammeStep.findOne({ where: { programmeId: flock.programmeId!, productId: product.id, ageValue, ageUnit }, transaction }))!;
  return (await Vaccination.findOne({ where: { flockId: flock.id, programmeStepId: step.id }, transaction }))!;
}

/**
 * Barn A's steps between its recorded 10-day vaccination and today, so none shows as missed: the veterinarian postponed
 * the 14-day spray (today's added spray catches it up) and moved the 4-week drinking-water vaccination to next week.
 */
async function postponedPulletSteps(transaction: Transaction, { vet, pullets, today, zone }: { vet: User; pullets: Flock; today: string; zone: string }): Promise<void> {
  const spray = await stepVaccination(transaction, pullets, ND, 14, 'days');
  // Decided the afternoon before the spray was due.
  const decidedAt = DateTime.fromISO(`${addDays(spray.plannedDate, -1)}T16:00`, { zone }).toJSDate();
  await spray.update({ status: 'cancelled', cancelledBy: vet.id, cancelledAt: decidedAt, cancelReason: `Postponed by the veterinarian (flock health at 14 days); replaced by the catch-up spray on ${today}.` }, { transaction });
  const water = await stepVaccination(transaction, pullets, IB, 4, 'weeks');
  await water.update({ plannedDate: addDays(today, 7), movedByHand: true, notes: 'Moved by the veterinarian with the postponed spray (flock health).' }, { transaction });
}

/** Barn A's drinking-water vaccination at 10 days: crew, vials out and none back, signed by the lead. */
async function seedPastRecord(
  transaction: Transaction,
  { q, lead, admin, pullets, fcp, day }: { q: (sql: string, r: Record<string, unknown>) => Promise<{ id: number }[]>; lead: User; admin: User; pullets: Flock; fcp: Site; day: string },
): Promise<void> {
  // The programme's own 10-day vaccination (generated with the flock) is the one done: no second row for the step.
  const vaccination = await stepVaccination(transaction, pullets, IB, 10, 'days');
  if (vaccination.plannedDate !== day) throw new Error(`The demo's pullet record expects the 10-day step on ${day}, not ${vaccination.plannedDate}.`);
  await vaccination.update({ status: 'done', confirmedBy: admin.id, confirmedAt: DateTime.fromISO(`${addDays(day, -1)}T15:00`, { zone: fcp.timeZone }).toJSDate() }, { transaction });
  await q('INSERT INTO crew_assignments (site_id, day, lead_id, assigned_by) VALUES (:siteId, :day, :leadId, :by) RETURNING id', { siteId: fcp.id, day, leadId: lead.id, by: admin.id });
  // Early morning on the site's clock: vials out at 05:30, water on 06:00 to 07:40, signed at 08:05.
  const at = (time: string) => DateTime.fromISO(`${day}T${time}`, { zone: fcp.timeZone }).toJSDate();
  const fridge = (await Fridge.findOne({ where: { code: 'FCP-F1' }, transaction }))!;
  const house = (await House.findByPk(pullets.houseId, { transaction }))!;
  const lot = (await Lot.findOne({ where: { lotNumber: 'FIB1203' }, transaction }))!;
  const vials = 8;
  await StockMovement.create(
    { lotId: lot.id, kind: 'issue', vials, fromFridgeId: fridge.id, toFridgeId: null, leftAt: at('05:30'), at: at('05:30'), sourceKind: 'vaccination', sourceId: vaccination.id, reason: `Vaccination of flock ${pullets.name}, ${house.name}`, recordedBy: lead.id },
    { transaction },
  );
  await q('INSERT INTO vaccination_starts (vaccination_id, started_at, started_by) VALUES (:id, :at, :by) RETURNING vaccination_id AS id', { id: vaccination.id, at: at('06:00'), by: lead.id });
  await q('INSERT INTO vaccination_mixings (vaccination_id, mixed_at, recorded_by) VALUES (:id, :at, :by) RETURNING id', { id: vaccination.id, at: at('05:50'), by: lead.id });
  const [record] = await q(
    `INSERT INTO vaccination_records (vaccination_id, started_at, ended_at, birds_vaccinated, crew, deviations, cleaning, signed_by, signer_name, signed_at, signature_meaning)
     VALUES (:id, :start, :end, :birds, :crew, :deviations, :cleaning, :by, :name, :signed, :meaning) RETURNING id`,
    {
      id: vaccination.id, start: at('06:00'), end: at('07:40'), birds: 17_790, crew: JSON.stringify([{ id: lead.id, name: lead.name, lead: true }]),
      deviations: 'Line 3 drinkers flushed again after a slow start; all lines emptied within two hours.',
      // Drinking water needs no sprayer: only the washing of the mixing container applies, the sprayer's steps do not.
      cleaning: JSON.stringify({ disassembled: false, washed: true, tankDried: false, batteryRecharging: false }),
      by: lead.id, name: lead.name, signed: at('08:05'), meaning: recordSignatureMeaning,
    },
  );
  await q(
    'INSERT INTO vaccination_record_lots (record_id, lot_id, vials_issued, vials_used, vials_returned, doses_used) VALUES (:recordId, :lotId, :vials, :vials, 0, :doses) RETURNING record_id AS id',
    { recordId: record!.id, lotId: lot.id, vials, doses: vials * 2500 },
  );
}
