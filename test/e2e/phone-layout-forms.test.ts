// In Chromium on a 390×844 phone: the receiving form (opened from a bookmark with no site, its choice groups, a new
// lot line's errors) and purchasing's create-order dialog (its pack hints, the note that sending e-mails at once).
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { ProductStockSetting } from '../../database/models/index.js';
import { screenshotPath, signInOnPage, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createFlock, createHouse, createPresentation, createProduct, createSupplier, createVaccination, siteDay } from '../support/flock-fixtures.js';
import { createCatalogue, createFridge } from '../support/receiving-fixtures.js';
import { clearCaughtMail } from '../support/mail-catcher.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser } from '../support/test-app.js';
import { expectFitsPhone, phone } from '../support/phone-layout.js';

/** Every receiving-context call the page makes, and its console errors. */
function watch(page: Page): { contextCalls: string[]; consoleErrors: string[] } {
  const seen = { contextCalls: [] as string[], consoleErrors: [] as string[] };
  page.on('request', (request) => {
    if (request.url().includes('/api/shipments/sites/')) seen.contextCalls.push(new URL(request.url()).pathname);
  });
  page.on('console', (message) => {
    if (message.type() === 'error') seen.consoleErrors.push(message.text());
  });
  return seen;
}

describe('forms on a phone in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('/receiving/new without a site uses the clerk\'s only site; its choices stack; a new line waits for an answer before "Required."', async function () {
    this.timeout(120_000);
    const site = await createSite('ONE');
    await createFridge(site, 'ONE-F1');
    await createCatalogue();
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [site] });

    const context = await suite.browser.newContext(phone);
    try {
      const page = await context.newPage();
      await signInOnPage(page, suite.server.url, 'clerk@test.example');
      const seen = watch(page);
      await page.goto(`${suite.server.url}/receiving/new`);
      await page.getByText('Site ONE · unannounced').waitFor();
      await page.getByLabel('Fridge', { exact: true }).getByText('ONE-F1', { exact: false }).waitFor();
      expect(seen.contextCalls, 'the context of the only site, never of site 0').to.deep.equal([`/api/shipments/sites/${site.id}/context`]);
      expect(seen.consoleErrors).to.deep.equal([]);

      // A line added by hand takes the focus; the focus leaving it (All checks fine) is not an answer: no error yet.
      await page.getByRole('button', { name: 'Add a lot by hand' }).click();
      await page.getByRole('button', { name: 'All checks fine' }).click();
      await page.locator('mat-button-toggle', { hasText: 'Probe' }).waitFor();
      expect(await page.getByText('Required.').count(), 'no error on an untouched new line').to.equal(0);

      // "Read from" and "Outcome" stack: one full-width choice per row, all on the screen.
      const choices = page.locator('mat-button-toggle-group.place mat-button-toggle, mat-button-toggle-group.outcomes mat-button-toggle');
      expect(await choices.count()).to.equal(6);
      const widths = await choices.evaluateAll((toggles) => toggles.map((t) => Math.round(t.getBoundingClientRect().width)));
      expect(new Set(widths).size, `each choice the same full width: ${widths.join(', ')}`).to.equal(1);
      expect(widths[0]).to.be.greaterThan(300);
      await expectFitsPhone(page, 'receiving form', choices);
      await page.locator('section[aria-labelledby="checks-heading"]').screenshot({ path: screenshotPath('phone-receiving-checks') });
      await page.locator('section[aria-labelledby="lots-heading"]').screenshot({ path: screenshotPath('phone-receiving-new-line') });
      await page.locator('section[aria-labelledby="outcome-heading"]').screenshot({ path: screenshotPath('phone-receiving-outcome') });
      await expectAccessible(page, 'receiving form on a phone');

      // Sending shows the errors.
      await page.getByRole('button', { name: 'Save and put into stock' }).click();
      await page.getByText('Required.').first().waitFor();
    } finally {
      await context.close();
    }
  });

  it('/receiving/new without a site asks a clerk of two sites which one, then loads that site\'s form', async function () {
    this.timeout(90_000);
    const north = await createSite('NTH');
    const south = await createSite('STH');
    await createFridge(north, 'NTH-F1');
    await createFridge(south, 'STH-F1');
    await createCatalogue();
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [north, south] });

    const context = await suite.browser.newContext(phone);
    try {
      const page = await context.newPage();
      await signInOnPage(page, suite.server.url, 'clerk@test.example');
      const seen = watch(page);
      await page.goto(`${suite.server.url}/receiving/new`);
      await page.getByText('Which site is this shipment arriving at?').waitFor();
      expect(await page.getByRole('button', { name: 'Save and put into stock' }).isVisible(), 'no form before the site').to.equal(false);
      await expectAccessible(page, 'site choice');
      await page.locator('main').screenshot({ path: screenshotPath('phone-receiving-choose-site') });
      await page.getByLabel('Site', { exact: true }).click();
      await page.getByRole('option', { name: 'Site STH' }).click();
      await page.getByText('Site STH · unannounced').waitFor();
      expect(new URL(page.url()).searchParams.get('site'), 'the address names the site chosen').to.equal(String(south.id));
      expect(seen.contextCalls).to.deep.equal([`/api/shipments/sites/${south.id}/context`]);
      expect(seen.consoleErrors).to.deep.equal([]);
      await page.getByLabel('Fridge', { exact: true }).getByText('STH-F1', { exact: false }).waitFor();
    } finally {
      await context.close();
    }
  });

  it('the create-order dialog keeps each pack hint clear of the next line and says "Send order" e-mails the supplier now', async function () {
    this.timeout(120_000);
    clearCaughtMail();
    const site = await createSite('ORD');
    const product = await createProduct({ name: 'Spray vaccine A' });
    await createPresentation(product, 20_000, { unitPrice: 250 });
    const supplier = await createSupplier(3, 'orders@coldline.example');
    await ProductStockSetting.create({ siteId: site.id, productId: product.id, safetyStockKind: 'doses', safetyStockValue: 0, supplierId: supplier.id, presentationId: null, serviceLevel: null, updatedBy: null });
    await createVaccination(await createFlock(await createHouse(site, 'House 2'), { name: 'H2-26A', birds: 20_000 }), product, siteDay(site, 20));
    await createTestUser({ email: 'buyer@test.example', roles: ['purchasing'] });

    const context = await suite.browser.newContext(phone);
    try {
      const page = await context.newPage();
      await signInOnPage(page, suite.server.url, 'buyer@test.example');
      await page.goto(`${suite.server.url}/purchasing`);
      await page.getByRole('button', { name: 'Create order for Spray vaccine A' }).click();
      const dialog = page.getByRole('dialog');
      await dialog.getByRole('button', { name: 'Add a line' }).click();
      await page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
      // The first line's hint (its vials and doses) ends above the second line's first field.
      const hintBottom = await dialog.locator('.line').nth(0).locator('mat-hint').evaluate((hint) => hint.getBoundingClientRect().bottom);
      const nextTop = await dialog.locator('.line').nth(1).locator('mat-form-field').first().evaluate((field) => field.getBoundingClientRect().top);
      expect(hintBottom, 'the pack hint runs into the next line').to.be.at.most(nextTop);

      const send = dialog.getByRole('button', { name: 'Send order' });
      const note = page.locator('#send-order-note');
      expect(await note.innerText()).to.contain('e-mails the PDF now to orders@coldline.example');
      expect(await send.getAttribute('aria-describedby')).to.equal('send-order-note');
      await note.scrollIntoViewIfNeeded();
      const noteBox = (await note.boundingBox())!;
      const sendBox = (await send.boundingBox())!;
      expect(noteBox.y, 'the note under the button').to.be.at.least(sendBox.y + sendBox.height - 1);
      // The dialog only: the purchasing page under it is another page's layout.
      await expectFitsPhone(page, 'order dialog', dialog.getByRole('button', { name: /^(Send order|Cancel)$/ }), { pageToo: false });
      await page.screenshot({ path: screenshotPath('phone-order-dialog') });
      await expectAccessible(page, 'order dialog on a phone');
    } finally {
      await context.close();
    }
  });
});
