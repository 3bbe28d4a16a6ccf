// In Chromium set to Tokyo: the receiving form reads its times on the site's clock (a farm in Saskatchewan), the
// shipment and lot pages show them on it, and a transfer between two farms zones apart reads each time on its own
// site's clock.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { Shipment, ShipmentLine, StockMovement } from '../../database/models/index.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createPresentation, createProduct, stockLot } from '../support/flock-fixtures.js';
import { createCatalogue, createFridge, createPurchaseOrder } from '../support/receiving-fixtures.js';
import { clearPhotoFiles } from '../support/receiving-state.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';

const settle = (page: Page) => page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
const DAY = 86_400_000;
/** "Dec 2, 2026" of a calendar day, as the en-US medium date writes it. */
const mediumDay = (day: string) => new Date(`${day}T12:00:00Z`).toLocaleDateString('en-US', { month: 'short', day: 'numeric', year: 'numeric', timeZone: 'UTC' });
/** Intl puts a narrow no-break space before AM/PM: match any space there. */
const spaced = (text: string) => new RegExp(`^${text.replace(/ /g, '\\s')}$`);

async function signIn(page: Page, url: string, email: string): Promise<void> {
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

describe('receiving and lot times on the site’s clock in Chromium', () => {
  const suite = browserSuite();
  beforeEach(async () => {
    await resetDatabase();
    clearPhotoFiles();
  });

  // America/Regina keeps UTC−6 (CST) all year and Pacific/Honolulu UTC−10 (HST) (from memory: neither changes its
  // clocks), so every expected figure below is hand-computed without a DST table. Asia/Tokyo is UTC+9.
  it('reads Arrived at, Shipped at and Went in at on the site’s clock and shows them so on the shipment page', async function () {
    this.timeout(120_000);
    const site = await createSite('REGR', 'America/Regina');
    await createFridge(site, 'REGR-F1');
    const catalogue = await createCatalogue({ name: 'Prairie ND spray', packGtin: '09506000134352' });
    const order = await createPurchaseOrder(site, catalogue, { expectedDate: siteLocalDate(new Date(), site.timeZone), packs: 2 });
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [site] });
    const day = siteLocalDate(new Date(Date.now() - 2 * DAY), site.timeZone);
    const dayBefore = siteLocalDate(new Date(Date.now() - 3 * DAY), site.timeZone);

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 }, timezoneId: 'Asia/Tokyo' });
    try {
      const page = await context.newPage();
      await signIn(page, suite.server.url, 'clerk@test.example');
      await page.goto(`${suite.server.url}/receiving/new?site=${site.id}&order=${order.id}`);
      await page.getByText('Lot 1: scan or type').waitFor();
      const arrived = page.getByLabel('Arrived at');
      // A new shipment arrives "now" on the site's clock: UTC − 6 h (hand-computed), 15 hours behind the browser's.
      await page.waitForFunction(() => (document.querySelector('input[formcontrolname="arrivedAt"]') as HTMLInputElement | null)?.value !== '');
      const shownNow = Date.parse(`${await arrived.inputValue()}:00Z`) + 6 * 3_600_000;
      expect(Math.abs(shownNow - Date.now()), 'the default arrival is now at the site').to.be.below(2 * 60_000);
      await page.getByText("At the site's clock (CST)", { exact: true }).waitFor();

      await arrived.fill(`${day}T07:15`);
      await page.getByText('Tracking and shipping time').click();
      await page.getByLabel('Shipped at (if known)').fill(`${dayBefore}T13:15`);
      await page.getByText("At the site's clock (CST). Over 48 h in transit is flagged.").waitFor();
      await page.getByRole('button', { name: 'All checks fine' }).click();
      await page.keyboard.type('39.5');
      await page.getByRole('radio', { name: 'Probe' }).or(page.getByRole('button', { name: 'Probe' })).first().click();
      await page.keyboard.type(`01${catalogue.presentation.packGtin}17280331` + '10PRA2201');
      await page.keyboard.press('Enter');
      await page.getByRole('heading', { name: /Lot PRA2201/ }).waitFor();
      const storage = page.getByRole('region', { name: 'Into the fridge' });
      await storage.getByLabel('Went in at').fill(`${day}T07:40`);
      // 25 min after the arrival, within the site's 30: nothing to find (the two times read on one clock).
      await page.getByText('No discrepancy so far.').waitFor();
      await settle(page);
      await page.screenshot({ path: screenshotPath('site-clock-receiving-form'), fullPage: true });
      await expectAccessible(page, 'receiving form');

      await page.getByRole('button', { name: 'Save and put into stock' }).click();
      await page.getByRole('heading', { name: /^Shipment \d+$/ }).waitFor();
      // Hand-computed: 07:15, 07:40 and 13:15 the day before at UTC−6 are 13:15, 13:40 and 19:15 UTC.
      const shipment = (await Shipment.findOne())!;
      expect(shipment.arrivedAt.toISOString()).to.equal(`${day}T13:15:00.000Z`);
      expect(shipment.shippedAt?.toISOString()).to.equal(`${dayBefore}T19:15:00.000Z`);
      expect((await ShipmentLine.findOne())!.storedAt?.toISOString()).to.equal(`${day}T13:40:00.000Z`);

      const fact = (name: string) => page.locator('dl.facts dt', { hasText: name }).locator('xpath=following-sibling::dd[1]');
      expect(await fact('Arrived').innerText()).to.match(spaced(`${mediumDay(day)}, 7:15 AM CST`));
      expect(await fact('In transit').innerText()).to.equal('18.0 h');
      expect(await page.getByText('20 vials into').innerText()).to.match(/^20 vials into Fridge REGR-F1.* at 7:40\sAM\sCST$/);
      await page.screenshot({ path: screenshotPath('site-clock-shipment'), fullPage: true });
      await expectAccessible(page, 'shipment page');
    } finally {
      await context.close();
    }
  });

  it('reads a transfer’s leaving time on the sending site’s clock and its arrival on the receiving one’s', async function () {
    this.timeout(90_000);
    const regina = await createSite('REGT', 'America/Regina');
    const honolulu = await createSite('HNLT', 'Pacific/Honolulu');
    const from = await createFridge(regina, 'REGT-F1');
    const to = await createFridge(honolulu, 'HNLT-F1');
    const product = await createProduct({ name: 'Island IB spray' });
    await product.update({ timeOutLimitMinutes: 30 });
    const lot = await stockLot(from, await createPresentation(product, 1000), 10, '2030-01-31', { lotNumber: 'ISL3301' });
    await createTestUser({ email: 'storage@test.example', roles: ['storage'], sites: [regina, honolulu] });
    // A UTC day two days ago: 15:00 UTC is 09:00 in Regina and 15:20 UTC is 05:20 in Honolulu, both on that day.
    const day = new Date(Date.now() - 2 * DAY).toISOString().slice(0, 10);

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 }, timezoneId: 'Asia/Tokyo' });
    try {
      const page = await context.newPage();
      await signIn(page, suite.server.url, 'storage@test.example');
      await page.goto(`${suite.server.url}/lots/${lot.id}`);
      await page.getByRole('button', { name: 'Transfer vials' }).click();
      const dialog = page.getByRole('dialog');
      await dialog.getByRole('heading', { name: 'Transfer vials of lot ISL3301' }).waitFor();
      await settle(page);
      await dialog.getByText("At the sending site's clock (CST)", { exact: true }).waitFor();
      await dialog.getByRole('combobox', { name: 'To fridge' }).click();
      await page.getByRole('option', { name: /HNLT-F1/ }).click();
      await settle(page);
      await dialog.getByText("At the receiving site's clock (HST)", { exact: true }).waitFor();
      await dialog.getByLabel('Vials').fill('4');
      await dialog.getByLabel('Left the fridge at').fill(`${day}T09:00`);
      await dialog.getByLabel('Arrived at').fill(`${day}T05:20`);
      await page.screenshot({ path: screenshotPath('site-clock-transfer-dialog') });
      await expectAccessible(page, 'transfer dialog');
      await dialog.getByRole('button', { name: 'Record transfer' }).click();
      await dialog.waitFor({ state: 'detached' });
      // Hand-computed: 09:00 CST is 15:00 UTC, 05:20 HST is 15:20 UTC: 20 minutes out, under the 30-minute limit.
      await page.locator('mat-snack-bar-container').getByText('Moved. 20 min out of a fridge.', { exact: true }).waitFor();
      const moved = (await StockMovement.findOne({ where: { kind: 'transfer' } }))!;
      expect(moved.leftAt?.toISOString()).to.equal(`${day}T15:00:00.000Z`);
      expect(moved.at.toISOString()).to.equal(`${day}T15:20:00.000Z`);

      const row = page.getByRole('row', { name: /Transferred/ });
      await row.waitFor();
      const when = row.getByRole('cell').first();
      expect(await when.innerText()).to.match(spaced(`${mediumDay(day)}, 5:20 AM HST\nleft 9:00 AM CST`));
      await row.scrollIntoViewIfNeeded();
      await page.screenshot({ path: screenshotPath('site-clock-lot-history') });
      await expectAccessible(page, 'lot page after the transfer');
    } finally {
      await context.close();
    }
  });
});
