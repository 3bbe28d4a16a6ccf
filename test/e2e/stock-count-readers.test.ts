// In Chromium: a veterinarian, who may read a fridge's count sheet but not record a count, sees what the ledger
// expects without a form to fill in that could never be sent (our own rule: only storage staff and admins count).
import { expect } from 'chai';
import type { BrowserContext } from 'playwright-core';
import { describeViolations, seriousAccessibilityViolations, signInOnPage } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser } from '../support/test-app.js';
import { createPresentation, createProduct, createSiteFridge, siteDay, stockLot } from '../support/flock-fixtures.js';

describe('the count sheet for readers in Chromium', () => {
  const suite = browserSuite();
  let context: BrowserContext;
  beforeEach(async () => {
    await resetDatabase();
    context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, isMobile: true });
  });
  afterEach(() => context.close());

  it('shows a veterinarian the expected vials and no count form; storage staff get the form', async () => {
    const site = await createSite('CNT');
    const fridge = await createSiteFridge(site);
    const lot = await stockLot(fridge, await createPresentation(await createProduct(), 1000), 7, siteDay(site, 120));
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'], sites: [site] });
    await createTestUser({ email: 'store@test.example', roles: ['storage'], sites: [site] });

    const page = await context.newPage();
    await signInOnPage(page, suite.server.url, 'vet@test.example');
    await page.goto(`${suite.server.url}/fridges/${fridge.id}/count`);
    await page.getByRole('note').filter({ hasText: 'Storage staff and administrators record counts' }).waitFor();
    const line = page.getByRole('list', { name: 'Lots in the fridge' }).getByRole('listitem');
    await line.filter({ hasText: `Lot ${lot.lotNumber}` }).filter({ hasText: '7 vials' }).waitFor();
    expect(await page.getByLabel('Counted vials').count()).to.equal(0);
    expect(await page.getByRole('button', { name: 'Submit count' }).count()).to.equal(0);
    const violations = await seriousAccessibilityViolations(page);
    expect(violations, describeViolations(violations)).to.have.length(0);

    const storage = await context.browser()!.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, isMobile: true });
    try {
      const counter = await storage.newPage();
      await signInOnPage(counter, suite.server.url, 'store@test.example');
      await counter.goto(`${suite.server.url}/fridges/${fridge.id}/count`);
      await counter.getByRole('button', { name: 'Submit count' }).waitFor();
      expect(await counter.getByLabel('Counted vials').count()).to.equal(1);
    } finally {
      await storage.close();
    }
  });
});
