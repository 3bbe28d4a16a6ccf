// Usability: receiving 3 lots and 2 photos on a phone, counted by a listener in the page (clicks and non-character keys).
import { expect } from 'chai';
import type { Browser } from 'playwright-core';
import { startServer, type RunningServer } from '../../api/server.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { gtinCheckDigit } from '../../shared/barcode/index.js';
import { Presentation, PurchaseOrderLine, StockBalance } from '../../database/models/index.js';
import { describeViolations, launchBrowser, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testConfig, testPassword } from '../support/test-app.js';
import { createCatalogue, createFridge, createPurchaseOrder, makeJpeg } from '../support/receiving-fixtures.js';
import { clearPhotoFiles } from '../support/receiving-state.js';

/** Our own target for this walk (hand-set): at most 20 counted actions. */
const TARGET = 20;

declare global {
  interface Window {
    vyActions: { clicks: number; keys: number; log: string[] };
  }
}

describe('receiving usability', () => {
  let server: RunningServer;
  let browser: Browser;

  before(async function () {
    this.timeout(90_000);
    await resetDatabase();
    clearPhotoFiles();
    server = await startServer(testConfig({ VIALYARD_PORT: '0' }));
    browser = await launchBrowser();
  });
  after(async () => {
    await browser?.close();
    await server?.close();
  });

  it(`3 lots and 2 photos take at most ${TARGET} clicks and non-character key presses (typed values and scans excluded)`, async function () {
    this.timeout(120_000);
    const site = await createSite('LKN');
    await createFridge(site, 'LKN-F1');
    const catalogue = await createCatalogue({ packGtin: '09506000134352' });
    const gtins = ['09506000134352', `0950600013436${gtinCheckDigit('0950600013436')}`, `0950600013437${gtinCheckDigit('0950600013437')}`];
    const second = await Presentation.create({ productId: catalogue.product.id, dosesPerVial: 2000, vialsPerPack: 10, packGtin: gtins[1]!, vialGtin: null, unitPrice: null, proposedBy: null, proposedAt: null });
    const third = await Presentation.create({ productId: catalogue.product.id, dosesPerVial: 5000, vialsPerPack: 10, packGtin: gtins[2]!, vialGtin: null, unitPrice: null, proposedBy: null, proposedAt: null });
    const order = await createPurchaseOrder(site, catalogue, { expectedDate: siteLocalDate(new Date(), site.timeZone), packs: 1 });
    await PurchaseOrderLine.create({ purchaseOrderId: order.id, lineNo: 2, presentationId: second.id, packs: 1 });
    await PurchaseOrderLine.create({ purchaseOrderId: order.id, lineNo: 3, presentationId: third.id, packs: 1 });
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [site] });

    const context = await browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await context.newPage();
    await page.addInitScript(() => {
      window.vyActions = { clicks: 0, keys: 0, log: [] };
      // Capture phase, so a handler that stops propagation cannot hide an action; only the person's own events count.
      document.addEventListener('click', (event) => {
        if (!event.isTrusted) return;
        window.vyActions.clicks++;
        window.vyActions.log.push(`click ${(event.target as HTMLElement).closest('button,a,input,mat-option,[role]')?.textContent?.trim().slice(0, 30) ?? ''}`);
      }, true);
      document.addEventListener('keydown', (event) => {
        if (!event.isTrusted || event.key.length === 1) return;
        window.vyActions.keys++;
        window.vyActions.log.push(`key ${event.key}`);
      }, true);
    });
    try {
      await page.goto(`${server.url}/sign-in`);
      await page.getByLabel('E-mail').fill('clerk@test.example');
      await page.getByLabel('Password', { exact: true }).fill(testPassword);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('heading', { level: 1 }).filter({ hasText: /Good/ }).waitFor();
      await page.goto(`${server.url}/receiving`);
      await page.getByRole('link', { name: `Receive order ${order.reference}` }).waitFor();
      // The walk starts here, on the receiving home; the counters start from zero on this page load.
      expect(await page.evaluate(() => window.vyActions.clicks + window.vyActions.keys)).to.equal(0);

      await page.getByRole('link', { name: `Receive order ${order.reference}` }).click();
      await page.getByRole('button', { name: 'All checks fine' }).click();
      await page.keyboard.type('40');
      await page.getByRole('button', { name: 'Probe' }).or(page.getByRole('radio', { name: 'Probe' })).first().click();
      // The scan field takes the focus once the reading is placed; the scanner types into it.
      for (const [index, gtin] of gtins.entries()) {
        // A hand scanner types the element string and ends with Enter (counted, to be strict).
        await page.keyboard.type(`01${gtin}17280300` + `10LOT${index + 1}A`);
        await page.keyboard.press('Enter');
        await page.getByRole('heading', { name: new RegExp(`Lot LOT${index + 1}A`) }).waitFor();
      }
      for (const name of ['box.jpg', 'contents.jpg']) {
        const chooser = page.waitForEvent('filechooser');
        await page.getByRole('button', { name: 'Take a photo' }).click();
        await (await chooser).setFiles({ name, mimeType: 'image/jpeg', buffer: await makeJpeg(640, 480) });
        await page.getByRole('img', { name: new RegExp(name) }).waitFor();
      }
      await page.getByRole('button', { name: 'Save and put into stock' }).click();
      await page.getByRole('heading', { name: /^Shipment \d+$/ }).waitFor();
      await page.screenshot({ path: screenshotPath('usability-done-phone'), fullPage: true });
      const violations = await seriousAccessibilityViolations(page);
      expect(violations, describeViolations(violations)).to.have.length(0);

      const actions = await page.evaluate(() => window.vyActions);
      const total = actions.clicks + actions.keys;
      process.stdout.write(`      usability: ${total} actions (${actions.clicks} clicks, ${actions.keys} non-character keys) for 3 lots and 2 photos; target ≤ ${TARGET}\n`);
      process.stdout.write(`      ${actions.log.join(' | ')}\n`);
      expect(actions.clicks, 'the walk was really counted').to.be.greaterThan(5);
      expect(total).to.be.at.most(TARGET);
      const stocked = await StockBalance.findAll();
      expect(stocked.map((b) => b.vials).sort()).to.deep.equal([10, 10, 10]);
    } finally {
      await context.close();
    }
  });
});
