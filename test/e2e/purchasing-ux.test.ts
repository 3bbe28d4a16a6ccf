// In Chromium: a site's purchasing page lists each expiring lot once — a lot the plan leaves to expire unused shows
// there, noting that it also falls in an expiry alert, and not again under "expiring soon".
import { expect } from 'chai';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createFlock, createHouse, createPresentation, createProduct, createSiteFridge, createVaccination, siteDay, stockLot } from '../support/flock-fixtures.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';

describe('expiring stock on the purchasing page in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('shows a lot that expires soon and unused once, under "will expire before any planned use", with its alert as a note', async function () {
    this.timeout(90_000);
    const site = await createSite('EXPY');
    const fridge = await createSiteFridge(site);
    const spray = await createProduct({ name: 'Spray vaccine E' });
    const water = await createProduct({ name: 'Drinking-water vaccine F' });
    // 5 vials of 1,000 doses expiring in 25 days (the 30-day alert); one flock of 1,500 birds in 10 days takes 2 of
    // them (hand-computed: 1,500 doses need 2 whole vials), so 3 expire unused.
    await stockLot(fridge, await createPresentation(spray, 1000, { unitPrice: 25 }), 5, siteDay(site, 25), { lotNumber: 'BOTH25' });
    await createVaccination(await createFlock(await createHouse(site), { birds: 1500 }), spray, siteDay(site, 10));
    // 3 vials expiring in 20 days, all used by a flock of 3,000 birds in 5 days: expiring soon, nothing left unused.
    await stockLot(fridge, await createPresentation(water, 1000, { unitPrice: 25 }), 3, siteDay(site, 20), { lotNumber: 'SOON20' });
    await createVaccination(await createFlock(await createHouse(site), { birds: 3000 }), water, siteDay(site, 5));
    await createTestUser({ email: 'buyer@test.example', roles: ['purchasing'] });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    try {
      const page = await context.newPage();
      await page.goto(`${suite.server.url}/sign-in`);
      await page.getByLabel('E-mail').fill('buyer@test.example');
      await page.getByLabel('Password', { exact: true }).fill(testPassword);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('navigation', { name: 'Main' }).waitFor();
      await page.goto(`${suite.server.url}/purchasing`);
      const section = page.locator('section', { has: page.getByRole('heading', { name: 'Expiring stock' }) });
      const unused = page.getByRole('list', { name: 'Will expire before any planned use' });
      const soon = page.getByRole('list', { name: 'On hand and expiring soon' });
      await unused.waitFor();
      await section.scrollIntoViewIfNeeded();
      await page.screenshot({ path: screenshotPath('purchasing-ux-expiring') });

      // Each lot once in the whole section.
      const text = await section.innerText();
      expect(text.match(/lot BOTH25/g), text).to.have.length(1);
      expect(text.match(/lot SOON20/g), text).to.have.length(1);
      expect(await unused.getByRole('listitem').allInnerTexts()).to.have.length(1);
      const entry = await unused.getByRole('listitem').innerText();
      expect(entry).to.match(/lot BOTH25, expires .*: 3 vials, 3,000 doses/);
      expect(entry).to.match(/also expires within 30 days \(25 left\), 5 vials on hand/);
      const soonItems = await soon.getByRole('listitem').allInnerTexts();
      expect(soonItems).to.have.length(1);
      expect(soonItems[0]).to.match(/lot SOON20: expires .* \(in 20 days, within 30\) · 3 vials/);
      await expectAccessible(page, 'purchasing page with expiring stock');
    } finally {
      await context.close();
    }
  });
});
