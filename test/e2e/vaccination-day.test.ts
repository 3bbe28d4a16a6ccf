// In Chromium on a phone-sized screen: a crew lead runs a vaccination from the checks to the signed record.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { Hold, StockBalance, Vaccination } from '../../database/models/index.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';
import { createFlock, createHouse, createPresentation, createProduct, createSiteFridge, createVaccination, siteDay, stockLot } from '../support/flock-fixtures.js';
import { testGtin } from '../support/vaccination-day-fixtures.js';
import { makeJpeg } from '../support/receiving-fixtures.js';
import { browserSuite } from '../support/browser-suite.js';

async function expectAccessible(page: Page, what: string): Promise<void> {
  const violations = await seriousAccessibilityViolations(page);
  expect(violations, `${what}: ${describeViolations(violations)}`).to.have.length(0);
}

describe('the vaccination day in Chromium (phone)', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('a crew lead passes the checks, runs the trial, takes vials out by scan, mixes, returns one and signs the record', async function () {
    this.timeout(120_000);
    const site = await createSite('HILL');
    const fridge = await createSiteFridge(site);
    const product = await createProduct({ name: 'Spray vaccine H' });
    await product.update({ useWithinMinutes: 60, timeOutLimitMinutes: 120 });
    const presentation = await createPresentation(product, 1000);
    const gtin = testGtin();
    await presentation.update({ packGtin: gtin });
    const lot = await stockLot(fridge, presentation, 20, siteDay(site, 200), { lotNumber: 'HV3301' });
    const held = await stockLot(fridge, presentation, 4, siteDay(site, 200), { lotNumber: 'HV0999' });
    await Hold.create({ lotId: held.id, cause: 'excursion', sourceKind: 'test', sourceId: 1, reason: 'fridge warm', openedBy: null });
    const flock = await createFlock(await createHouse(site, 'House 2'), { name: 'Pullets 12', birds: 9_000, hatchDays: -28, placementDays: -27 });
    const vaccination = await createVaccination(flock, product, siteDay(site, 0), 'confirmed');
    await createTestUser({ email: 'lead@test.example', roles: ['crew'], sites: [site] });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, timezoneId: site.timeZone, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/`);
    await page.getByLabel('E-mail').fill('lead@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Today\'s vaccinations' }).waitFor();
    await page.getByText('Nothing on your sheet today.').waitFor();
    // The crew lead takes the site's day: the sheet then lists its confirmed vaccination.
    await page.getByRole('link', { name: 'Open the day sheet' }).click();
    await page.getByText(/No crew assigned on/).waitFor();
    await expectAccessible(page, 'empty day sheet');
    await page.getByRole('button', { name: 'Save the crew' }).click();
    await page.getByText('Crew lead: Test crew').waitFor();
    await page.getByRole('heading', { name: '1. Site HILL · House 2' }).waitFor();
    await page.goto(`${suite.server.url}/`);
    await page.getByText('1 vaccination, 0 done.').waitFor();
    await page.getByText('9 checks to do · 0 vials to return or record.').waitFor();
    await expectAccessible(page, 'home');
    await page.screenshot({ path: screenshotPath('vaccination-day-home'), fullPage: true });

    await page.getByRole('link', { name: 'Open the day sheet' }).click();
    await page.getByRole('heading', { name: '1. Site HILL · House 2' }).waitFor();
    await page.getByText('Lot HV3301: take 9 vials').waitFor();
    await expectAccessible(page, 'day sheet');
    await page.screenshot({ path: screenshotPath('vaccination-day-sheet'), fullPage: true });

    await page.getByRole('link', { name: 'Open' }).click();
    await page.getByRole('heading', { name: '1. Readiness checks' }).waitFor();
    await expectAccessible(page, 'run before checks');
    await page.screenshot({ path: screenshotPath('vaccination-day-checks'), fullPage: true });
    const checks = page.locator('vy-run-checks');
    for (let left = 9; left > 0; left--) {
      // Each passed check drops its form: wait for that before picking the next one.
      await page.waitForFunction((n) => document.querySelectorAll('vy-run-checks vy-check-form').length === n, left);
      const open = checks.locator('li').filter({ has: page.getByRole('button', { name: 'Record' }) }).first();
      for (const box of await open.getByRole('checkbox').all()) await box.check();
      if (await open.getByLabel('Expected temperature').count()) await open.getByLabel('Expected temperature').fill('68');
      const answered = page.waitForResponse((r) => r.url().includes('checks') && r.request().method() === 'POST');
      await open.getByRole('button', { name: 'Record' }).click();
      expect((await answered).status()).to.equal(201);
    }
    await page.waitForFunction(() => document.querySelectorAll('vy-run-checks vy-check-form').length === 0);
    await page.screenshot({ path: screenshotPath('vaccination-day-checks-passed'), fullPage: true });
    expect(await checks.getByText('Passed', { exact: true }).count()).to.equal(9);

    await page.getByLabel('Nozzle height (cm)').fill('90');
    await page.getByLabel('Walking pace (m per minute)').fill('20');
    await page.getByRole('radio', { name: 'Adjusted and retested' }).click();
    await page.getByRole('button', { name: 'Record the trial' }).click();
    await page.getByText('Adjusted and retested · nozzle 90 cm · 20 m/min').waitFor();
    await page.getByLabel('Add a photo of the paper (optional)').setInputFiles({ name: 'paper.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(480, 320) });
    await page.getByRole('img', { name: 'Water-sensitive paper from the trial' }).waitFor();
    expect(await page.getByRole('img', { name: 'Water-sensitive paper from the trial' }).evaluate((img: HTMLImageElement) => img.naturalWidth)).to.be.greaterThan(0);
    await page.getByRole('button', { name: 'Start the vaccination' }).click();
    // On the site's clock, named (the browser is in the site's zone here, Chicago: CST or CDT).
    await page.getByText(/Started \d{1,2}:\d\d\s[AP]M\sC[SD]T/).waitFor();

    await page.getByLabel('Scan or type the barcode').fill(`(01)${gtin}(10)HV0999`);
    await page.getByLabel('Vials', { exact: true }).fill('1');
    await page.getByRole('button', { name: 'Take out' }).click();
    await page.getByRole('alert').filter({ hasText: 'on hold' }).waitFor();
    // The field's own error fades in after the alert: let it settle before axe measures its contrast.
    await page.getByText('On hold.', { exact: true }).waitFor();
    await expectAccessible(page, 'refused held lot');
    await page.screenshot({ path: screenshotPath('vaccination-day-refused'), fullPage: true });
    await page.getByLabel('Scan or type the barcode').fill(`(01)${gtin}(10)HV3301`);
    await page.getByLabel('Vials', { exact: true }).fill('10');
    await page.getByRole('button', { name: 'Take out' }).click();
    await page.getByText('Lot HV3301: 10 issued, 0 returned').waitFor();

    await page.getByRole('button', { name: 'Mixed now' }).click();
    await page.getByRole('timer').filter({ hasText: /^(59|60):\d\d left$/ }).waitFor();
    await page.getByText('Follow the label and the veterinarian.').waitFor();
    await expectAccessible(page, 'mixing');
    await page.getByRole('heading', { name: '4. Mixing sheet' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath('vaccination-day-mixing') });

    await page.getByLabel('Unopened vials back').fill('1');
    await page.getByRole('checkbox', { name: 'These vials are unopened' }).check();
    await page.getByRole('button', { name: 'Back to the fridge' }).click();
    await page.getByText('Lot HV3301: 10 issued, 1 returned').waitFor();

    await page.getByLabel('Birds vaccinated').fill('8950');
    expect(await page.getByLabel('Lot HV3301: vials used (opened)').inputValue()).to.equal('9');
    for (const item of ['Sprayer taken apart', 'Washed with mild detergent and water, no disinfectant', 'Tank dried', 'Battery on charge']) {
      await page.getByRole('checkbox', { name: item }).check();
    }
    await page.getByLabel('Deviations').fill('None.');
    await page.getByLabel('Your password, to sign').fill(testPassword);
    await expectAccessible(page, 'record');
    await page.getByRole('heading', { name: '6. Record and sign' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath('vaccination-day-record') });
    await page.getByRole('button', { name: 'Sign the record' }).click();
    await page.getByText(/8950 birds vaccinated\. This vaccination is done\./).waitFor();
    await expectAccessible(page, 'done');
    await page.screenshot({ path: screenshotPath('vaccination-day-done'), fullPage: true });

    expect((await Vaccination.findByPk(vaccination.id))!.status).to.equal('done');
    expect((await StockBalance.findOne({ where: { lotId: lot.id, fridgeId: fridge.id } }))!.vials).to.equal(11);
    await context.close();
  });

  it('a drinking-water vaccination asks for no sprayer trial or sprayer cleaning, and signs without them', async function () {
    this.timeout(90_000);
    const site = await createSite('BROOK');
    const fridge = await createSiteFridge(site);
    const product = await createProduct({ name: 'Water vaccine B' });
    await stockLot(fridge, await createPresentation(product, 1000), 20, siteDay(site, 200), { lotNumber: 'WB2201' });
    const flock = await createFlock(await createHouse(site, 'House 5'), { name: 'Broilers 8', birds: 9_000, hatchDays: -14, placementDays: -13 });
    const vaccination = await createVaccination(flock, product, siteDay(site, 0), 'confirmed');
    await vaccination.update({ route: 'drinking_water' });
    const lead = await createTestUser({ email: 'water-lead@test.example', roles: ['crew'], sites: [site] });
    const sql = suite.server.context.sequelize;
    // Already started (the checks are covered above): the page goes straight to vials and the record.
    await sql.query('INSERT INTO crew_assignments (site_id, day, lead_id, assigned_by) VALUES (:siteId, :day, :leadId, :leadId)', { replacements: { siteId: site.id, day: siteDay(site, 0), leadId: lead.id } });
    await sql.query('INSERT INTO vaccination_starts (vaccination_id, started_by) VALUES (:id, :leadId)', { replacements: { id: vaccination.id, leadId: lead.id } });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, timezoneId: site.timeZone, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/`);
    await page.getByLabel('E-mail').fill('water-lead@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Today\'s vaccinations' }).waitFor();
    await page.goto(`${suite.server.url}/vaccination-day/${vaccination.id}`);
    await page.getByRole('heading', { name: '2. Sprayer trial' }).waitFor();
    await page.locator('vy-run-trial').getByText('No sprayer for a drinking water vaccination.').waitFor();
    expect(await page.getByRole('button', { name: 'Record the trial' }).count(), 'no trial asked').to.equal(0);
    await page.getByLabel('Or the lot number').fill('WB2201');
    await page.getByLabel('Vials', { exact: true }).fill('9');
    await page.getByRole('button', { name: 'Take out' }).click();
    await page.getByText('Lot WB2201: 9 issued, 0 returned').waitFor();
    await page.locator('vy-run-record').getByText('No sprayer for a drinking water vaccination. No sprayer cleaning to record.').waitFor();
    expect(await page.getByRole('checkbox', { name: 'Sprayer taken apart' }).count(), 'no sprayer cleaning asked').to.equal(0);
    // The cautions stay for every route.
    await page.getByText('Follow the label and the veterinarian.').waitFor();
    await page.getByText(/^Wear protective equipment/).waitFor();
    await page.getByLabel('Your password, to sign').fill(testPassword);
    await expectAccessible(page, 'drinking-water record');
    await page.getByRole('heading', { name: '6. Record and sign' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath('vaccination-day-drinking-water-record'), fullPage: true });
    await page.getByRole('button', { name: 'Sign the record' }).click();
    await page.getByText(/9000 birds vaccinated\. This vaccination is done\./).waitFor();
    expect((await Vaccination.findByPk(vaccination.id))!.status).to.equal('done');
    await context.close();
  });

  it('a veterinarian overrides a failed heat check with a reason and enters the label’s water volume', async function () {
    this.timeout(90_000);
    const site = await createSite('VALE');
    await site.update({ settings: { sprayHeatLimitF: 86 } });
    const fridge = await createSiteFridge(site);
    const product = await createProduct({ name: 'Spray vaccine V' });
    await product.update({ useWithinMinutes: 45, timeOutLimitMinutes: 90 });
    await stockLot(fridge, await createPresentation(product, 1000), 20, siteDay(site, 200), { lotNumber: 'VV1001' });
    const flock = await createFlock(await createHouse(site, 'House 4'), { name: 'Layers 3', birds: 12_000, hatchDays: -70, placementDays: -69 });
    const vaccination = await createVaccination(flock, product, siteDay(site, 0), 'confirmed');
    const crew = await createTestUser({ email: 'crew@test.example', roles: ['crew'], sites: [site] });
    const vet = await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });
    const sql = suite.server.context.sequelize;
    await sql.query('INSERT INTO crew_assignments (site_id, day, lead_id, assigned_by) VALUES (:siteId, :day, :leadId, :vetId)', { replacements: { siteId: site.id, day: siteDay(site, 0), leadId: crew.id, vetId: vet.id } });
    await sql.query(
      `INSERT INTO readiness_checks (day, lead_id, vaccination_id, check_kind, passed, details, recorded_by) VALUES (:day, :leadId, :vaccinationId, 'heat', false, :details, :leadId)`,
      { replacements: { day: siteDay(site, 0), leadId: crew.id, vaccinationId: vaccination.id, details: JSON.stringify({ message: 'Expected 92 °F is above this site\'s 86 °F: consider vaccinating at night, and follow the label and the veterinarian.' }) } },
    );

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, timezoneId: site.timeZone, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/`);
    await page.getByLabel('E-mail').fill('vet@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: /^Good (morning|afternoon|evening)/ }).waitFor();
    await page.goto(`${suite.server.url}/vaccination-day/${vaccination.id}`);
    await page.getByText('Expected 92 °F is above').waitFor();
    await page.getByLabel('Reason to go ahead').fill('Spraying before sunrise while it is still cool; I checked the house.');
    await page.getByRole('button', { name: 'Override' }).click();
    await page.getByText('Veterinarian Test veterinarian: Spraying before sunrise').waitFor();
    await page.getByLabel('mL of water per 1,000 birds').fill('250');
    await page.getByRole('button', { name: 'Save the water volume' }).click();
    // Hand-computed: 12,000 birds at 250 mL per 1,000 → 3,000 mL.
    await page.getByText('3,000 mL (250 mL per 1,000 birds, from the label)').waitFor();
    await expectAccessible(page, 'veterinarian on the run page');
    await page.getByText('Veterinarian Test veterinarian').scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath('vaccination-day-override') });
    const [row] = await sql.query('SELECT reason FROM readiness_overrides', { type: 'SELECT' as never }) as unknown as { reason: string }[];
    expect(row!.reason).to.match(/before sunrise/);
    await context.close();
  });
});
