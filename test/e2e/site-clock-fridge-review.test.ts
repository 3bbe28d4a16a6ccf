// In Chromium set to Tokyo: a Saskatchewan fridge's page and the review show its excursion, readings, imports and
// chart on the site's clock; a day picked for the chart starts at the site's midnight; the troubleshooting record's
// times are typed on the site's clock and shown back on it.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { ExposureEvent, TroubleshootingRecord } from '../../database/models/index.js';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createFridge, createLogger } from '../support/fridge-fixtures.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, signInAs, testApp, testPassword } from '../support/test-app.js';
import { holdsOf, lotIn, MIN, productWithRange, uploadTemps } from '../api/holds/hold-test-setup.js';

const settle = (page: Page) => page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
/** Intl puts a narrow no-break space before AM/PM: match any space. */
const spaced = (text: string) => new RegExp(text.replace(/[()]/g, '\\$&').replace(/ /g, '\\s'));
const HOUR = 60 * MIN;

describe('fridge and review times on the site’s clock in Chromium', () => {
  const suite = browserSuite();
  before(() => testApp());
  beforeEach(resetDatabase);

  it('shows the fridge page, its chart and the review on the site’s clock, and reads typed times on it', async function () {
    this.timeout(120_000);
    // America/Regina keeps UTC−6 (CST) all year (from memory: Saskatchewan does not change its clocks), so every expected
    // figure below is hand-computed without a DST table. The browser runs in Asia/Tokyo, UTC+9.
    const site = await createSite('REGF', 'America/Regina');
    const fridge = await createFridge(site, { code: 'REGF-F1' });
    const logger = await createLogger(fridge);
    // 36 h of 10-minute readings from 2026-11-20 00:00 UTC (18:00 CST the day before), 9 °C for 40 min from 18:00 UTC.
    const start = Date.UTC(2026, 10, 20, 0, 0);
    const temps = Array.from({ length: 36 * 6 }, (_, i) => (i >= 18 * 6 && i < 18 * 6 + 4 ? 9 : 4.5));
    const lot = await lotIn(fridge, await productWithRange(36, 46, 'F'), start - HOUR, 6);
    await createTestUser({ email: 'keeper@test.example', roles: ['storage', 'veterinarian'], sites: [site] });
    await uploadTemps(await signInAs(['storage']), logger.id, start, temps);
    expect(await holdsOf(lot)).to.have.length(1);
    // Each reading stands for the time until the next: four warm readings make 18:00–18:40 UTC (hand-computed).
    const event = (await ExposureEvent.findOne())!;
    expect([event.startsAt.toISOString(), event.endsAt.toISOString()]).to.deep.equal(['2026-11-20T18:00:00.000Z', '2026-11-20T18:40:00.000Z']);

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 1000 }, timezoneId: 'Asia/Tokyo' });
    try {
      const page = await context.newPage();
      await page.goto(`${suite.server.url}/sign-in`);
      await page.getByLabel('E-mail').fill('keeper@test.example');
      await page.getByLabel('Password', { exact: true }).fill(testPassword);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('navigation', { name: 'Main' }).waitFor();

      await page.goto(`${suite.server.url}/fridges/${fridge.id}`);
      // Hand-computed: the newest reading, 2026-11-21 11:50 UTC, is 05:50 CST.
      await page.getByText(spaced('newest reading Nov 21, 2026, 5:50 AM CST')).waitFor();
      const excursions = page.getByRole('table', { name: 'Excursions' });
      expect(await excursions.getByRole('row').nth(1).getByRole('cell').nth(1).innerText()).to.match(spaced('^Nov 20, 2026, 12:00 PM CST – 12:40 PM CST$'));
      const files = page.getByRole('table', { name: 'Uploaded files' });
      // The file's first reading, 00:00 UTC, is the evening before at the site.
      expect(await files.getByRole('row').nth(1).getByRole('cell').nth(3).innerText()).to.match(spaced('^11/19/26, 6:00 PM CST – 11/21/26, 5:50 AM CST$'));

      const chart = page.getByRole('region', { name: 'Temperatures', exact: true });
      await chart.getByText("The chart's data as a table (216 rows)").click();
      const data = chart.getByRole('table', { name: /chart data/ });
      await data.getByRole('columnheader', { name: 'Time at the site (CST)' }).waitFor();
      expect(await data.getByRole('row').nth(1).getByRole('cell').first().innerText()).to.match(spaced('^Nov 19, 2026, 6:00 PM CST$'));
      // A day picked for the chart starts at the site's midnight: 2026-11-20 00:00 CST is 06:00 UTC, so the range holds
      // the readings from 06:00 UTC to the newest, (35 h 50 min − 6 h) / 10 min + 1 = 180 (hand-computed).
      await chart.getByRole('radio', { name: 'Range' }).click();
      const fromDay = chart.getByLabel('From', { exact: true });
      expect(await fromDay.inputValue(), 'the week before the newest reading starts on the site’s Nov 14').to.equal('2026-11-14');
      await fromDay.fill('2026-11-20');
      await chart.getByText("The chart's data as a table (180 rows)").waitFor();
      expect(await data.getByRole('row').nth(1).getByRole('cell').first().innerText()).to.match(spaced('^Nov 20, 2026, 12:00 AM CST$'));
      await settle(page);
      await page.screenshot({ path: screenshotPath('site-clock-fridge'), fullPage: true });
      await expectAccessible(page, 'fridge page');

      await page.goto(`${suite.server.url}/review`);
      const card = page.locator('mat-card').filter({ hasText: 'Fridge excursion' });
      const fact = (name: string) => card.locator('dl.figures dt', { hasText: new RegExp(`^${name}$`) }).locator('xpath=following-sibling::dd[1]');
      await fact('From').waitFor();
      expect(await fact('From').innerText()).to.match(spaced('^Nov 20, 2026, 12:00 PM CST$'));
      expect(await fact('To').innerText()).to.match(spaced('^Nov 20, 2026, 12:40 PM CST$'));
      // The hold opened at the import (now): on the site's clock too.
      expect(await card.locator('mat-card-subtitle').innerText()).to.match(/^Since \w{3} \d{1,2}, \d{4}, \d{1,2}:\d\d\s[AP]M\sCST · /);

      await card.getByRole('button', { name: 'Fill in the troubleshooting record' }).click();
      const dialog = page.getByRole('dialog');
      await dialog.getByLabel('Found by').waitFor();
      await settle(page);
      expect(await dialog.getByText("At the site's clock (CST)", { exact: true }).count(), 'both time fields say whose clock').to.equal(2);
      await dialog.getByLabel('Found (date and time)').fill('2026-11-20T12:50');
      await dialog.getByLabel('Found by').fill('K. Ito');
      await dialog.getByLabel('Back in proper storage (date and time)').fill('2026-11-20T13:05');
      await page.screenshot({ path: screenshotPath('site-clock-troubleshooting') });
      await expectAccessible(page, 'troubleshooting dialog');
      await dialog.getByRole('button', { name: 'Save record' }).click();
      await dialog.waitFor({ state: 'detached' });
      // Hand-computed: 12:50 and 13:05 CST are 18:50 and 19:05 UTC.
      const record = (await TroubleshootingRecord.findOne())!;
      expect([record.foundAt?.toISOString(), record.backInStorageAt?.toISOString()]).to.deep.equal(['2026-11-20T18:50:00.000Z', '2026-11-20T19:05:00.000Z']);
      await fact('Found').filter({ hasText: 'K. Ito' }).waitFor();
      expect(await fact('Found').innerText()).to.match(spaced('^Nov 20, 2026, 12:50 PM CST by K. Ito$'));
      expect(await fact('Back in storage').innerText()).to.match(spaced('^Nov 20, 2026, 1:05 PM CST$'));
      // Opened again, the fields show the times as typed, on the site's clock.
      await card.getByRole('button', { name: 'Edit the troubleshooting record' }).click();
      await dialog.getByLabel('Found by').waitFor();
      expect(await dialog.getByLabel('Found (date and time)').inputValue()).to.equal('2026-11-20T12:50');
      await dialog.getByRole('button', { name: 'Cancel' }).click();
      await dialog.waitFor({ state: 'detached' });

      // The chart around the event: 12 h before its start (06:00 UTC, midnight at the site) to 12 h after its end,
      // (24 h 40 min) / 10 min + 1 = 149 readings (hand-computed).
      const eventChart = page.getByRole('region', { name: /Fridge chart around the event/ });
      await eventChart.scrollIntoViewIfNeeded();
      await eventChart.getByText("The chart's data as a table (149 rows)").click();
      const eventData = eventChart.getByRole('table', { name: /chart data/ });
      await eventData.getByRole('columnheader', { name: 'Time at the site (CST)' }).waitFor();
      expect(await eventData.getByRole('row').nth(1).getByRole('cell').first().innerText()).to.match(spaced('^Nov 20, 2026, 12:00 AM CST$'));
      await settle(page);
      await page.screenshot({ path: screenshotPath('site-clock-review'), fullPage: true });
      await expectAccessible(page, 'review page');
    } finally {
      await context.close();
    }
  });
});
