// The chart's data: raw readings for short ranges, bucket minimum and maximum for long ones, so no peak is lost.
import { expect } from 'chai';
import { QueryTypes } from 'sequelize';
import { CHART_MAX_POINTS } from '../../../shared/fridges/chart-data.js';
import { bucketWidthMs } from '../../../api/readings/chart-query.js';
import { refreshReadingHours } from '../../../api/readings/refresh-reading-hours.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, signInAs, testApp, testContext } from '../../support/test-app.js';
import { createFridge, createLogger } from '../../support/fridge-fixtures.js';

const YEAR_START = Date.UTC(2025, 0, 1);
const YEAR_MS = 365 * 86_400_000;
const SPIKE = Date.UTC(2025, 6, 14, 13, 37);

describe('chart data', () => {
  before(() => testApp());
  beforeEach(resetDatabase);

  it('picks raw readings up to the point budget, then buckets of whole minutes or whole hours', () => {
    expect(bucketWidthMs(YEAR_MS, CHART_MAX_POINTS)).to.equal(0);
    expect(bucketWidthMs(86_400_000, 1440 * 2)).to.equal(2 * 60_000); // hand-computed: 1,440 min / 1,000 buckets → 2 min
    expect(bucketWidthMs(YEAR_MS, 525_600)).to.equal(9 * 3_600_000); // hand-computed: 8,760 h / 1,000 → 8.76 h → 9 h
  });

  it('keeps a one-minute spike in a year of one-minute readings within about 2,000 points', async function () {
    this.timeout(60_000);
    const fridge = await createFridge(await createSite('LKN'));
    const logger = await createLogger(fridge);
    const { sequelize } = testContext();
    // 525,600 readings between 3.8 and 4.6 °C made in SQL, with one minute at 12.4 °C.
    await sequelize.query(
      `INSERT INTO readings (at, logger_id, temp_c)
       SELECT t, :logger, CASE WHEN t = :spike::timestamptz THEN 12.4 ELSE 4.2 + 0.4 * sin(extract(epoch FROM t) / 3600) END
       FROM generate_series(:start::timestamptz, :start::timestamptz + interval '365 days' - interval '1 minute', interval '1 minute') AS t`,
      { replacements: { logger: logger.id, spike: new Date(SPIKE).toISOString(), start: new Date(YEAR_START).toISOString() }, type: QueryTypes.INSERT },
    );
    await sequelize.transaction((t) => refreshReadingHours(sequelize, t, logger.id, YEAR_START, YEAR_START + YEAR_MS));
    const storage = await signInAs(['storage']);
    const started = Date.now();
    const response = await storage.agent
      .get(`/api/readings/fridges/${fridge.id}/chart`)
      .query({ from: new Date(YEAR_START).toISOString(), to: new Date(YEAR_START + YEAR_MS).toISOString() })
      .expect(200);
    const elapsed = Date.now() - started;
    const { buckets, points } = response.body.primary;
    expect(points).to.have.length(0);
    expect(response.body.bucketMinutes).to.equal(9 * 60);
    expect(buckets.length * 2).to.be.at.most(CHART_MAX_POINTS);
    const highest = Math.max(...buckets.map((b: { maxC: number }) => b.maxC));
    expect(highest).to.be.closeTo(12.4, 1e-5);
    const holding = buckets.find((b: { maxC: number }) => b.maxC > 12);
    expect(Date.parse(holding.at)).to.be.at.most(SPIKE).and.above(SPIKE - 9 * 3_600_000);
    expect(buckets.reduce((n: number, b: { count: number }) => n + b.count, 0)).to.equal(525_600);
    expect(elapsed, 'the year query reads the hourly table').to.be.below(2000);

    // Two days around the spike (2,880 readings) come back as 3-minute buckets of raw readings, the spike in one of them.
    const days = await storage.agent.get(`/api/readings/fridges/${fridge.id}/chart`).query({ from: new Date(SPIKE - 86_400_000).toISOString(), to: new Date(SPIKE + 86_400_000).toISOString() }).expect(200);
    expect(days.body.bucketMinutes).to.equal(3); // hand-computed: 2,880 min / 1,000 buckets, rounded up
    expect(Math.max(...days.body.primary.buckets.map((b: { maxC: number }) => b.maxC))).to.be.closeTo(12.4, 1e-5);
    // One day (1,441 readings) fits the budget and is raw.
    const day = await storage.agent.get(`/api/readings/fridges/${fridge.id}/chart`).query({ from: new Date(SPIKE - 43_200_000).toISOString(), to: new Date(SPIKE + 43_200_000).toISOString() }).expect(200);
    expect(day.body.bucketMinutes).to.equal(0);
    expect(day.body.primary.points).to.have.length(1441);
    expect(day.body.primary.points.find((p: { at: string }) => p.at === new Date(SPIKE).toISOString()).tempC).to.be.closeTo(12.4, 1e-5);
  });

  it('refuses a range that ends before it starts, naming the field', async () => {
    const fridge = await createFridge(await createSite('LKN'));
    const storage = await signInAs(['storage']);
    const response = await storage.agent.get(`/api/readings/fridges/${fridge.id}/chart`).query({ from: '2026-03-02T00:00:00Z', to: '2026-03-01T00:00:00Z' });
    expect(response.status).to.equal(400);
    expect(response.body.error.fields).to.deep.equal([{ field: 'to', message: 'Must be after the start.' }]);
  });
});
