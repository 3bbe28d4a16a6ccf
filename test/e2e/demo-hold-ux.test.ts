// In Chromium, on the seeded demo: the hold the warm delivery opened says it was opened when the shipment arrived
// (three days before the seeding), as receiving's own hold would.
import { expect } from 'chai';
import { Lot, Shipment, Site } from '../../database/models/index.js';
import { demoAccounts } from '../../database/seeders/demo-scenario.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { seedDemoForSuite } from '../support/demo-seed.js';

describe('the demo’s arrival hold in Chromium', function () {
  this.timeout(180_000);
  const suite = browserSuite();
  seedDemoForSuite('demo-hold');

  it('shows the hold on lot FIB0932 opened at the delivery’s arrival, not at the seeding', async () => {
    const warm = (await Shipment.findOne({ where: { trackingNumber: 'FW26040417' } }))!;
    const lot = (await Lot.findOne({ where: { lotNumber: 'FIB0932' } }))!;
    const vet = demoAccounts.find((a) => a.roles.includes('veterinarian'))!;
    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 }, timezoneId: 'UTC' });
    try {
      const page = await context.newPage();
      await page.goto(`${suite.server.url}/sign-in`);
      await page.getByLabel('E-mail').fill(vet.email);
      await page.getByLabel('Password', { exact: true }).fill(vet.password);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('navigation', { name: 'Main' }).waitFor();
      await page.goto(`${suite.server.url}/lots/${lot.id}`);
      const hold = page.getByRole('article', { name: 'Arrival hold' });
      await hold.waitFor();
      const opened = await hold.getByText(/^Opened /).innerText();
      // The page's medium date on the lot's site's clock (where the delivery arrived): "Dec 1, 2026, 12:49 PM CST".
      const zone = (await Site.findByPk(warm.siteId))!.timeZone;
      const day = (ms: number) => new Date(ms).toLocaleDateString('en-US', { month: 'short', day: 'numeric', year: 'numeric', timeZone: zone });
      expect(opened).to.contain(`Opened ${day(warm.arrivedAt.getTime())},`);
      expect(opened).to.not.contain(day(Date.now()));
      await hold.scrollIntoViewIfNeeded();
      await page.screenshot({ path: screenshotPath('demo-hold-ux-lot') });
      const violations = await seriousAccessibilityViolations(page);
      expect(violations, describeViolations(violations)).to.have.length(0);
    } finally {
      await context.close();
    }
  });
});
