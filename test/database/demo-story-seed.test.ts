// The demo scenario, seeded as `npm start` seeds it, tells one story a farm would believe: holds date from what opened
// them, a condition the veterinarian sets can be met, the fridges' readings cover the lots' time in storage, the day's
// work happens at hours a farm keeps on the site's own clock, and each record is made by the role that makes it.
import { expect } from 'chai';
import { DateTime } from 'luxon';
import { QueryTypes } from 'sequelize';
import { loadProjectionInput } from '../../api/demand/projection-inputs.js';
import { proposeSafetyStockFor } from '../../api/demand/safety-proposal-service.js';
import { computeLotExposure } from '../../api/exposure/lot-exposure-service.js';
import { exposureReason } from '../../api/holds/exposure-reason.js';
import { projectSite } from '../../shared/demand/project-site.js';
import {
  DailyCheck, ExposureEvent, Flock, Fridge, Hold, HoldDecision, Lot, Presentation, Product, Shipment, Site, StockMovement, TroubleshootingRecord, User,
} from '../../database/models/index.js';
import { PAPER_RECORD } from '../../database/seeders/demo-flocks.js';
import { siteDay } from '../support/flock-fixtures.js';
import { testContext } from '../support/test-app.js';
import { seedDemoForSuite } from '../support/demo-seed.js';

const HOUR = 3_600_000;
const localHour = (at: Date, zone: string) => DateTime.fromJSDate(at, { zone }).hour + DateTime.fromJSDate(at, { zone }).minute / 60;

