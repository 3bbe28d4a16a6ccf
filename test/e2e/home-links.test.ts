// In Chromium: the home cards of a person with several sites link to the site that needs them, and say how many items
// they leave out. Expectations are hand-counted from the fixtures (our own rules).
import { expect } from 'chai';
import type { BrowserContext } from 'playwright-core';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { OVERVIEW_LIST_LIMIT } from '../../shared/demand/purchasing-overview.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations, signInOnPage } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser } from '../support/test-app.js';
import { createFlock, createHouse, createPresentation, createProduct, createVaccination, siteDay } from '../support/flock-fixtures.js';
import { createCatalogue, createPurchaseOrder } from '../support/receiving-fixtures.js';
import { expectNoSidewaysScroll, phone } from '../support/phone-layout.js';

describe('home card links in Chromium', () => {
  const suite = browserSuite();
  let context: BrowserContext;
  beforeEach(async () => {
    await resetDatabase();
    context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
  });
  afterEach(() => context.close());

  it('opens purchasing and receiving on the site with the shortfall and the overdue shipment, not the first site', async () => {
    const alpha = await createSite('ALPHA');
    const bravo = await createSite('BRAVO');
    // Bravo (second by name) has every shortfall: more vaccinations than the card lists, none covered.
    const product = await createProduct();
    await createPresentation(product, 1000);
    const shortfalls = 6;
    for (let i = 0; i < shortfalls; i++) await createVaccination(await createFlock(await createHouse(bravo)), product, siteDay(bravo, 10 + i));
    const yesterday = siteLocalDate(new Date(Date.now() - 86_400_000), bravo.timeZone);
    const order = await createPurchaseOrder(bravo, await createCatalogue(), { expectedDate: yesterday, packs: 1 });
    await createTestUser({ email: 'buyer@test.example', roles: ['purchasing', 'receiving'], sites: [alpha, bravo] });

    const page = await context.newPage();
    await signInOnPage(page, suite.server.url, 'buyer@test.example');
    const outlook = page.locator('vy-purchasing-outlook-card');
    await outlook.getByText(`Shortfalls (${shortfalls})`).waitFor();
    // The card lists four and says how many it leaves out (6 − 4 = 2).
    await outlook.getByText('and 2 more').waitFor();
    expect(shortfalls).to.be.below(OVERVIEW_LIST_LIMIT);
    const receiving = page.locator('vy-receiving-card');
    await receiving.getByText('1 overdue').waitFor();
    expect(await receiving.getByRole('link', { name: bravo.name }).count()).to.equal(1);
    await page.screenshot({ path: screenshotPath('home-links'), fullPage: true });
    const violations = await seriousAccessibilityViolations(page);
    expect(violations, describeViolations(violations)).to.have.length(0);

    await outlook.getByRole('link', { name: 'Open purchasing' }).click();
    await page.waitForURL(new RegExp(`/purchasing\\?site=${bravo.id}$`));
    await page.getByRole('combobox', { name: 'Site' }).filter({ hasText: bravo.name }).waitFor();

    await page.goBack();
    await receiving.getByRole('link', { name: bravo.name }).click();
    await page.waitForURL(new RegExp(`/receiving\\?site=${bravo.id}$`));
    await page.getByText(`Order ${order.reference}`).waitFor();
  });

  it('keeps the purchasing page of a site with wide tables within a phone screen (the tables scroll in their frames)', async () => {
    const site = await createSite('PHN');
    const product = await createProduct();
    await createPresentation(product, 1000);
    await createVaccination(await createFlock(await createHouse(site)), product, siteDay(site, 12));
    await createTestUser({ email: 'phone-buyer@test.example', roles: ['purchasing'], sites: [site] });
    const phoneContext = await suite.browser.newContext(phone);
    try {
      const page = await phoneContext.newPage();
      await signInOnPage(page, suite.server.url, 'phone-buyer@test.example');
      await page.goto(`${suite.server.url}/purchasing`);
      await page.getByRole('table', { name: 'Orders to place' }).waitFor();
      await page.getByRole('table', { name: 'Stock by product' }).waitFor();
      await expectNoSidewaysScroll(page, 'purchasing');
    } finally {
      await phoneContext.close();
    }
  });
});
