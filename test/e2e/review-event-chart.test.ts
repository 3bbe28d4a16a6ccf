// In Chromium: the review shows the fridge chart around an event (12 h either side, the product's range as the
// band) with its table alternative, and the recall dialog offers a product to narrow the recall to.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { ExposureEvent, Hold, Recall } from '../../database/models/index.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, signInAs, testApp, testPassword } from '../support/test-app.js';
import { createFridge, createLogger } from '../support/fridge-fixtures.js';
import { browserSuite } from '../support/browser-suite.js';
import { createPresentation, stockLot } from '../support/flock-fixtures.js';
import { holdsOf, lotIn, MIN, productWithRange, uploadTemps } from '../api/holds/hold-test-setup.js';

async function expectAccessible(page: Page): Promise<void> {
  const violations = await seriousAccessibilityViolations(page);
  expect(violations, describeViolations(violations)).to.have.length(0);
}

describe('the fridge chart around a review event, and the recall product picker, in Chromium', () => {
  const suite = browserSuite();
  before(() => testApp());
  beforeEach(resetDatabase);

  it('draws the readings from 12 h before to 12 h after the event, with the product range as the band and a table', async () => {
    const site = await createSite('CHT');
    const fridge = await createFridge(site);
    const logger = await createLogger(fridge);
    // A recent event, so the 12 h after it are in the past: two days of 10-minute readings, 40 min warm in the middle.
    const start = Math.floor((Date.now() - 2 * 86_400_000) / (10 * MIN)) * 10 * MIN;
    const temps = Array.from({ length: 36 * 6 }, (_, i) => (i >= 18 * 6 && i < 18 * 6 + 4 ? 9 : 4.5));
    const lot = await lotIn(fridge, await productWithRange(36, 46, 'F'), start - 60 * MIN, 6);
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });
    await uploadTemps(await signInAs(['storage']), logger.id, start, temps);
    expect(await holdsOf(lot)).to.have.length(1);
    const event = (await ExposureEvent.findOne())!;
    // Hand-computed: readings every 10 min, both ends of the chart's range included, so the window from 12 h before
    // the event to 12 h after it holds (24 h + its length) / 10 min + 1 readings; a week ending there holds all from the file's start.
    const HOUR = 60 * MIN;
    const windowRows = (event.endsAt.getTime() + 12 * HOUR - (event.startsAt.getTime() - 12 * HOUR)) / (10 * MIN) + 1;
    const weekRows = (event.endsAt.getTime() + 12 * HOUR - start) / (10 * MIN) + 1;
    expect(event.startsAt.getTime()).to.equal(start + 18 * HOUR);

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 1000 } });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/`);
    await page.getByLabel('E-mail').fill('vet@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review' }).click();
    const chart = page.getByRole('region', { name: /Fridge chart around the event/ });
    await chart.scrollIntoViewIfNeeded();
    await chart.waitFor();
    const summary = chart.locator('p.summary');
    await summary.filter({ hasText: 'every reading' }).waitFor();
    expect(await summary.innerText()).to.match(/the shaded band is the product range\.$/);
    expect(await chart.getByRole('radio', { name: 'Around the event' }).getAttribute('aria-checked')).to.equal('true');
    await chart.getByText(`The chart's data as a table (${windowRows} rows)`).click();
    const table = chart.getByRole('table', { name: /chart data/ });
    await table.waitFor();
    // The warm readings are 12 h into the window, rows 73–76: the second page of 50.
    await chart.getByRole('button', { name: 'Next page' }).click();
    expect(await table.getByRole('cell', { name: '48.2', exact: true }).count(), '9 °C is 48.2 °F, four readings (hand-computed)').to.equal(4);
    await page.screenshot({ path: screenshotPath('review-event-chart'), fullPage: true });
    await expectAccessible(page);

    // Another span, then back to the event's window.
    await chart.getByRole('radio', { name: 'Week' }).click();
    await chart.getByText(`The chart's data as a table (${weekRows} rows)`).waitFor();
    await chart.getByRole('radio', { name: 'Around the event' }).click();
    await chart.getByText(`The chart's data as a table (${windowRows} rows)`).waitFor();
    await context.close();
  });

  it('places a recall narrowed to the chosen product', async () => {
    const site = await createSite('RCL');
    const fridge = await createFridge(site);
    const wanted = await productWithRange(35, 45, 'F');
    const other = await productWithRange(35, 45, 'F');
    await wanted.update({ name: 'Recall product A' });
    await other.update({ name: 'Recall product B' });
    const lotA = await stockLot(fridge, await createPresentation(wanted, 1000), 4, '2030-01-31', { lotNumber: 'SAME01' });
    const lotB = await stockLot(fridge, await createPresentation(other, 1000), 4, '2030-01-31', { lotNumber: 'same01' });
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/review`);
    await page.getByLabel('E-mail').fill('vet@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('button', { name: 'Place a recall' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Lot number').fill('SAME01');
    await dialog.getByRole('combobox', { name: 'Product (optional)' }).click();
    await page.getByRole('option', { name: 'Recall product A' }).click();
    await dialog.getByLabel('Reason').fill('Maker notice (test)');
    await page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('review-recall-product') });
    await dialog.getByRole('button', { name: 'Recall' }).click();
    await dialog.waitFor({ state: 'detached' });
    const recall = await Recall.findOne();
    expect(recall).to.include({ lotNumber: 'SAME01', productId: wanted.id });
    expect(await Hold.count({ where: { lotId: lotA.id, cause: 'recall' } })).to.equal(1);
    expect(await Hold.count({ where: { lotId: lotB.id, cause: 'recall' } }), 'the other product keeps its lot').to.equal(0);
    await context.close();
  });
});
