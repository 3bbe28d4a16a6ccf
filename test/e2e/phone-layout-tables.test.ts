// In Chromium on a 390×844 phone: the review queue, the fridge page, purchase orders and users never scroll sideways,
// each row's action buttons lie inside the screen (rows stack as cards), and axe finds nothing serious.
import { expect } from 'chai';
import { screenshotPath, signInOnPage, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { expectFitsPhone, phone } from '../support/phone-layout.js';
import { createFridge, createLogger } from '../support/fridge-fixtures.js';
import { createCatalogue, createPurchaseOrder } from '../support/receiving-fixtures.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, signInAs, testApp } from '../support/test-app.js';
import { lotIn, MIN, productWithRange, T0, uploadTemps } from '../api/holds/hold-test-setup.js';

describe('tables on a phone in Chromium', () => {
  const suite = browserSuite();
  before(() => testApp());
  beforeEach(resetDatabase);

  it('the veterinarian reads each held lot as a card, label over value, and reaches Decide', async function () {
    this.timeout(120_000);
    const site = await createSite('PHN');
    const fridge = await createFridge(site);
    const logger = await createLogger(fridge);
    // Long product names, as the demo's: on the old table they wrapped one word per line.
    for (const [name, vials] of [['Meadowgate bronchitis drinking-water vaccine, live', 8], ['Meadowgate bursal disease spray vaccine', 4]] as const) {
      const product = await productWithRange(35, 45, 'F');
      await product.update({ name });
      await lotIn(fridge, product, T0 - 60 * MIN, vials);
    }
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });
    await uploadTemps(await signInAs(['storage']), logger.id, T0, [4, 4, 9, 9, 9, 4, 4]);

    const context = await suite.browser.newContext(phone);
    try {
      const page = await context.newPage();
      await signInOnPage(page, suite.server.url, 'vet@test.example');
      await page.goto(`${suite.server.url}/review`);
      const decide = page.getByRole('button', { name: /^Decide lot / });
      await decide.first().waitFor();
      expect(await decide.count()).to.equal(2);
      // The content pane scrolls, not the page: a shot of one part at a time shows it.
      await page.locator('table.lots').first().screenshot({ path: screenshotPath('phone-review-lots') });
      await expectFitsPhone(page, 'review', decide);
      // The embedded chart loads once scrolled to; its range choices wrap onto a second row instead of running off the screen.
      const ranges = page.locator('mat-button-toggle-group[aria-label="Chart range"] button');
      await page.getByRole('link', { name: 'Excursion report (PDF)' }).first().scrollIntoViewIfNeeded();
      await ranges.first().waitFor();
      await expectFitsPhone(page, 'review chart ranges', ranges, { pageToo: false });
      // Stacked: the product cell spans the card, so the name takes at most two lines, not one word a line.
      const productCell = page.locator('table.lots td[data-label="Product"]').first();
      const cell = (await productCell.boundingBox())!;
      expect(cell.width, 'the product cell spans the card').to.be.greaterThan(250);
      const lineHeight = await productCell.evaluate((td) => parseFloat(getComputedStyle(td).lineHeight) || 20);
      // The label above the value is one line, the value at most two (hand-measured: about 45 characters a line).
      expect(cell.height, 'label and product name in at most three lines').to.be.at.most(lineHeight * 3 + 8 + 1);
      // The column's name shows beside each value, and the table keeps its header for screen readers.
      expect(await productCell.evaluate((td) => getComputedStyle(td, '::before').content)).to.contain('Product');
      expect(await page.getByRole('columnheader', { name: 'Product' }).count()).to.equal(1);
      await expectAccessible(page, 'review on a phone');
      await decide.first().click();
      await page.getByRole('dialog').waitFor();
    } finally {
      await context.close();
    }

    // The desktop keeps its table: one row per lot, the Decide button on the row's line.
    const wide = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    try {
      const page = await wide.newPage();
      await signInOnPage(page, suite.server.url, 'vet@test.example');
      await page.goto(`${suite.server.url}/review`);
      const row = page.locator('table.lots tbody tr').first();
      await row.waitFor();
      expect(await row.evaluate((tr) => getComputedStyle(tr).display)).to.equal('table-row');
    } finally {
      await wide.close();
    }
  });

  it('purchase orders, users and the fridge page fit the screen with their actions on it', async function () {
    this.timeout(120_000);
    const site = await createSite('PHO');
    const catalogue = await createCatalogue({ name: 'Meadowgate bronchitis drinking-water vaccine, live' });
    await createPurchaseOrder(site, catalogue, { packs: 3 });
    await createPurchaseOrder(site, catalogue, { packs: 1 });
    const fridge = await createFridge(site);
    const logger = await createLogger(fridge);
    await lotIn(fridge, await productWithRange(35, 45, 'F'), T0 - 60 * MIN, 8);
    await uploadTemps(await signInAs(['storage']), logger.id, T0, [4, 4, 9, 9, 9, 4, 4]);
    await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
    await createTestUser({ email: 'a.long.address.for.a.receiving.clerk@test.example', roles: ['receiving', 'storage'], sites: [site] });

    const context = await suite.browser.newContext(phone);
    try {
      const page = await context.newPage();
      await signInOnPage(page, suite.server.url, 'admin@test.example');

      await page.goto(`${suite.server.url}/purchase-orders`);
      const orderActions = page.getByRole('button', { name: /^(Edit|Cancel) order / });
      await orderActions.first().waitFor();
      expect(await orderActions.count()).to.equal(4);
      await page.locator('main').screenshot({ path: screenshotPath('phone-purchase-orders') });
      await expectFitsPhone(page, 'purchase orders', orderActions);
      await expectAccessible(page, 'purchase orders on a phone');

      await page.goto(`${suite.server.url}/users`);
      const edits = page.getByRole('button', { name: /^Edit Test / });
      await edits.first().waitFor();
      await page.locator('main').screenshot({ path: screenshotPath('phone-users') });
      await expectFitsPhone(page, 'users', edits);
      // Sorting stays on screen above the cards, reachable, rather than clipped away with the header.
      await expectFitsPhone(page, 'users sorting', page.getByRole('button', { name: /^(Name|E-mail)$/ }));
      await expectAccessible(page, 'users on a phone');

      await page.goto(`${suite.server.url}/fridges/${fridge.id}`);
      const record = page.getByRole('button', { name: /^Record what was done about excursion / });
      await record.first().waitFor();
      await page.getByRole('table', { name: 'Excursions' }).screenshot({ path: screenshotPath('phone-fridge-excursions') });
      await expectFitsPhone(page, 'fridge', record);
      await expectAccessible(page, 'fridge on a phone');
    } finally {
      await context.close();
    }
  });
});
