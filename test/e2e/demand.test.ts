// In Chromium: purchasing sees a shortfall, creates and sends the order, and receiving sees it expected; the flock pages and a
// veterinarian's withdrawal override. axe runs on every page and dialog.
import { expect } from 'chai';
import type { BrowserContext, Page } from 'playwright-core';
import { ProductStockSetting } from '../../database/models/index.js';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { caughtMail, clearCaughtMail } from '../support/mail-catcher.js';
import { pdfText } from '../support/pdf-pages.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';
import { createFlock, createHouse, createPresentation, createProduct, createProgramme, createSupplier, createVaccination, siteDay } from '../support/flock-fixtures.js';
import { browserSuite } from '../support/browser-suite.js';

async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  // On a phone the navigation sits in a closed drawer, so the greeting says the shell is there.
  await page.getByRole('heading', { level: 1, name: /^Good (morning|afternoon|evening)/ }).waitFor();
}

describe('flocks and demand in Chromium', () => {
  const suite = browserSuite();
  let context: BrowserContext;
  // axe-core is injected as a script, which the CSP would block; the CSP itself is tested on its own.
  beforeEach(async () => {
    await resetDatabase();
    clearCaughtMail();
    context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
  });
  afterEach(() => context.close());

  it('purchasing sees a shortfall, creates and sends the order, and receiving sees it as expected', async function () {
    this.timeout(120_000);
    const site = await createSite('NORTH');
    const product = await createProduct({ name: 'Spray vaccine A' });
    await createPresentation(product, 20_000, { unitPrice: 250 });
    const supplier = await createSupplier(3, 'orders@coldchain-supply.example');
    await ProductStockSetting.create({ siteId: site.id, productId: product.id, safetyStockKind: 'doses', safetyStockValue: 0, supplierId: supplier.id, presentationId: null, serviceLevel: null, updatedBy: null });
    const flock = await createFlock(await createHouse(site, 'House 2'), { name: 'H2-26A', birds: 20_000 });
    await createVaccination(flock, product, siteDay(site, 20));
    await createTestUser({ email: 'buyer@test.example', roles: ['purchasing'] });
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [site] });

    const page = await context.newPage();
    await signIn(page, suite.server.url, 'buyer@test.example');
    const outlook = page.locator('vy-purchasing-outlook-card');
    await outlook.getByText('20,000 doses missing').waitFor();
    await expectAccessible(page, 'purchasing home');
    await page.screenshot({ path: screenshotPath('demand-purchasing-home'), fullPage: true });

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Purchasing' }).click();
    await page.getByRole('heading', { name: 'Shortfalls' }).waitFor();
    expect(await page.locator('section', { has: page.getByRole('heading', { name: 'Shortfalls' }) }).innerText()).to.contain('20,000 doses missing');
    await expectAccessible(page, 'purchasing page');
    await page.screenshot({ path: screenshotPath('demand-purchasing-shortfall'), fullPage: true });

    await page.getByRole('button', { name: 'Create order for Spray vaccine A' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText('The order goes to orders@coldchain-supply.example').waitFor();
    expect(await dialog.getByLabel('Expected delivery').inputValue()).to.equal(siteDay(site, 3));
    expect(await dialog.getByLabel('Packs').inputValue()).to.equal('1');
    await dialog.getByLabel('Notes for the supplier').fill('Please deliver before noon.');
    await expectAccessible(page, 'order dialog');
    await page.screenshot({ path: screenshotPath('demand-order-dialog') });
    const reference = await dialog.getByLabel('Order number').inputValue();
    await dialog.getByRole('button', { name: 'Send order' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByText(`Order ${reference} sent to orders@coldchain-supply.example.`).waitFor();
    await page.getByText('Every planned vaccination in the next 180 days is covered.').waitFor();
    const openOrders = page.locator('section', { has: page.getByRole('heading', { name: 'Open orders' }) });
    expect(await openOrders.innerText()).to.contain(reference);
    await page.screenshot({ path: screenshotPath('demand-order-sent'), fullPage: true });

    const mail = await caughtMail();
    expect(mail.map((m) => m.subject)).to.deep.equal([`Purchase order ${reference} from ${site.name}`]);
    expect(pdfText(mail[0]!.attachments[0]!.content)).to.contain('Please deliver before noon.');

    const clerk = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    try {
      const phone = await clerk.newPage();
      await signIn(phone, suite.server.url, 'clerk@test.example');
      await phone.goto(`${suite.server.url}/receiving`);
      await phone.getByRole('heading', { name: 'Coming this week' }).waitFor();
      expect(await phone.getByRole('main').innerText()).to.contain(`order ${reference}`);
      await expectAccessible(phone, 'receiving page with the order expected');
      await phone.screenshot({ path: screenshotPath('demand-receiving-expects-order'), fullPage: true });
    } finally {
      await clerk.close();
    }
  });

  it('a veterinarian overrides a flagged vaccination with a reason on the flock page, after which it can be confirmed', async function () {
    this.timeout(120_000);
    const site = await createSite('NORTH');
    const product = await createProduct({ name: 'Spray vaccine A' });
    await createProgramme([{ product, ageValue: 18, ageUnit: 'weeks' }], 'Layer boosters');
    const house = await createHouse(site, 'House 1');
    const flock = await createFlock(house, { name: 'H1-25B', depletionDays: 30 });
    await createVaccination(flock, product, siteDay(site, 20));
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });

    const page = await context.newPage();
    await signIn(page, suite.server.url, 'vet@test.example');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Flocks' }).click();
    await page.getByRole('table', { name: 'Flocks' }).getByRole('link', { name: 'H1-25B' }).waitFor();
    await expectAccessible(page, 'flocks page');
    await page.screenshot({ path: screenshotPath('demand-flocks'), fullPage: true });

    await page.getByRole('button', { name: 'Place a flock' }).click();
    await expectAccessible(page, 'flock dialog');
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();

    await page.getByRole('link', { name: 'H1-25B' }).first().click();
    await page.getByRole('heading', { name: 'Flock H1-25B' }).waitFor();
    const row = page.getByRole('row', { name: /Spray vaccine A/ });
    expect(await row.innerText()).to.contain('10 days before depletion · label 21');
    expect(await page.getByRole('button', { name: `Confirm Spray vaccine A on ${siteDay(site, 20)}` }).isDisabled()).to.equal(true);
    await expectAccessible(page, 'flock page');
    await page.screenshot({ path: screenshotPath('demand-flock-flagged'), fullPage: true });

    await page.getByRole('button', { name: /^Override withdrawal/ }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Reason for the override').fill('Outbreak on a neighbouring farm; label checked, slaughter plant informed.');
    await expectAccessible(page, 'override dialog');
    await page.screenshot({ path: screenshotPath('demand-override-dialog') });
    await dialog.getByRole('button', { name: 'Override' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByText('Overridden by the veterinarian').waitFor();
    await page.getByRole('button', { name: `Confirm Spray vaccine A on ${siteDay(site, 20)}` }).click();
    await row.getByText('Confirmed').waitFor();
    expect(await page.getByRole('main').innerText()).to.contain('Outbreak on a neighbouring farm');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Programmes' }).click();
    await page.getByRole('heading', { name: 'Layer boosters' }).waitFor();
    await expectAccessible(page, 'programmes page');
    await page.getByRole('button', { name: 'Edit Layer boosters' }).click();
    await page.getByRole('dialog').getByRole('group', { name: 'Step 1' }).waitFor();
    await expectAccessible(page, 'programme dialog');
    await page.screenshot({ path: screenshotPath('demand-programme-dialog') });
  });
});
