// In Chromium: daily-check times are the fridge's site's, typed and shown with the zone's short name, whatever time zone
// the browser is in (here Tokyo, for a site in Saskatchewan).
import { expect } from 'chai';
import { DailyCheck } from '../../database/models/index.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createFridge } from '../support/fridge-fixtures.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';

describe('daily-check times on the site’s clock in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('reads the typed time as the site’s and shows it as the site’s, with its zone, on the check page and the fridge page', async function () {
    this.timeout(90_000);
    // America/Regina keeps UTC−6 (CST) all year, so the expected figures need no DST table (from memory: Saskatchewan
    // does not change its clocks). The browser runs in Asia/Tokyo, UTC+9: 15 hours ahead.
    const site = await createSite('REGN', 'America/Regina');
    const fridge = await createFridge(site, { code: 'REGN-F1' });
    await createTestUser({ email: 'storage@test.example', roles: ['storage'], sites: [site] });
    const day = siteLocalDate(new Date(Date.now() - 3 * 86_400_000), site.timeZone);

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 }, timezoneId: 'Asia/Tokyo' });
    try {
      const page = await context.newPage();
      await page.goto(`${suite.server.url}/sign-in`);
      await page.getByLabel('E-mail').fill('storage@test.example');
      await page.getByLabel('Password', { exact: true }).fill(testPassword);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('navigation', { name: 'Main' }).waitFor();
      await page.goto(`${suite.server.url}/daily-check?fridge=${fridge.id}`);
      await page.getByText(/REGN-F1 · Fridge/).waitFor();
      await page.getByText("At the site's clock (CST). Empty: now").waitFor();
      await page.getByLabel('Current').fill('40');
      await page.getByLabel('Minimum since reset').fill('38');
      await page.getByLabel('Maximum since reset').fill('42');
      await page.getByLabel('Your initials').fill('rk');
      await page.getByLabel('Checked at').fill(`${day}T08:30`);
      await page.getByRole('button', { name: 'Record the check' }).click();
      const status = page.getByRole('status').filter({ hasText: 'Recorded at' });
      await status.waitFor();
      // 08:30 at the farm; the browser's own clock would have said 11:30 PM.
      expect(await status.innerText()).to.match(/^Recorded at 8:30\sAM\sCST: 40\.0 °F, in range\.$/);
      // Ready for the next check: the emptied fields do not greet it with "Required".
      expect(await page.getByLabel('Current').inputValue()).to.equal('');
      expect(await page.locator('mat-error').count()).to.equal(0);
      expect(await page.getByLabel('Your initials').inputValue()).to.equal('rk');
      await page.screenshot({ path: screenshotPath('daily-check-ux-recorded') });
      await expectAccessible(page, 'daily check page');

      // Hand-computed: 08:30 at UTC−6 is 14:30 UTC the same day.
      const stored = await DailyCheck.findOne({ where: { fridgeId: fridge.id } });
      expect(stored?.checkedAt.toISOString()).to.equal(`${day}T14:30:00.000Z`);

      await page.goto(`${suite.server.url}/fridges/${fridge.id}`);
      const checks = page.getByRole('table', { name: 'Daily checks' });
      await checks.getByText('RK').waitFor();
      const [year, month, date] = day.split('-').map(Number);
      const monthName = new Date(Date.UTC(year!, month! - 1, 15)).toLocaleString('en-US', { month: 'short', timeZone: 'UTC' });
      const when = await checks.getByRole('row').nth(1).getByRole('cell').first().innerText();
      expect(when).to.match(new RegExp(`^${monthName} ${date}, ${year}, 8:30\\sAM\\sCST$`));
      await checks.scrollIntoViewIfNeeded();
      await page.screenshot({ path: screenshotPath('daily-check-ux-fridge') });
      await expectAccessible(page, 'fridge page with the check');
    } finally {
      await context.close();
    }
  });
});
