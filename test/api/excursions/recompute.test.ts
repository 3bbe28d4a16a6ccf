// Stored excursions, gaps and backup fills follow the data across files; a decided excursion never changes.
import { expect } from 'chai';
import { QueryTypes } from 'sequelize';
import { AuditEntry, Excursion } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testContext, type SignedIn } from '../../support/test-app.js';
import { celsiusCsv, createFridge, createLogger, series, uploadLog } from '../../support/fridge-fixtures.js';

const T0 = Date.UTC(2026, 2, 1, 8, 0);
const MIN = 60_000;
const at = (minutes: number) => new Date(T0 + minutes * MIN).toISOString();

async function spans(table: 'fridge_gaps' | 'backup_fills') {
  const rows = await testContext().sequelize.query<{ starts_at: Date; ends_at: Date; minutes: number }>(`SELECT starts_at, ends_at, minutes FROM ${table} ORDER BY starts_at`, { type: QueryTypes.SELECT });
  return rows.map((r) => ({ start: new Date(r.starts_at).toISOString(), end: new Date(r.ends_at).toISOString(), minutes: r.minutes }));
}

// Limits are 35–45 °F (common practice), so above 7.222 °C is high (NIST SP 811). Every figure below is hand-computed:
// readings every 10 min, each standing for 10 min.
describe('excursion records recomputed per window', () => {
  let storage: SignedIn;
  before(() => testApp());
  beforeEach(async () => {
    await resetDatabase();
    storage = await signInAs(['storage']);
  });

  async function fridgeWithLoggers() {
    const fridge = await createFridge(await createSite('LKN'));
    return { fridge, primary: await createLogger(fridge, 'primary'), backup: await createLogger(fridge, 'backup') };
  }

  it('merges an excursion that runs across two files into one record, linked to both files', async () => {
    const { primary } = await fridgeWithLoggers();
    const a = await uploadLog(storage, primary.id, celsiusCsv(series(T0, 10, [4, 4, 9, 9])), { name: 'a.csv' }).expect(201);
    const [first] = await Excursion.findAll();
    expect(first).to.include({ minutes: 20, openEnded: true });
    expect(first.endsAt.toISOString()).to.equal(at(40)); // the last reading stands for one nominal interval
    const b = await uploadLog(storage, primary.id, celsiusCsv(series(T0 + 40 * MIN, 10, [9, 9, 4, 4])), { name: 'b.csv' }).expect(201);
    expect(b.body.excursionsOpened).to.equal(0);
    const all = await Excursion.findAll();
    expect(all).to.have.length(1);
    expect(all[0]).to.include({ id: first.id, kind: 'high', minutes: 40, openEnded: false, status: 'open' });
    expect([all[0].startsAt.toISOString(), all[0].endsAt.toISOString()]).to.deep.equal([at(20), at(60)]);
    const view = await storage.agent.get(`/api/excursions/${first.id}`).expect(200);
    expect(view.body.sourceImportIds).to.deep.equal([a.body.import.id, b.body.import.id]);
    expect(view.body.degreeMinutesC).to.be.closeTo(4 * (9 - (45 - 32) / 1.8) * 10, 1e-3);
  });

  it('opens a follow-up linked to a decided excursion when new data touches it, leaving the decided one as it was', async () => {
    const { primary } = await fridgeWithLoggers();
    await uploadLog(storage, primary.id, celsiusCsv(series(T0, 10, [4, 4, 9, 9])), { name: 'a.csv' }).expect(201);
    const [decided] = await Excursion.findAll();
    // The veterinarian's decision comes with the lots feature; here it is set as that feature will.
    await decided.update({ status: 'decided' });
    const b = await uploadLog(storage, primary.id, celsiusCsv(series(T0 + 40 * MIN, 10, [9, 9, 4, 4])), { name: 'b.csv' }).expect(201);
    expect(b.body.excursionsOpened).to.equal(1);
    const [kept, followUp] = await Excursion.findAll({ order: [['id', 'ASC']] });
    expect(kept).to.include({ id: decided.id, status: 'decided', minutes: 20 });
    expect(kept.endsAt.toISOString()).to.equal(at(40));
    expect(followUp).to.include({ status: 'open', followUpOfId: decided.id, minutes: 40 });
    expect(await AuditEntry.count({ where: { action: 'excursion.follow-up' } })).to.equal(1);

    // More data that adds nothing to the excursion opens nothing more, and a later file far away neither.
    await uploadLog(storage, primary.id, celsiusCsv(series(T0 + 60 * MIN, 10, [4, 4, 4])), { name: 'c.csv' }).expect(201);
    await uploadLog(storage, primary.id, celsiusCsv(series(T0 + 600 * MIN, 10, [4, 4])), { name: 'd.csv' }).expect(201);
    expect(await Excursion.count()).to.equal(2);
  });

  it('leaves a decided excursion alone, opening nothing, when new data around it shows it unchanged', async () => {
    const { primary } = await fridgeWithLoggers();
    await uploadLog(storage, primary.id, celsiusCsv(series(T0, 10, [4, 9, 9, 4, 4])), { name: 'a.csv' }).expect(201);
    await Excursion.update({ status: 'decided' }, { where: {} });
    await uploadLog(storage, primary.id, celsiusCsv(series(T0 + 40 * MIN, 10, [4, 4, 4])), { name: 'b.csv' }).expect(201);
    expect(await Excursion.count()).to.equal(1);
  });

  it('records the gap between two files that do not meet', async () => {
    const { primary } = await fridgeWithLoggers();
    await uploadLog(storage, primary.id, celsiusCsv(series(T0, 10, [4, 4, 4])), { name: 'a.csv' }).expect(201);
    await uploadLog(storage, primary.id, celsiusCsv(series(T0 + 120 * MIN, 10, [4, 4, 4])), { name: 'b.csv' }).expect(201);
    // 08:20 stands until 08:30; nothing until 10:00.
    expect(await spans('fridge_gaps')).to.deep.equal([{ start: at(30), end: at(120), minutes: 90 }]);
    const events = await storage.agent.get(`/api/excursions/fridges/${primary.fridgeId}`).expect(200);
    expect(events.body.gaps).to.deep.equal([{ start: at(30), end: at(120), minutes: 90 }]);
  });

  it('fills a gap of the primary with the backup’s readings, marked as from the backup', async () => {
    const { primary, backup } = await fridgeWithLoggers();
    await uploadLog(storage, primary.id, celsiusCsv([...series(T0, 10, [4, 4, 4]), ...series(T0 + 80 * MIN, 10, [4, 4, 4])]), { name: 'primary.csv' }).expect(201);
    expect(await spans('fridge_gaps')).to.deep.equal([{ start: at(30), end: at(80), minutes: 50 }]);
    expect(await Excursion.count()).to.equal(0);

    // The backup logs every 10 min from 08:00 to 09:40; it was warm at 08:30 and 08:40, inside the primary's gap.
    const backupTemps = [5, 5, 5, 9, 9, 4, 4, 4, 5, 5, 5];
    const response = await uploadLog(storage, backup.id, celsiusCsv(series(T0, 10, backupTemps)), { name: 'backup.csv' }).expect(201);
    expect(response.body.excursionsOpened).to.equal(1);
    expect(await spans('fridge_gaps')).to.deep.equal([]);
    expect(await spans('backup_fills')).to.deep.equal([{ start: at(30), end: at(80), minutes: 50 }]);
    const [excursion] = await Excursion.findAll();
    expect(excursion).to.include({ kind: 'high', minutes: 20, backupMinutes: 20 });
    expect(excursion.startsAt.toISOString()).to.equal(at(30));

    // The chart shows the backup only where it fills the primary's gap: 08:30 to 09:10.
    const chart = await storage.agent.get(`/api/readings/fridges/${primary.fridgeId}/chart`).query({ from: at(-60), to: at(180) }).expect(200);
    expect(chart.body.primary.points).to.have.length(6);
    expect(chart.body.backup.points.map((p: { at: string }) => p.at)).to.deep.equal([at(30), at(40), at(50), at(60), at(70)]);
  });

  it('re-judges undecided excursions when the fridge’s alarm range changes', async () => {
    const { fridge, primary } = await fridgeWithLoggers();
    await uploadLog(storage, primary.id, celsiusCsv(series(T0, 10, [4, 7.5, 7.5, 4])), { name: 'a.csv' }).expect(201);
    expect(await Excursion.count()).to.equal(1); // 7.5 °C is above 45 °F
    const admin = await signInAs(['admin']);
    const body = { siteId: fridge.siteId, code: fridge.code, name: fridge.name, place: fridge.place, alarmLow: 2, alarmHigh: 8, alarmUnit: 'C', minMaxDisplay: true };
    await admin.agent.put(`/api/fridges/${fridge.id}`).set('X-XSRF-TOKEN', admin.csrf).send(body).expect(200);
    expect(await Excursion.count()).to.equal(0); // inside 2–8 °C (CDC Vaccine Storage and Handling Toolkit)
    expect(await AuditEntry.count({ where: { action: 'excursion.remove' } })).to.equal(1);
  });
});
