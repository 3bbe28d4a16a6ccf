// Invented vaccination-day data for the demo: today the crew lead has a spray vaccination on each site, water volumes are
// entered, the sites have a heat limit, and one pullet flock has a finished, signed vaccination from a past day.
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
  // Today, Fennel Creek: a spray the veterinarian added by hand for barn A.
  const pullets = await flock('PA-2026-03');
  await Vaccination.create(
    { flockId: pullets.id, programmeStepId: null, productId: nd.id, route: 'spray', plannedDate: today('FCP'), notes: 'Added by the veterinarian: field challenge reported nearby.', status: 'confirmed', confirmedBy: vet.id, confirmedAt: new Date(), createdBy: vet.id },
    { transaction },
  );
  for (const code of ['LKN', 'FCP']) {
    await q('INSERT INTO crew_assignments (site_id, day, lead_id, assigned_by) VALUES (:siteId, :day, :leadId, :by) RETURNING id', { siteId: sites.get(code)!.id, day: today(code), leadId: lead.id, by: vet.id });
  }

  await seedPastRecord(transaction, { q, lead, admin, pullets, fcp: sites.get('FCP')!, day: addDays(today('FCP'), -20) });
}

/** Barn A's drinking-water vaccination at 10 days: crew, vials out and none back, signed by the lead. */
async function seedPastRecord(
  transaction: Transaction,
  { q, lead, admin, pullets, fcp, day }: { q: (sql: string, r: Record<string, unknown>) => Promise<{ id: number }[]>; lead: User; admin: User; pullets: Flock; fcp: Site; day: string },
): Promise<void> {
  const ib = (await Product.findOne({ where: { name: IB }, transaction }))!;
  const step = await ProgrammeStep.findOne({ where: { programmeId: pullets.programmeId!, productId: ib.id, ageValue: 10, ageUnit: 'days' }, transaction });
  const vaccination = await Vaccination.create(
    { flockId: pullets.id, programmeStepId: step?.id ?? null, productId: ib.id, route: 'drinking_water', plannedDate: day, status: 'done', confirmedBy: admin.id, confirmedAt: new Date(`${day}T00:00:00Z`), createdBy: admin.id },
    { transaction },
  );
  await q('INSERT INTO crew_assignments (site_id, day, lead_id, assigned_by) VALUES (:siteId, :day, :leadId, :by) RETURNING id', { siteId: fcp.id, day, leadId: lead.id, by: admin.id });
  // Early morning in Denver (UTC−7): vials out at 05:30, water on 06:00 to 07:40, signed at 08:05 local.
  const at = (time: string) => new Date(`${day}T${time}:00Z`);
  const fridge = (await Fridge.findOne({ where: { code: 'FCP-F1' }, transaction }))!;
  const house = (await House.findByPk(pullets.houseId, { transaction }))!;
  const lot = (await Lot.findOne({ where: { lotNumber: 'FIB1203' }, transaction }))!;
  const vials = 8;
  await StockMovement.create(
    { lotId: lot.id, kind: 'issue', vials, fromFridgeId: fridge.id, toFridgeId: null, leftAt: at('12:30'), at: at('12:30'), sourceKind: 'vaccination', sourceId: vaccination.id, reason: `Vaccination of flock ${pullets.name}, ${house.name}`, recordedBy: lead.id },
    { transaction },
  );
  await q('INSERT INTO vaccination_starts (vaccination_id, started_at, started_by) VALUES (:id, :at, :by) RETURNING vaccination_id AS id', { id: vaccination.id, at: at('13:00'), by: lead.id });
  await q('INSERT INTO vaccination_mixings (vaccination_id, mixed_at, recorded_by) VALUES (:id, :at, :by) RETURNING id', { id: vaccination.id, at: at('12:50'), by: lead.id });
  const [record] = await q(
    `INSERT INTO vaccination_records (vaccination_id, started_at, ended_at, birds_vaccinated, crew, deviations, cleaning, signed_by, signer_name, signed_at, signature_meaning)
     VALUES (:id, :start, :end, :birds, :crew, :deviations, :cleaning, :by, :name, :signed, :meaning) RETURNING id`,
    {
      id: vaccination.id, start: at('13:00'), end: at('14:40'), birds: 17_790, crew: JSON.stringify([{ id: lead.id, name: lead.name, lead: true }]),
      deviations: 'Line 3 drinkers flushed again after a slow start; all lines emptied within two hours.',
      cleaning: JSON.stringify({ disassembled: true, washed: true, tankDried: true, batteryRecharging: true }),
      by: lead.id, name: lead.name, signed: at('15:05'), meaning: recordSignatureMeaning,
    },
  );
  await q(
    'INSERT INTO vaccination_record_lots (record_id, lot_id, vials_issued, vials_used, vials_returned, doses_used) VALUES (:recordId, :lotId, :vials, :vials, 0, :doses) RETURNING record_id AS id',
    { recordId: record!.id, lotId: lot.id, vials, doses: vials * 2500 },
  );
}
