// In Chromium on a phone-sized screen: a clerk receives a shipment with a scanned lot and a photo, and sees it listed; axe on every page.
import { expect } from 'chai';
import type { BrowserContext } from 'playwright-core';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { Hold, Lot } from '../../database/models/index.js';
import { expectAccessible, screenshotPath, signInOnPage } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser } from '../support/test-app.js';
import { createCatalogue, createFridge, createPurchaseOrder, makeJpeg } from '../support/receiving-fixtures.js';
import { clearPhotoFiles } from '../support/receiving-state.js';
import { browserSuite } from '../support/browser-suite.js';

/** GS1 element string as a hand scanner types it: GTIN, expiry YYMMDD, then the lot last (no separator needed). */
function scanData(gtin: string, expiry: string, lot: string): string {
  return `01${gtin}17${expiry}10${lot}`;
}

describe('receiving in Chromium', () => {
  const suite = browserSuite();
  let context: BrowserContext;
  beforeEach(async () => {
    await resetDatabase();
    clearPhotoFiles();
    context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
  });
  afterEach(() => context.close());

  async function scene() {
    const site = await createSite('LKN');
    await createFridge(site, 'LKN-F1');
    const catalogue = await createCatalogue({ name: 'Meadowline ND spray', packGtin: '09506000134352' });
    const order = await createPurchaseOrder(site, catalogue, { expectedDate: siteLocalDate(new Date(), site.timeZone), packs: 2 });
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [site] });
    return { site, catalogue, order };
  }

  it('a clerk on a phone receives the expected shipment with a scanned lot and a photo, and sees it listed', async () => {
    const { order } = await scene();
    const page = await context.newPage();
    await signInOnPage(page, suite.server.url, 'clerk@test.example');
    await page.getByRole('link', { name: 'Open receiving' }).click();
    await page.getByRole('heading', { name: 'Due today and overdue' }).waitFor();
    await page.getByText(`Order ${order.reference}`).waitFor();
    await expectAccessible(page, 'receiving home');
    await page.screenshot({ path: screenshotPath('receiving-home-phone'), fullPage: true });

    await page.getByRole('link', { name: `Receive order ${order.reference}` }).click();
    await page.getByRole('heading', { name: 'Receive a shipment' }).waitFor();
    await page.getByText('Lot 1: scan or type').waitFor();
    await expectAccessible(page, 'receiving form, empty');

    await page.getByRole('button', { name: 'All checks fine' }).click();
    await page.keyboard.type('39.5');
    await page.getByRole('radio', { name: 'Probe' }).or(page.getByRole('button', { name: 'Probe' })).first().click();
    // With the reading placed, the scan field has the focus for the hand scanner.
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-describedby'))).to.match(/scan-hint/);
    // Day 00: month/year expiry, the month's last day (GS1 General Specifications; PHAC 2007 §8.2).
    await page.keyboard.type(scanData('09506000134352', '280300', 'MND4471'));
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: /Lot MND4471/ }).waitFor();
    expect(await page.getByLabel('Expiry').inputValue()).to.equal('2028-03');

    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Take a photo' }).click();
    await (await chooser).setFiles({ name: 'outer-box.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(800, 600) });
    await page.getByRole('img', { name: /Photo 1: outer-box.jpg/ }).waitFor();
    await page.getByText('No discrepancy so far.').waitFor();
    await expectAccessible(page, 'receiving form, filled');
    await page.screenshot({ path: screenshotPath('receiving-form-phone'), fullPage: true });

    await page.getByRole('button', { name: 'Save and put into stock' }).click();
    await page.getByRole('heading', { name: /^Shipment \d+$/ }).waitFor();
    await page.getByRole('img', { name: /Photo 1 of shipment/ }).waitFor();
    expect(await page.getByText('20 vials into').innerText()).to.match(/20 vials into Fridge LKN-F1/);
    await expectAccessible(page, 'shipment page');
    await page.screenshot({ path: screenshotPath('shipment-received-phone'), fullPage: true });

    await page.getByRole('link', { name: 'Receiving' }).first().click();
    await page.getByRole('heading', { name: 'Recently received' }).waitFor();
    await page.getByRole('link', { name: /Supplier .* 1 lot · 1 photo/ }).waitFor();
    expect(await page.getByText(`Order ${order.reference}`).count(), 'the order is no longer expected').to.equal(0);
    expect(await Lot.count()).to.equal(1);
  });

  it('the draft survives a reload, photo included, and a warm reading shows the hold before sending', async () => {
    const { site, order } = await scene();
    const page = await context.newPage();
    await signInOnPage(page, suite.server.url, 'clerk@test.example');
    await page.goto(`${suite.server.url}/receiving/new?site=${site.id}&order=${order.id}`);
    await page.getByRole('button', { name: 'All checks fine' }).click();
    await page.keyboard.type('52');
    await page.getByRole('button', { name: 'Product surface' }).or(page.getByRole('radio', { name: 'Product surface' })).first().click();
    await page.getByLabel('Scan a carton’s barcode').fill(scanData('09506000134352', '280331', 'WARM77'));
    await page.getByLabel('Scan a carton’s barcode').press('Enter');
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Add from files' }).click();
    await (await chooser).setFiles({ name: 'label.jpg', mimeType: 'image/jpeg', buffer: await makeJpeg(400, 300) });
    await page.getByRole('img', { name: /Photo 1: label.jpg/ }).waitFor();
    await page.waitForTimeout(600);

    await page.reload();
    await page.getByRole('heading', { name: /Lot WARM77/ }).waitFor();
    await page.getByRole('img', { name: /Photo 1: label.jpg/ }).waitFor();
    expect(await page.getByLabel('Temperature read').inputValue()).to.equal('52');
    await page.getByText(/1 lot\(s\) will go into stock on hold: do not use/).waitFor();
    await page.getByText(/the flock veterinarian decides, and the product label governs/).waitFor();
    await expectAccessible(page, 'receiving form with a warm reading');
    await page.screenshot({ path: screenshotPath('receiving-warm-phone'), fullPage: true });

    await page.getByRole('button', { name: 'Save and put into stock' }).click();
    await page.getByRole('heading', { name: /^Shipment \d+$/ }).waitFor();
    await page.getByText('On hold: do not use.').waitFor();
    await page.getByRole('link', { name: 'Discrepancy report (PDF)' }).waitFor();
    await expectAccessible(page, 'shipment page with a hold');
    await page.screenshot({ path: screenshotPath('shipment-on-hold-phone'), fullPage: true });
    expect(await Hold.count()).to.equal(1);
    expect(await page.evaluate(() => Object.keys(localStorage).filter((k) => k.startsWith('vialyard.receiving-draft')).length)).to.equal(0);
  });

  it('an unknown barcode is proposed in a dialog and used on the line at once; the camera dialog says when there is no camera', async () => {
    const { site } = await scene();
    const page = await context.newPage();
    await signInOnPage(page, suite.server.url, 'clerk@test.example');
    await page.goto(`${suite.server.url}/receiving/new?site=${site.id}`);
    await page.getByRole('button', { name: 'Camera' }).click();
    const camera = page.getByRole('dialog');
    await camera.getByText(/No camera is available here|Hold the carton/).waitFor();
    await expectAccessible(page, 'camera dialog');
    await camera.getByRole('button', { name: 'Close' }).click();

    // GTIN 05060917510011 from the Solidsoft GS1 parser wiki, unknown to this catalogue.
    await page.getByLabel('Scan a carton’s barcode').fill('(01)05060917510011(17)271231(10)NEW1');
    await page.getByLabel('Scan a carton’s barcode').press('Enter');
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('heading', { name: 'New barcode' }).waitFor();
    await expectAccessible(page, 'propose dialog');
    await page.screenshot({ path: screenshotPath('receiving-propose-dialog') });
    await dialog.getByLabel('Doses per vial').fill('2500');
    await dialog.getByRole('button', { name: 'Use it on this shipment' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('heading', { name: /Lot NEW1/ }).waitFor();
    await page.getByText('New barcode, to be confirmed by purchasing').waitFor();
  });

  it('purchasing reads the catalogue, sees the proposal to confirm, and enters an order', async () => {
    const { catalogue } = await scene();
    await createTestUser({ email: 'buyer@test.example', roles: ['purchasing'] });
    const desk = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    try {
      const page = await desk.newPage();
      await signInOnPage(page, suite.server.url, 'buyer@test.example');
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Catalogue' }).click();
      await page.getByRole('heading', { name: catalogue.product.name }).waitFor();
      await expectAccessible(page, 'catalogue');
      await page.screenshot({ path: screenshotPath('catalogue'), fullPage: true });
      await page.getByRole('button', { name: `Edit ${catalogue.product.name}` }).click();
      await page.getByRole('dialog').getByLabel('Name').waitFor();
      await expectAccessible(page, 'product dialog');
      await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();

      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Purchase orders' }).click();
      await page.getByRole('table', { name: 'Purchase orders' }).waitFor();
      await page.getByRole('button', { name: 'New order' }).click();
      const dialog = page.getByRole('dialog');
      await dialog.getByLabel('Supplier').click();
      await page.getByRole('option', { name: catalogue.supplier.name }).click();
      await dialog.getByLabel('Order number').fill('PO-E2E-1');
      await dialog.getByLabel('Product and pack').click();
      await page.getByRole('option').first().click();
      await dialog.getByLabel('Packs').fill('3');
      await expectAccessible(page, 'purchase order dialog');
      await dialog.getByRole('button', { name: 'Create order' }).click();
      await dialog.waitFor({ state: 'detached' });
      await page.getByRole('cell', { name: 'PO-E2E-1', exact: true }).waitFor();
      await expectAccessible(page, 'purchase orders');
      await page.screenshot({ path: screenshotPath('purchase-orders'), fullPage: true });
    } finally {
      await desk.close();
    }
  });
});