describe('the demo scenario’s story', function () {
  this.timeout(180_000);
  const zoneOfFridge = new Map<number, string>();
  seedDemoForSuite('demo-story', async () => {
    const sites = new Map((await Site.findAll()).map((s) => [s.id, s.timeZone]));
    for (const fridge of await Fridge.findAll()) zoneOfFridge.set(fridge.id, sites.get(fridge.siteId)!);
  });

  it('dates each excursion hold from its event’s start, with the reason and figures the import computed', async () => {
    const events = await ExposureEvent.findAll({ where: { source: 'readings' }, order: [['id', 'ASC']] });
    const fridges = new Map((await Fridge.findAll()).map((f) => [f.id, f]));
    // One event per warm spell (vaccine room fridge, shop fridge): the import took over the event opened at the spell's
    // start instead of opening a second one beside it.
    expect(events.map((e) => fridges.get(e.fridgeId)!.code)).to.deep.equal(['LKN-F1', 'FCP-F2']);
    for (const event of events) {
      const code = fridges.get(event.fridgeId)!.code;
      expect(event.excursionId, `${code}: linked to the fridge's own excursion by the recompute`).to.be.a('number');
      const holds = await Hold.findAll({ where: { sourceKind: 'exposure_event', sourceId: event.id } });
      expect(holds, code).to.have.length(2);
      for (const hold of holds) {
        expect(hold.openedAt.toISOString(), `${code} hold ${hold.id}`).to.equal(event.startsAt.toISOString());
        const lot = (await Lot.findByPk(hold.lotId))!;
        const presentation = (await Presentation.findByPk(lot.presentationId, { include: ['product'] })) as Presentation & { product: Product };
        const product = presentation.product;
        const range = { low: Number(product.storageLow), high: Number(product.storageHigh), unit: product.storageUnit };
        expect(hold.reason).to.equal(exposureReason({ cause: 'excursion', kind: event.kind, fridgeName: fridges.get(event.fridgeId)!.name, range, peakC: event.peakC, minutes: event.minutes }));
      }
    }
    // The vaccine room fridge's spell: six days ago at 09:10 on Larkmoor North's clock, well before the seeding.
    const room = events[0]!;
    const chicago = zoneOfFridge.get(room.fridgeId)!;
    expect(DateTime.fromJSDate(room.startsAt, { zone: chicago }).toFormat('yyyy-MM-dd HH:mm')).to.equal(`${siteDay((await Site.findOne({ where: { code: 'LKN' } }))!, -6)} 09:10`);
    // Every hold told the veterinarian (the notification a new hold sends), dated when the hold opened.
    const vet = (await User.findOne({ where: { email: 'vet@larkmoor.example' } }))!;
    const notes = new Map(
      (await testContext().sequelize.query<{ event_key: string; created_at: Date }>(
        `SELECT event_key, created_at FROM notifications WHERE user_id = :userId AND kind = 'hold_opened'`,
        { replacements: { userId: vet.id }, type: QueryTypes.SELECT },
      )).map((n) => [n.event_key, new Date(n.created_at).toISOString()]),
    );
    const allHolds = await Hold.findAll();
    expect(allHolds.map((h) => h.cause).sort()).to.deep.equal(['arrival', 'excursion', 'excursion', 'excursion', 'excursion']);
    for (const hold of allHolds) {
      expect(notes.get(`${hold.cause}:${hold.sourceKind}:${hold.sourceId}`), `notification of hold ${hold.id}`).to.equal(hold.openedAt.toISOString());
    }
  });

  it('quotes the shop fridge event’s own figures in the veterinarian’s notes', async () => {
    const shop = (await Fridge.findOne({ where: { code: 'FCP-F2' } }))!;
    const event = (await ExposureEvent.findOne({ where: { fridgeId: shop.id, source: 'readings' } }))!;
    const holds = await Hold.findAll({ where: { sourceKind: 'exposure_event', sourceId: event.id } });
    const decisions = await HoldDecision.findAll({ where: { holdId: holds.map((h) => h.id) } });
    expect(decisions).to.have.length(2);
    for (const decision of decisions) {
      expect(decision.notes).to.contain(`${Math.round(event.minutes!)} minutes`).and.contain(`${((event.peakC * 9) / 5 + 32).toFixed(1)} °F`);
    }
  });

  it('lets lot TAE0611 meet its condition: the next wing-web vaccination comes before it expires, and the plan uses it', async () => {
    const lot = (await Lot.findOne({ where: { lotNumber: 'TAE0611' } }))!;
    const condition = (await HoldDecision.findAll()).find((d) => d.decision === 'release_with_condition')!;
    expect(condition.condition).to.match(/next wing-web vaccination/);
    const fennel = (await Site.findOne({ where: { code: 'FCP' } }))!;
    const [next] = await testContext().sequelize.query<{ planned_date: string }>(
      `SELECT v.planned_date::text FROM vaccinations v JOIN flocks f ON f.id = v.flock_id JOIN houses h ON h.id = f.house_id
        WHERE h.site_id = :siteId AND v.route = 'wing_web' AND v.planned_date >= :today ORDER BY v.planned_date LIMIT 1`,
      { replacements: { siteId: fennel.id, today: siteDay(fennel) }, type: QueryTypes.SELECT },
    );
    expect(next, 'a wing-web vaccination planned at Fennel Creek').to.not.equal(undefined);
    expect(next!.planned_date <= lot.expiry, `${next!.planned_date} on or before the expiry ${lot.expiry}`).to.equal(true);
    const projection = projectSite((await loadProjectionInput(fennel.id)).input);
    // Purchasing sees none of it lost; the lot it does show lost is the leftover emulsion nothing needs before it expires.
    expect(projection.alerts.expireUnused.map((a) => a.lotNumber)).to.deep.equal(['CNE0311']);
    const wingWeb = projection.vaccinations.find((v) => v.plannedDate === next!.planned_date && v.allocations.some((a) => a.label === 'TAE0611'));
    expect(wingWeb, 'the plan takes TAE0611 at that vaccination').to.not.equal(undefined);
  });

  it('has readings for every demo lot’s whole time in storage, but for the office fridge’s silent last three days', async () => {
    const sequelize = testContext().sequelize;
    const office = (await Fridge.findOne({ where: { code: 'LKN-F2' } }))!;
    // What no reading covers may only be the vaccine room logger's outage nine days ago (its gap, and the stretch its
    // backup filled: the lot exposure counts each 30-minute backup reading for 10 minutes only), or the time since a
    // fridge's last reading: never weeks before the readings began.
    const spans = await sequelize.query<{ fridge_id: number; starts_at: Date; ends_at: Date }>(
      'SELECT fridge_id, starts_at, ends_at FROM fridge_gaps UNION ALL SELECT fridge_id, starts_at, ends_at FROM backup_fills ORDER BY fridge_id, starts_at',
      { type: QueryTypes.SELECT },
    );
    // The fill and the gap after it meet end to end: one outage.
    const outages: { fridgeId: number; start: number; end: number }[] = [];
    for (const span of spans) {
      const [start, end] = [new Date(span.starts_at).getTime(), new Date(span.ends_at).getTime()];
      const last = outages[outages.length - 1];
      if (last && last.fridgeId === span.fridge_id && start <= last.end) last.end = Math.max(last.end, end);
      else outages.push({ fridgeId: span.fridge_id, start, end });
    }
    const lastReading = new Map(
      (await sequelize.query<{ fridge_id: number; last: Date }>('SELECT l.fridge_id, max(r.at) AS last FROM readings r JOIN loggers l ON l.id = r.logger_id GROUP BY l.fridge_id', { type: QueryTypes.SELECT }))
        .map((row) => [row.fridge_id, new Date(row.last).getTime()]),
    );
    expect(Date.now() - lastReading.get(office.id)!, 'the office fridge has had no data for three days').to.be.within(3 * 24 * HOUR - HOUR, 3 * 24 * HOUR + HOUR);
    for (const lot of await Lot.findAll({ order: [['lotNumber', 'ASC']] })) {
      const exposure = await computeLotExposure(sequelize, lot.id);
      if (exposure.storageMinutes === 0) continue;
      for (const stretch of exposure.unknown) {
        const what = `${lot.lotNumber}: ${stretch.minutes.toFixed(0)} min not known from ${new Date(stretch.start).toISOString()}`;
        if (stretch.reason === 'gap') {
          expect(outages.some((o) => o.fridgeId === stretch.fridgeId && o.start <= stretch.start && stretch.end <= o.end), what).to.equal(true);
        } else {
          expect(stretch.start, what).to.be.at.least(lastReading.get(stretch.fridgeId)!);
        }
      }
      if (lot.lotNumber === 'FIB0815') {
        // In the office fridge since the opening count, 13 weeks: only the logger's last three days are not known.
        expect(exposure.storageMinutes / 60, 'hours in storage').to.be.greaterThan(13 * 7 * 24 - 24);
        expect(exposure.minutesUnknown / 60, 'FIB0815 hours not known').to.be.within(3 * 24 - 1, 3 * 24 + 1);
      }
    }
  });

  it('keeps the day’s work at a farm’s hours on the site’s clock, and never issues a lot while it is held', async () => {
    const movements = await StockMovement.findAll({ order: [['at', 'ASC']] });
    expect(movements.length).to.be.greaterThan(10);
    for (const m of movements) {
      const zone = zoneOfFridge.get((m.fromFridgeId ?? m.toFridgeId)!)!;
      expect(localHour(m.at, zone), `${m.kind} ${m.reason || m.sourceKind} at ${m.at.toISOString()}`).to.be.within(5, 18);
    }
    const north = (await Site.findOne({ where: { code: 'LKN' } }))!;
    const clean = (await Shipment.findOne({ where: { trackingNumber: 'FW26010417' } }))!;
    expect(DateTime.fromJSDate(clean.arrivedAt, { zone: north.timeZone }).toFormat('HH:mm')).to.equal('07:40');
    // "Found warm during the morning restock": found in the morning, after the delivery was put away.
    const room = (await Fridge.findOne({ where: { code: 'LKN-F1' } }))!;
    const event = (await ExposureEvent.findOne({ where: { fridgeId: room.id, source: 'readings' } }))!;
    const record = (await TroubleshootingRecord.findOne({ where: { exposureEventId: event.id } }))!;
    expect(record.whatHappened).to.contain('morning restock');
    expect(localHour(record.foundAt!, north.timeZone)).to.be.within(7, 12);
    const stored = movements.find((m) => m.kind === 'receive' && m.toFridgeId === room.id)!;
    expect(stored.at.getTime()).to.be.below(event.startsAt.getTime());
    // No issue of a lot after a hold on it opened (none of the demo's holds was released before an issue).
    for (const issue of movements.filter((m) => m.kind === 'issue')) {
      const holds = await Hold.findAll({ where: { lotId: issue.lotId } });
      expect(holds.filter((h) => h.openedAt <= issue.at), `issue ${issue.id} of a held lot`).to.have.length(0);
    }
  });

  it('keeps the spray history a week a row, so the safety stock is still proposed from twelve weeks', async () => {
    const north = (await Site.findOne({ where: { code: 'LKN' } }))!;
    const spray = (await Product.findOne({ where: { name: 'Meadowline ND spray' } }))!;
    const proposal = await proposeSafetyStockFor(north.id, spray.id, 0.95);
    // Hand-computed: 36 vials of 5,000 doses over 12 weeks (the seeder's weekly use) is 15,000 doses a week.
    expect(proposal.weeks).to.equal(12);
    expect(proposal.meanWeeklyDoses).to.be.closeTo(15_000, 1e-6);
  });

  it('shows no vaccination as missed, and each programme step once per flock', async () => {
    const sequelize = testContext().sequelize;
    const open = await sequelize.query<{ flock: string; planned_date: string; today: string }>(
      `SELECT f.name AS flock, v.planned_date::text, (now() AT TIME ZONE s.time_zone)::date::text AS today
         FROM vaccinations v JOIN flocks f ON f.id = v.flock_id JOIN houses h ON h.id = f.house_id JOIN sites s ON s.id = h.site_id
        WHERE v.status IN ('planned', 'confirmed') AND v.planned_date < (now() AT TIME ZONE s.time_zone)::date`,
      { type: QueryTypes.SELECT },
    );
    expect(open.map((v) => `${v.flock} ${v.planned_date}`), 'planned before the site’s today').to.deep.equal([]);
    const repeated = await sequelize.query<{ flock_id: number; programme_step_id: number }>(
      'SELECT flock_id, programme_step_id FROM vaccinations WHERE programme_step_id IS NOT NULL GROUP BY 1, 2 HAVING count(*) > 1',
      { type: QueryTypes.SELECT },
    );
    expect(repeated).to.deep.equal([]);
    // Larkmoor North's past steps are closed as given on paper; the one pullet record is the 10-day step's own row.
    const closed = await sequelize.query<{ reason: string }>(
      `SELECT v.cancel_reason AS reason FROM vaccinations v JOIN flocks f ON f.id = v.flock_id JOIN houses h ON h.id = f.house_id JOIN sites s ON s.id = h.site_id
        WHERE s.code = 'LKN' AND v.status = 'cancelled'`,
      { type: QueryTypes.SELECT },
    );
    expect(closed.length).to.be.greaterThan(0);
    expect(closed.every((v) => v.reason === PAPER_RECORD)).to.equal(true);
    const [done] = await sequelize.query<{ step: number | null }>("SELECT programme_step_id AS step FROM vaccinations WHERE status = 'done'", { type: QueryTypes.SELECT });
    expect(done?.step, 'the recorded vaccination is a programme step').to.be.a('number');
  });

  it('has each record made by the role that makes it', async () => {
    // Daily checks are for storage staff and admins (the roles that write fridge records): their initials only.
    const writers = (await User.findAll()).filter((u) => u.roles.some((r) => r === 'storage' || r === 'admin'));
    const initials = new Set(writers.map((u) => u.name.split(/\s+/).filter((w) => /^[A-Z]/.test(w) && !w.endsWith('.')).map((w) => w[0]).join('')));
    const checks = await DailyCheck.findAll();
    expect(checks.length).to.be.greaterThan(10);
    expect([...new Set(checks.map((c) => c.initials))].filter((i) => !initials.has(i))).to.deep.equal([]);
    // A record lists the sprayer's cleaning steps only for a spray vaccination.
    const records = await testContext().sequelize.query<{ route: string; cleaning: Record<string, boolean> }>(
      'SELECT v.route, r.cleaning FROM vaccination_records r JOIN vaccinations v ON v.id = r.vaccination_id',
      { type: QueryTypes.SELECT },
    );
    expect(records.length).to.be.at.least(1);
    for (const record of records.filter((r) => r.route !== 'spray')) {
      expect(record.cleaning, record.route).to.include({ disassembled: false, tankDried: false, batteryRecharging: false });
    }
    // A flock not placed yet has no bird updates of its own.
    for (const flock of await Flock.findAll({ include: ['birdCounts', 'house'] })) {
      const site = (await Site.findByPk((flock as Flock & { house: { siteId: number } }).house.siteId))!;
      if (flock.placementDate > siteDay(site)) expect((flock as Flock & { birdCounts: unknown[] }).birdCounts, flock.name).to.have.length(0);
    }
  });
});
