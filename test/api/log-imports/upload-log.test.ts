// Uploading logger files: what is stored, what is reported, and what is refused with nothing written.
import { expect } from 'chai';
import { QueryTypes } from 'sequelize';
import { AuditEntry, Excursion, LogImport, Logger } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testContext } from '../../support/test-app.js';
import { celsiusCsv, createFridge, createLogger, series, uploadLog } from '../../support/fridge-fixtures.js';

const T0 = Date.UTC(2026, 2, 1, 8, 0);
const MIN = 60_000;

async function count(sql: string): Promise<number> {
  const [row] = await testContext().sequelize.query<{ n: string }>(sql, { type: QueryTypes.SELECT });
  return Number(row.n);
}

async function setup() {
  const site = await createSite('LKN');
  const fridge = await createFridge(site);
  const logger = await createLogger(fridge);
  const storage = await signInAs(['storage']);
  return { site, fridge, logger, storage };
}

describe('log imports: uploading a file', () => {
  // Models bind when the app's context is made, so it comes first.
  before(() => testApp());
  beforeEach(resetDatabase);

  it('stores a °F file with metadata lines, reports its counts and opens the excursion it shows', async () => {
    const { logger, storage } = await setup();
    // 35–45 °F is the common-practice range; 46.4 and 47.3 °F are above it (8 and 8.5 °C, NIST SP 811).
    const csv = 'Exported readings\nTime,Temp (°F),RH (%)\n2026-03-01 08:00,40,50\n2026-03-01 08:10,46.4,50\n2026-03-01 08:20,47.3,50\n2026-03-01 08:30,41,50\n2026-03-01 08:40,,50\n2026-03-01 08:50,40,50\n';
    const response = await uploadLog(storage, logger.id, csv, { mapping: { zone: 'UTC' } });
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.repeated).to.equal(false);
    expect(response.body.import).to.include({ rowsRead: 6, readingsStored: 5, duplicates: 0, conflicts: 0, skipped: 1, unit: 'F', zone: 'UTC' });
    expect(response.body.import.warnings).to.deep.equal([{ line: 7, message: 'temperature is empty; row skipped' }]);
    expect(response.body.excursionsOpened).to.equal(1);
    expect(response.body.message).to.match(/Stored 5 readings \(1 row skipped\); 1 excursion opened/);
    expect(await count('SELECT count(*) AS n FROM readings')).to.equal(5);
    expect(await count('SELECT sum(count) AS n FROM reading_hours')).to.equal(5);
    const [excursion] = await Excursion.findAll();
    // Hand-computed: readings at 08:10 and 08:20 stand for 10 min each.
    expect(excursion).to.include({ kind: 'high', minutes: 20, status: 'open', source: 'readings' });
    expect(excursion.peakC).to.be.closeTo(8.5, 1e-5);
    expect(excursion.startsAt.toISOString()).to.equal('2026-03-01T08:10:00.000Z');
    expect(excursion.endsAt.toISOString()).to.equal('2026-03-01T08:30:00.000Z');
    const history = await storage.agent.get(`/api/log-imports/fridges/${logger.fridgeId}`).expect(200);
    expect(history.body.items).to.have.length(1);
    expect(history.body.items[0]).to.include({ fileName: 'log.csv', readingsStored: 5, skipped: 1, importedBy: 'Test storage' });
    expect(await AuditEntry.count({ where: { action: 'log-import.create' } })).to.equal(1);
  });

  it('keeps the invariant read = stored + already stored + conflicting + skipped', async () => {
    const { logger, storage } = await setup();
    await uploadLog(storage, logger.id, celsiusCsv(series(T0, 10, [4, 5, 6, 5])), { name: 'a.csv' }).expect(201);
    const rows = celsiusCsv([...series(T0 + 20 * MIN, 10, [6, 9, 5, 4]), [T0 + 70 * MIN, 4]]).split('\n');
    const second = [...rows.slice(0, 3), '2026-03-01T08:35:00Z,warm', ...rows.slice(3)].join('\n');
    const response = await uploadLog(storage, logger.id, second, { name: 'b.csv' }).expect(201);
    const i = response.body.import;
    // Hand-computed: 08:20 repeats 6 °C, 08:30 holds 9 against a stored 5, 08:40, 08:50 and 09:10 are new; one row is unreadable.
    expect(i).to.include({ rowsRead: 6, readingsStored: 3, duplicates: 1, conflicts: 1, skipped: 1 });
    expect(i.rowsRead).to.equal(i.readingsStored + i.duplicates + i.conflicts + i.skipped);
  });

  it('keeps the first of a repeated time, sorts rows out of order, and skips a sentinel value, each with its line', async () => {
    const { logger, storage } = await setup();
    const csv = 'Time,Temp °C\n2026-03-01T08:20:00Z,6\n2026-03-01T08:00:00Z,4\n2026-03-01T08:10:00Z,5\n2026-03-01T08:10:00Z,5.5\n2026-03-01T08:30:00Z,-999\n';
    const response = await uploadLog(storage, logger.id, csv);
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.import).to.include({ rowsRead: 5, readingsStored: 3, skipped: 2, firstAt: '2026-03-01T08:00:00.000Z', lastAt: '2026-03-01T08:20:00.000Z' });
    expect(response.body.import.warnings.map((w: { line: number }) => w.line)).to.deep.equal([3, 5, 6]);
    expect(response.body.import.warnings[2].message).to.match(/outside what a logger records/);
    const [stored] = await testContext().sequelize.query<{ temp_c: number }>(`SELECT temp_c FROM readings WHERE at = '2026-03-01T08:10:00Z'`, { type: QueryTypes.SELECT });
    expect(stored.temp_c).to.equal(5); // the first row in file order
  });

  it('reports a value that conflicts with a stored one, with its line, and never overwrites it', async () => {
    const { logger, storage } = await setup();
    await uploadLog(storage, logger.id, celsiusCsv(series(T0, 10, [4, 5, 6])), { name: 'first.csv' }).expect(201);
    const response = await uploadLog(storage, logger.id, celsiusCsv(series(T0, 10, [4, 7.5, 6])), { name: 'second.csv' }).expect(201);
    expect(response.body.import).to.include({ readingsStored: 0, duplicates: 2, conflicts: 1 });
    expect(response.body.import.conflictSamples).to.deep.equal([{ line: 3, at: '2026-03-01T08:10:00.000Z', fileC: 7.5, storedC: 5 }]);
    expect(response.body.message).to.match(/1 conflicting value kept as first stored/);
    const [stored] = await testContext().sequelize.query<{ temp_c: number }>(`SELECT temp_c FROM readings WHERE at = '2026-03-01T08:10:00Z'`, { type: QueryTypes.SELECT });
    expect(stored.temp_c).to.equal(5);
  });

  it('changes nothing when the same file comes again, and says when it was first imported', async () => {
    const { logger, storage } = await setup();
    const csv = celsiusCsv(series(T0, 10, [4, 9, 5]));
    await uploadLog(storage, logger.id, csv).expect(201);
    const before = { readings: await count('SELECT count(*) AS n FROM readings'), audit: await AuditEntry.count(), excursions: await Excursion.count() };
    const again = await uploadLog(storage, logger.id, csv, { name: 'renamed.csv' });
    expect(again.status).to.equal(200);
    expect(again.body.repeated).to.equal(true);
    expect(again.body.message).to.match(/Nothing changed: this file \(same SHA-256\) was already imported for logger SN-primary-\d+ on \d{4}-\d{2}-\d{2}\./);
    expect(await LogImport.count()).to.equal(1);
    expect({ readings: await count('SELECT count(*) AS n FROM readings'), audit: await AuditEntry.count(), excursions: await Excursion.count() }).to.deep.equal(before);
  });

  it('reads local times in the site’s zone unless another is chosen (IANA tz database: CST is −06:00)', async () => {
    const { logger, storage } = await setup();
    const response = await uploadLog(storage, logger.id, 'Time,Temp °C\n2026-03-01 08:00,4\n2026-03-01 08:10,5\n').expect(201);
    expect(response.body.import).to.include({ firstAt: '2026-03-01T14:00:00.000Z', zone: 'America/Chicago' });
  });

  it('stores both passes of the repeated autumn hour and skips the missing spring hour (IANA tz database, America/Chicago)', async () => {
    const { logger, storage } = await setup();
    // 2026-11-01: 01:00–01:59 happens twice (CDT, then CST); 2026-03-08: 02:00–02:59 does not happen.
    const autumn = ['00:30', '01:00', '01:30', '01:00', '01:30', '02:00'].map((t) => `2026-11-01 ${t},4`);
    const response = await uploadLog(storage, logger.id, `Time,Temp °C\n2026-03-08 01:30,4\n2026-03-08 02:30,4\n2026-03-08 03:30,4\n${autumn.join('\n')}\n`);
    expect(response.status, JSON.stringify(response.body)).to.equal(201);
    expect(response.body.import).to.include({ readingsStored: 8, skipped: 1 });
    expect(response.body.import.warnings).to.deep.equal([{ line: 3, message: 'local time 2026-03-08 02:30 does not exist in America/Chicago (clocks moved forward); row skipped' }]);
    const rows = await testContext().sequelize.query<{ at: Date }>(`SELECT at FROM readings WHERE at >= '2026-11-01T05:00:00Z' ORDER BY at`, { type: QueryTypes.SELECT });
    // 00:30 CDT = 05:30Z, 01:00 CDT = 06:00Z, 01:30 CDT = 06:30Z, 01:00 CST = 07:00Z, 01:30 CST = 07:30Z, 02:00 CST = 08:00Z.
    expect(rows.map((r) => new Date(r.at).toISOString().slice(11, 16))).to.deep.equal(['05:30', '06:00', '06:30', '07:00', '07:30', '08:00']);
  });

  it('remembers the mapping chosen for a logger, so its next file needs no choices', async () => {
    const { logger, storage } = await setup();
    const plain = (day: number) => `When,Reading,Other\n2026-03-0${day} 08:00,4,9\n2026-03-0${day} 08:10,5,9\n`;
    const refused = await uploadLog(storage, logger.id, plain(1));
    expect(refused.status).to.equal(422);
    expect(refused.body.error.fields.map((f: { field: string }) => f.field)).to.include('unit');
    await uploadLog(storage, logger.id, plain(1), { mapping: { unit: 'C', tempColumn: 'Reading', timeColumn: 'When' } }).expect(201);
    expect((await Logger.findByPk(logger.id))!.mapping).to.deep.equal({ unit: 'C', tempColumn: 'Reading', timeColumn: 'When' });
    const next = await uploadLog(storage, logger.id, plain(2));
    expect(next.status, JSON.stringify(next.body)).to.equal(201);
    expect(next.body.import.unit).to.equal('C');
  });

  describe('fatal files: a 422 with the reason, and nothing stored', () => {
    const fatal: [string, string, RegExp][] = [
      ['no header row', '2026-03-01 08:00,4\n2026-03-01 08:10,5\n', /no header row found/],
      ['no temperature column', 'Time,Note\n2026-03-01 08:00,ok\n2026-03-01 08:10,ok\n', /no temperature column found/],
      ['a unit the header does not give', 'Time,Temperature\n2026-03-01 08:00,4\n2026-03-01 08:10,5\n', /temperature unit unknown/],
      ['fewer than two readable rows', 'Time,Temp °C\n2026-03-01 08:00,4\n2026-03-01 08:10,warm\n', /fewer than two readable rows \(found 1\)/],
      ['an ambiguous day and month', 'Time,Temp °C\n03/04/2026 10:00,4\n03/04/2026 10:10,5\n', /day\/month order is ambiguous/],
      ['an empty file', '\n', /the file is empty|no header row/],
      ['a binary file', '\u0000\u0001PK\u0003\u0004garbage', /no header row found/],
    ];
    for (const [what, body, reason] of fatal) {
      it(`refuses ${what}`, async () => {
        const { logger, storage } = await setup();
        const response = await uploadLog(storage, logger.id, body);
        expect(response.status, JSON.stringify(response.body)).to.equal(422);
        expect(response.body.error.message).to.match(/^The file cannot be imported: /).and.match(reason);
        expect(await count('SELECT count(*) AS n FROM readings')).to.equal(0);
        expect(await LogImport.count()).to.equal(0);
        expect(await AuditEntry.count()).to.equal(0);
      });
    }

    it('names what to choose, and imports once it is given', async () => {
      const { logger, storage } = await setup();
      const body = 'Time,Temp °C\n03/04/2026 10:00,4\n03/04/2026 10:10,5\n';
      const refused = await uploadLog(storage, logger.id, body);
      expect(refused.body.error.fields).to.deep.equal([{ field: 'dateOrder', message: 'Choose this in the mapping.' }]);
      const accepted = await uploadLog(storage, logger.id, body, { mapping: { dateOrder: 'DMY', zone: 'UTC' } }).expect(201);
      expect(accepted.body.import.firstAt).to.equal('2026-04-03T10:00:00.000Z');
    });

    it('finds the day/month order further down a file than the sniffer looks', async () => {
      const { logger, storage } = await setup();
      const rows = Array.from({ length: 300 }, (_, i) => `03/04/2026 ${String(Math.floor(i / 60)).padStart(2, '0')}:${String(i % 60).padStart(2, '0')},4`);
      rows.push('13/04/2026 10:00,5');
      const response = await uploadLog(storage, logger.id, `Time,Temp °C\n${rows.join('\n')}\n`, { mapping: { zone: 'UTC' } });
      expect(response.status, JSON.stringify(response.body)).to.equal(201);
      expect(response.body.import.firstAt).to.equal('2026-04-03T00:00:00.000Z'); // day-first, from the 13 on the last line
    });
  });

  it('refuses a bad mapping naming the field, and a missing file', async () => {
    const { logger, storage } = await setup();
    const bad = await uploadLog(storage, logger.id, celsiusCsv(series(T0, 10, [4, 5])), { mapping: { unit: 'K' } });
    expect(bad.status).to.equal(400);
    expect(bad.body.error.fields[0].field).to.equal('unit');
    const none = await storage.agent.post(`/api/log-imports/loggers/${logger.id}`).set('X-XSRF-TOKEN', storage.csrf).field('mapping', '{}');
    expect(none.status).to.equal(400);
    expect(none.body.error.fields).to.deep.equal([{ field: 'file', message: 'Required.' }]);
  });

  it('refuses a file over 50 MB with a 413, storing nothing', async function () {
    this.timeout(60_000);
    const { logger, storage } = await setup();
    const response = await uploadLog(storage, logger.id, Buffer.alloc(50 * 1024 * 1024 + 1, 'a'));
    expect(response.status).to.equal(413);
    expect(response.body.error.message).to.match(/larger than 50 MB/);
    expect(await LogImport.count()).to.equal(0);
  });

  it('lets a veterinarian read the history but not upload', async () => {
    const { logger } = await setup();
    const vet = await signInAs(['veterinarian']);
    await vet.agent.get(`/api/log-imports/fridges/${logger.fridgeId}`).expect(200);
    expect((await uploadLog(vet, logger.id, celsiusCsv(series(T0, 10, [4, 5])))).status).to.equal(403);
  });

  it('reports progress for a token while a file is read, to the uploader only', async () => {
    const { logger, storage } = await setup();
    const token = 'progress-token-1';
    await uploadLog(storage, logger.id, celsiusCsv(series(T0, 1, Array.from({ length: 2000 }, () => 4))), { progressToken: token }).expect(201);
    // The last write is on its way while the answer is sent; give it a moment.
    let progress;
    for (let i = 0; i < 20 && progress?.phase !== 'done'; i++) {
      progress = (await storage.agent.get(`/api/log-imports/progress/${token}`)).body;
      await new Promise((resolve) => setTimeout(resolve, 50));
    }
    expect(progress).to.include({ phase: 'done' });
    expect(progress.done).to.equal(progress.total);
    const other = await signInAs(['storage']);
    expect((await other.agent.get(`/api/log-imports/progress/${token}`)).status).to.equal(404);
  });
});
