// A full vaccination day: trial, vials, mixing, returns, the reconciled record signed by the crew lead, the ledger, the PDFs and the CSV.
import { expect } from 'chai';
import { writeFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import type { Test } from 'supertest';
import { AuditEntry, StockBalance, Vaccination } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { signInAs, testContext } from '../../support/test-app.js';
import { firstPagePng, inkShare, pdfText } from '../../support/pdf-pages.js';
import { testPassword } from '../../support/test-app.js';
import { setUpDay, startDay, type DaySetup } from '../../support/vaccination-day-fixtures.js';
import { loadRunView } from '../../../api/vaccination-day/run-view.js';
import { makeJpeg } from '../../support/receiving-fixtures.js';

const base = (day: DaySetup) => `/api/vaccination-day/vaccinations/${day.vaccination.id}`;
const post = (day: DaySetup, path: string, body: object = {}) => day.lead.agent.post(`${base(day)}/${path}`).set('X-XSRF-TOKEN', day.lead.csrf).send(body);
const cleaning = { disassembled: true, washed: true, tankDried: true, batteryRecharging: true };
const artifacts = join(process.env.VIALYARD_RUNTIME_DIR ?? '.runtime', 'artifacts', 'pdf');

const binary = ((res: NodeJS.ReadableStream, done: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
}) as unknown as Parameters<Test['parse']>[0];

/** An instant on the test site's clock (Chicago) as Intl itself names it, apart from the server's formatter. */
function chicago(iso: string): { date: string; clock: string } {
  const format = new Intl.DateTimeFormat('en-US', { timeZone: 'America/Chicago', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZoneName: 'short' });
  const parts = Object.fromEntries(format.formatToParts(new Date(iso)).map((p) => [p.type, p.value]));
  return { date: `${parts.year}-${parts.month}-${parts.day}`, clock: `${parts.hour}:${parts.minute} ${parts.timeZoneName}` };
}
const onSiteClock = (iso: string) => `${chicago(iso).date} ${chicago(iso).clock}`;

/** The day up to the record: trial, 10 + 1 vials issued, mixed, 1 unopened vial back. */
async function runDay(day: DaySetup, options: { started?: boolean } = {}): Promise<void> {
  if (!options.started) await startDay(day);
  expect((await post(day, 'trial', { result: 'adjusted_retested', nozzleHeightCm: 90, walkingPaceMPerMin: 20, notes: 'Lowered the nozzle once.' })).status).to.equal(201);
  expect((await post(day, 'issues', { barcode: `(01)${day.gtin}(10)${day.lot.lotNumber}`, vials: 10 })).status).to.equal(201);
  expect((await post(day, 'issues', { lotNumber: day.lot.lotNumber, vials: 1 })).status).to.equal(201);
  expect((await post(day, 'mixings')).status).to.equal(201);
  expect((await post(day, 'returns', { lotId: day.lot.id, vials: 1, unopened: true })).status).to.equal(201);
}

describe('vaccination day: the record', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('keeps photos of the trial’s water-sensitive paper through the photo pipeline', async () => {
    const day = await setUpDay();
    const upload = () => day.lead.agent.post(`${base(day)}/trial/photos`).set('X-XSRF-TOKEN', day.lead.csrf);
    const early = await upload().attach('photos', await makeJpeg(320, 240), 'paper.jpg');
    expect(early.status, 'no trial yet').to.equal(409);
    expect(early.body.error.fields[0].field).to.equal('photos');
    await post(day, 'trial', { result: 'acceptable', nozzleHeightCm: 80, walkingPaceMPerMin: 18 });
    const added = await upload().attach('photos', await makeJpeg(320, 240), 'paper.jpg');
    expect(added.status, JSON.stringify(added.body)).to.equal(201);
    expect(added.body.trial.photoIds).to.have.length(1);
    const image = await day.lead.agent.get(`/api/vaccination-day/trial-photos/${added.body.trial.photoIds[0]}`).buffer(true).parse(binary).expect(200);
    expect(image.headers['content-type']).to.equal('image/jpeg');
    expect((image.body as Buffer).subarray(0, 2).toString('hex')).to.equal('ffd8');
    const notAPhoto = await upload().attach('photos', Buffer.from('not an image'), 'paper.jpg');
    expect(notAPhoto.status).to.be.oneOf([400, 415, 422]);
  });

  it('counts the label’s use-within time down from mixing', async () => {
    const day = await setUpDay();
    await startDay(day);
    expect((await post(day, 'mixings')).status, 'nothing issued yet').to.equal(409);
    await post(day, 'issues', { lotNumber: day.lot.lotNumber, vials: 10 });
    const mixed = await post(day, 'mixings');
    // Hand-computed: 60 minutes from mixing.
    expect(Date.parse(mixed.body.useBy) - Date.parse(mixed.body.mixedAt)).to.equal(60 * 60_000);
  });

  it('reconciles issued = used + returned per lot, then signs with the password; the vaccination is done', async () => {
    const day = await setUpDay();
    await startDay(day);
    const noTrial = await post(day, 'record', { birdsVaccinated: 0, cleaning, lots: [], password: testPassword });
    expect(noTrial.status).to.equal(409);
    await runDay(day, { started: true });
    const record = (body: object) => post(day, 'record', { birdsVaccinated: 9450, cleaning, deviations: '', lots: [{ lotId: day.lot.id, vialsUsed: 10 }], password: testPassword, ...body });

    const wrongPassword = await record({ password: 'not the password at all' });
    expect(wrongPassword.status).to.equal(400);
    expect(wrongPassword.body.error.fields[0].field).to.equal('password');
    // Hand-computed: 11 issued, 1 returned → 10 used; 9 used leaves 1 unaccounted for.
    const unbalanced = await record({ lots: [{ lotId: day.lot.id, vialsUsed: 9 }] });
    expect(unbalanced.status).to.equal(409);
    expect(unbalanced.body.error.fields[0].field).to.equal('lots.0.vialsUsed');
    expect(unbalanced.body.error.message).to.match(/1 unaccounted for/);
    const tooManyBirds = await record({ birdsVaccinated: 10_001 });
    expect(tooManyBirds.status).to.equal(422);
    expect(tooManyBirds.body.error.fields[0].field).to.equal('birdsVaccinated');
    const member = await signInAs(['crew'], [day.site]);
    expect((await member.agent.post(`${base(day)}/record`).set('X-XSRF-TOKEN', member.csrf)
      .send({ birdsVaccinated: 9450, cleaning, lots: [{ lotId: day.lot.id, vialsUsed: 10 }], password: testPassword })).status, 'only the crew lead signs').to.equal(403);

    const signed = await record({ deviations: 'Started 20 minutes late: feed line repair.' });
    expect(signed.status, JSON.stringify(signed.body)).to.equal(201);
    expect(signed.body.status).to.equal('done');
    expect(signed.body.record).to.include({ birdsVaccinated: 9450 });
    expect((await Vaccination.findByPk(day.vaccination.id))!.status).to.equal('done');
    expect(await AuditEntry.count({ where: { action: 'vaccination.record' } })).to.equal(1);
    expect((await record({})).status, 'signed once').to.equal(409);
    expect((await post(day, 'issues', { lotNumber: day.lot.lotNumber, vials: 1 })).status, 'no vials move after the record').to.equal(409);
    expect((await post(day, 'checks', { kind: 'battery', answers: { charged: true } })).status, 'no checks after the record').to.equal(409);
    expect(signed.body.lotsToTake, 'the lots out speak once vials left the fridge').to.deep.equal([]);
    const lines = await testContext().sequelize.query<{ vials_issued: number; vials_used: number; vials_returned: number; doses_used: number }>(
      'SELECT * FROM vaccination_record_lots', { type: QueryTypes.SELECT },
    );
    expect(lines).to.deep.equal([{ record_id: 1, lot_id: day.lot.id, vials_issued: 11, vials_used: 10, vials_returned: 1, doses_used: 10_000 }]);
  });

  it('signs a drinking-water vaccination with no sprayer trial and no sprayer cleaning; a spray one still needs both', async () => {
    const watered = await setUpDay({ code: 'WATER' });
    await Vaccination.update({ route: 'drinking_water' }, { where: { id: watered.vaccination.id } });
    await startDay(watered);
    const trial = await post(watered, 'trial', { result: 'acceptable', nozzleHeightCm: 80, walkingPaceMPerMin: 18 });
    expect(trial.status, 'no sprayer to try').to.equal(409);
    expect(trial.body.error.message).to.equal('No sprayer for a drinking water vaccination.');
    await post(watered, 'issues', { lotNumber: watered.lot.lotNumber, vials: 10 }).expect(201);
    await post(watered, 'mixings').expect(201);
    const signed = await post(watered, 'record', { birdsVaccinated: 9450, lots: [{ lotId: watered.lot.id, vialsUsed: 10 }], password: testPassword });
    expect(signed.status, JSON.stringify(signed.body)).to.equal(201);
    expect(signed.body.status).to.equal('done');
    expect(signed.body.trial).to.equal(null);
    const [stored] = await testContext().sequelize.query<{ cleaning: object }>('SELECT cleaning FROM vaccination_records WHERE vaccination_id = :id', { replacements: { id: watered.vaccination.id }, type: QueryTypes.SELECT });
    expect(stored!.cleaning, 'no sprayer steps kept for a route without a sprayer').to.deep.equal({});

    const sprayed = await setUpDay({ code: 'SPRAY' });
    await startDay(sprayed);
    await post(sprayed, 'issues', { lotNumber: sprayed.lot.lotNumber, vials: 10 }).expect(201);
    const record = (body: object = {}) => post(sprayed, 'record', { birdsVaccinated: 9450, cleaning, lots: [{ lotId: sprayed.lot.id, vialsUsed: 10 }], password: testPassword, ...body });
    const noTrial = await record();
    expect(noTrial.status, 'a spray record needs its trial').to.equal(409);
    expect(noTrial.body.error.fields[0].field).to.equal('trial');
    await post(sprayed, 'trial', { result: 'acceptable', nozzleHeightCm: 80, walkingPaceMPerMin: 18 }).expect(201);
    const noCleaning = await record({ cleaning: undefined });
    expect(noCleaning.status, 'a spray record needs its cleaning steps').to.equal(422);
    expect(noCleaning.body.error.fields[0].field).to.equal('cleaning');
    expect((await record()).status).to.equal(201);
  });

  it('leaves a ledger that balances after the day: received − issued + returned − discarded ± adjustments = on hand', async () => {
    const day = await setUpDay({ vials: 30 });
    await runDay(day);
    await post(day, 'record', { birdsVaccinated: 9450, cleaning, lots: [{ lotId: day.lot.id, vialsUsed: 10 }], password: testPassword });
    const [sums] = await testContext().sequelize.query<Record<string, string>>(
      `SELECT coalesce(sum(vials) FILTER (WHERE kind = 'receive'), 0) AS received, coalesce(sum(vials) FILTER (WHERE kind = 'issue'), 0) AS issued,
              coalesce(sum(vials) FILTER (WHERE kind = 'return'), 0) AS returned, coalesce(sum(vials) FILTER (WHERE kind = 'discard'), 0) AS discarded,
              coalesce(sum(CASE WHEN kind = 'adjust' AND to_fridge_id IS NOT NULL THEN vials WHEN kind = 'adjust' THEN -vials END), 0) AS adjusted
       FROM stock_movements WHERE lot_id = :lotId`,
      { replacements: { lotId: day.lot.id }, type: QueryTypes.SELECT },
    );
    const onHand = await StockBalance.sum('vials', { where: { lotId: day.lot.id } });
    const n = (k: string) => Number(sums![k]);
    // Hand-computed: 30 received − 11 issued + 1 returned = 20 on hand.
    expect(n('received') - n('issued') + n('returned') - n('discarded') + n('adjusted')).to.equal(onHand);
    expect(onHand).to.equal(20);
  });

  it('prints the mixing sheet and the flock’s record for audits, and exports the history as CSV', async () => {
    const day = await setUpDay();
    const vet = await signInAs(['veterinarian']);
    await vet.agent.post('/api/vaccination-day/water-volumes').set('X-XSRF-TOKEN', vet.csrf)
      .send({ productId: day.product.id, ageFromDays: 90, ageToDays: 120, mlPer1000Birds: 300, source: 'veterinarian' }).expect(201);
    await runDay(day);
    mkdirSync(artifacts, { recursive: true });

    const sheet = await day.lead.agent.get(`${base(day)}/mixing-sheet.pdf`).buffer(true).parse(binary).expect(200);
    const sheetText = pdfText(sheet.body as Buffer);
    writeFileSync(join(artifacts, 'mixing-sheet.pdf'), sheet.body as Buffer);
    writeFileSync(join(artifacts, 'mixing-sheet.png'), firstPagePng(sheet.body as Buffer));
    // Hand-computed: 9,500 birds at 300 mL per 1,000 → 2,850 mL; 10 vials out × 1,000 doses.
    expect(sheetText).to.include('2,850 mL');
    expect(sheetText).to.include(`Lot ${day.lot.lotNumber}: 10 vials out`);
    expect(sheetText).to.include('60 minutes from mixing');
    // Mixed and use-by on the site's clock with the zone's name, as every PDF prints times.
    const run = await loadRunView(testContext(), day.vaccination.id);
    expect(sheetText).to.include(`mixed ${chicago(run.mixedAt!).clock}, use by ${chicago(run.useBy!).clock}`);
    expect(sheetText).to.match(new RegExp(`Mixing sheet · vaccination ${day.vaccination.id} · Made by Vialyard on \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d C[SD]T`));
    expect(sheetText).to.not.match(/UTC/);
    expect(sheetText).to.match(/distilled, non-chlorinated water/);
    expect(sheetText).to.match(/protective equipment/);
    expect(sheetText).to.include('Follow the label and the veterinarian.');
    expect(await inkShare(firstPagePng(sheet.body as Buffer))).to.be.greaterThan(0.01);

    await post(day, 'record', { birdsVaccinated: 9450, cleaning: { ...cleaning, tankDried: false }, deviations: 'Tank left to dry overnight.', lots: [{ lotId: day.lot.id, vialsUsed: 10 }], password: testPassword });
    const flockId = (await Vaccination.findByPk(day.vaccination.id))!.flockId;
    const pdf = await day.lead.agent.get(`/api/vaccination-day/flocks/${flockId}/history.pdf`).buffer(true).parse(binary).expect(200);
    writeFileSync(join(artifacts, 'flock-record.pdf'), pdf.body as Buffer);
    writeFileSync(join(artifacts, 'flock-record.png'), firstPagePng(pdf.body as Buffer));
    const text = pdfText(pdf.body as Buffer);
    expect(text).to.include('Vaccination record');
    expect(text).to.include(day.product.name);
    expect(text).to.include('Birds vaccinated: 9,450');
    expect(text).to.include(`${day.lot.lotNumber} (10 vials used, 10,000 doses; 1 returned)`);
    expect(text).to.include(`Crew lead: ${day.lead.user.name}`);
    expect(text.replace(/\s+/g, ' ')).to.include('Tank dried: NOT done');
    expect(text).to.include('Tank left to dry overnight.');
    const [signed] = await testContext().sequelize.query<{ started_at: Date; ended_at: Date; signed_at: Date }>('SELECT started_at, ended_at, signed_at FROM vaccination_records', { type: QueryTypes.SELECT });
    const flat = text.replace(/\s+/g, ' ');
    expect(flat).to.include(`From ${onSiteClock(signed!.started_at.toISOString())} to ${onSiteClock(signed!.ended_at.toISOString())}`);
    expect(flat).to.include(`on ${onSiteClock(signed!.signed_at.toISOString())}: "`);
    expect(flat).to.match(/Vaccination record · flock .+ · Made by Vialyard on \d{4}-\d\d-\d\d \d\d:\d\d C[SD]T/);
    expect(text).to.not.match(/UTC/);
    expect(await inkShare(firstPagePng(pdf.body as Buffer))).to.be.greaterThan(0.01);

    const csv = await day.lead.agent.get(`/api/vaccination-day/flocks/${flockId}/history.csv`).expect(200);
    expect(csv.headers['content-type']).to.match(/text\/csv/);
    const rows = csv.text.trim().split('\r\n');
    expect(rows[0]).to.equal('date,product,route,age_days,birds_vaccinated,lots,vials_used,doses_used,vials_returned,started_at,ended_at,crew_lead,crew,deviations,signed_at');
    expect(rows).to.have.length(2);
    expect(rows[1]).to.include(`,spray,100,9450,${day.lot.lotNumber},10,10000,1,`);
  });

  it('prints the sprayer cleaning steps only for a spray vaccination, not for one by drinking water', async () => {
    const day = await setUpDay();
    await runDay(day);
    await post(day, 'record', { birdsVaccinated: 9450, cleaning: { ...cleaning, washed: false }, lots: [{ lotId: day.lot.id, vialsUsed: 10 }], password: testPassword }).expect(201);
    const flockId = (await Vaccination.findByPk(day.vaccination.id))!.flockId;
    const historyText = async (artifact: string) => {
      const pdf = (await day.lead.agent.get(`/api/vaccination-day/flocks/${flockId}/history.pdf`).buffer(true).parse(binary).expect(200)).body as Buffer;
      mkdirSync(artifacts, { recursive: true });
      writeFileSync(join(artifacts, artifact), pdf);
      return pdfText(pdf).replace(/\s+/g, ' ');
    };
    const sprayed = await historyText('flock-record-spray.pdf');
    expect(sprayed).to.include('Sprayer cleaning: Sprayer taken apart: done').and.include('Washed with mild detergent and water, no disinfectant: NOT done');
    // The same signed record as a drinking-water vaccination: no sprayer was used, so no sprayer step may read "NOT done".
    await Vaccination.update({ route: 'drinking_water' }, { where: { id: day.vaccination.id } });
    const watered = await historyText('flock-record-drinking-water.pdf');
    expect(watered).to.include('(drinking water)').and.include('Birds vaccinated: 9,450');
    expect(watered).to.not.include('Sprayer').and.not.include('NOT done').and.not.include('Tank dried');
  });
});
