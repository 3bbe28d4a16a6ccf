// The storage data version and the caches keyed on it (the fridge chart, the storage overview) and on the projection's
// (the lots list): a repeated request is answered from memory, with an entity tag, and every write that feeds a body
// changes the next one, whichever way it is made. Expectations are hand-computed from the fixtures (our own rules).
import { expect } from 'chai';
import { QueryTypes } from 'sequelize';
import { bulkStorageTables, storageTables } from '../../../database/migrations/2026.12.04T18.00.00.storage-data-version.js';
import { dataVersion } from '../../../api/cache/data-versions.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { celsiusCsv, createFridge, createLogger, series, uploadLog } from '../../support/fridge-fixtures.js';
import { createPresentation, createProduct, createSiteFridge, siteDay, stockLot } from '../../support/flock-fixtures.js';
import { countQueries } from '../../support/count-queries.js';

const START = Date.UTC(2026, 10, 2, 6, 0);
const HOUR = 3_600_000;

async function version(): Promise<bigint> {
  return BigInt((await dataVersion('storage')) ?? '0');
}

describe('the storage caches', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('has the version trigger on every table the chart and the storage overview read', async () => {
    const rows = await testContext().sequelize.query<{ table: string }>(
      `SELECT c.relname AS table FROM pg_trigger t JOIN pg_class c ON c.oid = t.tgrelid JOIN pg_proc p ON p.oid = t.tgfoid
        WHERE p.proname IN ('advance_storage_data_version', 'touch_storage_data')`,
      { type: QueryTypes.SELECT },
    );
    expect(rows.map((r) => r.table).sort()).to.deep.equal([...storageTables, ...bulkStorageTables, 'storage_data_touches'].sort());
  });

  it('advances the version once per transaction that writes readings, and not for one rolled back', async () => {
    const fridge = await createFridge(await createSite('VER'));
    const logger = await createLogger(fridge);
    const { sequelize } = testContext();
    const insert = (at: number, transaction?: import('sequelize').Transaction) =>
      sequelize.query('INSERT INTO readings (at, logger_id, temp_c) VALUES (:at, :logger, 4.5)', { replacements: { at: new Date(at).toISOString(), logger: logger.id }, transaction });
    const before = await version();
    await sequelize.transaction(async (transaction) => {
      await insert(START, transaction);
      await insert(START + 60_000, transaction);
      // Not yet visible to others: the version moves at the commit, together with the data.
      expect(await version()).to.equal(before);
    });
    const afterCommit = await version();
    expect(afterCommit > before).to.equal(true);
    const [{ touches }] = await sequelize.query<{ touches: string }>('SELECT count(*) AS touches FROM storage_data_touches', { type: QueryTypes.SELECT });
    expect(Number(touches), 'the mark is removed at the commit').to.equal(0);

    await sequelize.transaction(async (transaction) => {
      await insert(START + 120_000, transaction);
      throw new Error('give up');
    }).catch(() => undefined);
    expect(await version()).to.equal(afterCommit);
  });

  it('serves a repeated chart from memory with its tag, answers 304 to that tag, and shows an import at once', async () => {
    const fridge = await createFridge(await createSite('CHT'));
    const logger = await createLogger(fridge);
    const storage = await signInAs(['storage']);
    const range = { from: new Date(START).toISOString(), to: new Date(START + 6 * HOUR).toISOString() };
    const chart = () => storage.agent.get(`/api/readings/fridges/${fridge.id}/chart`).query(range).expect(200);

    await uploadLog(storage, logger.id, celsiusCsv(series(START, 60, [4, 5]))).expect(201);
    const first = await chart();
    expect(first.body.primary.points.map((p: { tempC: number }) => p.tempC)).to.deep.equal([4, 5]);
    const again = await countQueries(chart);
    expect(again.result.body).to.deep.equal(first.body);
    expect(again.queries, 'a hit reads the session and the version only').to.be.at.most(3);
    expect(again.result.headers.etag).to.equal(first.headers.etag).and.match(/^W\/"/);
    await storage.agent.get(`/api/readings/fridges/${fridge.id}/chart`).query(range).set('If-None-Match', first.headers.etag).expect(304);

    // A later file adds two hours: the next chart has them (the import advanced the version).
    await uploadLog(storage, logger.id, celsiusCsv(series(START + 2 * HOUR, 60, [6, 7])), { name: 'later.csv' }).expect(201);
    const after = await chart();
    expect(after.body.primary.points.map((p: { tempC: number }) => p.tempC)).to.deep.equal([4, 5, 6, 7]);
    expect(after.headers.etag).to.not.equal(first.headers.etag);

    // A new alarm range on the fridge changes the band of the same range's chart.
    await fridge.update({ alarmHigh: 47 });
    expect((await chart()).body.highC).to.not.equal(first.body.highC);
  });

  it('shows a daily check on the storage overview as soon as it is saved', async () => {
    const fridge = await createFridge(await createSite('OVR'));
    const storage = await signInAs(['storage']);
    const overview = async () => (await storage.agent.get('/api/fridges/overview').expect(200)).body;
    expect((await overview()).fridges[0].checksToday).to.equal(0);
    await storage.agent.post('/api/daily-checks').set('X-XSRF-TOKEN', storage.csrf).send({ fridgeId: fridge.id, unit: 'C', current: 4.5, initials: 'MK' }).expect(201);
    expect((await overview()).fridges[0].checksToday).to.equal(1);
  });

  it('shows a received lot on the lots list as soon as it is stored', async () => {
    const site = await createSite('LOT');
    const fridge = await createSiteFridge(site);
    const presentation = await createPresentation(await createProduct(), 1000);
    const buyer = await signInAs(['purchasing'], [site]);
    const list = async () => (await buyer.agent.get('/api/lots').expect(200)).body;
    await stockLot(fridge, presentation, 3, siteDay(site, 90));
    const cold = await countQueries(list);
    const hit = await countQueries(list);
    expect(hit.result).to.deep.equal(cold.result);
    expect(cold.result.total).to.equal(1);
    // A hit reads the session's user and the data version, not the list.
    expect(hit.queries, `cold ${cold.queries}, hit ${hit.queries}`).to.be.below(cold.queries);
    await stockLot(fridge, presentation, 2, siteDay(site, 120));
    const after = await list();
    expect(after.total).to.equal(2);
    expect(after.items.map((l: { vials: number }) => l.vials).sort()).to.deep.equal([2, 3]);
  });
});
