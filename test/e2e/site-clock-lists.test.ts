// In Chromium set to Tokyo: the receiving list, the fridges list and the stock-count page show a farm's times on the
// farm's clock (Saskatchewan), named; and a receiving user sees the lot's fridges as codes, not links that bounce home.
import { randomUUID } from 'node:crypto';
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { Fridge, Shipment, StockCount } from '../../database/models/index.js';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createLogger } from '../support/fridge-fixtures.js';
import { createPresentation, createProduct, stockLot } from '../support/flock-fixtures.js';
import { createFridge } from '../support/receiving-fixtures.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';

async function signIn(page: Page, url: string, email: string): Promise<void> {
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

const DAY = 86_400_000;
const months = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
/** "2026-12-02" as en-US writes it: medium "Dec 2, 2026", short "12/2/26". */
const parts = (day: string) => day.split('-').map(Number) as [number, number, number];
const mediumDay = (day: string) => `${months[parts(day)[1] - 1]} ${parts(day)[2]}, ${parts(day)[0]}`;
const shortDay = (day: string) => `${parts(day)[1]}/${parts(day)[2]}/${String(parts(day)[0]).slice(2)}`;
/** Intl puts a narrow no-break space before AM/PM: match any space there. */
const spaced = (text: string) => new RegExp(text.replace(/ /g, '\\s'));

describe('list and count times on the site’s clock in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  // America/Regina keeps UTC−6 (CST) all year (from memory: it does not change its clocks), Asia/Tokyo UTC+9: every
  // expected text below is hand-computed from those two offsets. Each instant is late enough in the UTC day that Tokyo
  // is already on the next day, so a page on the browser's clock would show another date as well as another hour.
  it('shows a shipment’s arrival, a fridge’s newest reading and a stock count at the farm’s time, named CST', async function () {
    this.timeout(120_000);
    const site = await createSite('REGL', 'America/Regina');
    const fridge = await createFridge(site, 'REGL-F1');
    const user = await createTestUser({ email: 'keeper@test.example', roles: ['receiving', 'storage'], sites: [site] });
    const day = new Date(Date.now() - 2 * DAY).toISOString().slice(0, 10);
    const nextDay = new Date(Date.parse(`${day}T00:00:00Z`) + DAY).toISOString().slice(0, 10);
    const dueDay = new Date(Date.parse(`${day}T00:00:00Z`) + 30 * DAY).toISOString().slice(0, 10);

    // 18:30 UTC: 12:30 PM in Regina that day, 3:30 AM the next day in Tokyo.
    await Shipment.create({
      siteId: site.id, purchaseOrderId: null, supplierId: null, clientKey: randomUUID(), arrivedAt: new Date(`${day}T18:30:00Z`), shippedAt: null,
      containerIntact: true, coolantPresent: true, indicator: 'none', contentsCold: true,
      readingValue: null, readingUnit: null, readingPlace: null, outcome: 'accepted', receivedBy: user.id, reportMailedAt: null,
    });
    // 21:05 UTC: 3:05 PM in Regina, 6:05 AM the next day in Tokyo.
    const logger = await createLogger(fridge);
    await Fridge.sequelize!.query('INSERT INTO readings (logger_id, at, temp_c) VALUES (:id, :at, 4.5)', { replacements: { id: logger.id, at: `${day}T21:05:00Z` } });
    // 23:40 UTC: 5:40 PM in Regina, 8:40 AM the next day in Tokyo. Counted empty, nothing received since: not due, so
    // the page says when it was counted and the day the next count is due (30 days on: still that evening in Regina).
    await StockCount.create({ fridgeId: fridge.id, countedAt: new Date(`${day}T23:40:00Z`), countedBy: user.id });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 }, timezoneId: 'Asia/Tokyo' });
    try {
      const page = await context.newPage();
      await signIn(page, suite.server.url, 'keeper@test.example');

      await page.goto(`${suite.server.url}/receiving`);
      const when = page.locator('.recent .when').first();
      await when.waitFor();
      expect(await when.innerText()).to.match(spaced(`^${shortDay(day)}, 12:30 PM CST$`));
      await page.screenshot({ path: screenshotPath('site-clock-receiving-list'), fullPage: true });
      await expectAccessible(page, 'receiving list');

      await page.goto(`${suite.server.url}/fridges`);
      const row = page.getByRole('row', { name: /REGL-F1/ });
      await row.waitFor();
      expect(await row.getByRole('cell').nth(3).innerText()).to.match(spaced(`^${mediumDay(day)}, 3:05 PM CST$`));
      await expectAccessible(page, 'fridges list');

      await page.goto(`${suite.server.url}/fridges/${fridge.id}/count`);
      await page.getByRole('heading', { name: 'Stock count · REGL-F1' }).waitFor();
      expect(await page.locator('p.due').innerText()).to.match(
        spaced(`^Last counted ${mediumDay(day)}, 5:40 PM CST; next count due by ${mediumDay(dueDay)} or after the next delivery\\.$`),
      );
      const recent = page.getByRole('region', { name: 'Recent counts' }).getByRole('heading', { level: 3 });
      expect(await recent.innerText()).to.match(spaced(`^${mediumDay(day)}, 5:40 PM CST · Test receiving storage$`));
      // The browser's own clock would have said the next day (hand-computed above): make sure it does not.
      expect(await page.locator('p.due').innerText()).not.to.contain(mediumDay(nextDay));
      await page.screenshot({ path: screenshotPath('site-clock-stock-count'), fullPage: true });
      await expectAccessible(page, 'stock-count page');

      // The fridge page's note gives the same day on the site's calendar.
      await page.goto(`${suite.server.url}/fridges/${fridge.id}`);
      await page.getByText(`Stock last counted ${mediumDay(day)}.`, { exact: true }).waitFor();
    } finally {
      await context.close();
    }
  });

  it('shows a receiving user the lot’s fridge as its code, not a link the fridge page would refuse', async function () {
    this.timeout(90_000);
    const site = await createSite('LKN', 'America/Regina');
    const fridge = await createFridge(site, 'LKN-F2');
    const lot = await stockLot(fridge, await createPresentation(await createProduct({ name: 'Lakeside ND drops' }), 1000), 6, '2030-01-31', { lotNumber: 'LKN4401' });
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [site] });
    await createTestUser({ email: 'storage@test.example', roles: ['storage'], sites: [site] });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    try {
      const page = await context.newPage();
      await signIn(page, suite.server.url, 'clerk@test.example');
      await page.goto(`${suite.server.url}/lots/${lot.id}`);
      const where = page.getByRole('region', { name: 'Where its vials are' });
      await where.getByText('LKN-F2 · Site LKN · 6 vials').waitFor();
      expect(await page.getByRole('link', { name: 'LKN-F2' }).count(), 'no fridge link for receiving').to.equal(0);
      const received = page.getByRole('row', { name: /Received/ });
      expect(await received.getByRole('cell').nth(4).innerText()).to.match(/^LKN-F2\s·\sSite LKN$/);
      await page.screenshot({ path: screenshotPath('lot-fridge-as-text'), fullPage: true });
      await expectAccessible(page, 'lot page for receiving');
    } finally {
      await context.close();
    }

    // Storage staff read fridges: for them the codes stay links (both places).
    const storage = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    try {
      const page = await storage.newPage();
      await signIn(page, suite.server.url, 'storage@test.example');
      await page.goto(`${suite.server.url}/lots/${lot.id}`);
      await page.getByRole('region', { name: 'Where its vials are' }).getByRole('link', { name: 'LKN-F2' }).waitFor();
      expect(await page.getByRole('link', { name: 'LKN-F2' }).count()).to.equal(2);
    } finally {
      await storage.close();
    }
  });
});
