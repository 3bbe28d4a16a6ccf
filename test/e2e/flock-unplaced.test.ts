// In Chromium: a flock whose placement day is still ahead on the site's calendar has no birds on the farm yet, so the
// flocks list and the flock page show its birds as expected, not present, and offer no bird update or depletion until
// that day. axe runs on the page. Dates hand-computed from the site's today (placed at today + 6, hatched today + 4).
import { expect } from 'chai';
import type { BrowserContext } from 'playwright-core';
import { screenshotPath, signInOnPage, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createFlock, createHouse, siteDay } from '../support/flock-fixtures.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser } from '../support/test-app.js';

describe('a flock not placed yet, in Chromium', () => {
  const suite = browserSuite();
  let context: BrowserContext;
  beforeEach(async () => {
    await resetDatabase();
    // axe-core is injected as a script, which the CSP would block; the CSP itself is tested on its own.
    context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
  });
  afterEach(() => context.close());

  it('shows its birds as expected on the list and the page, and offers no bird update or depletion before placement', async function () {
    this.timeout(120_000);
    // Far east of UTC, so the site's today is often not the server's: the page must follow the site's calendar.
    const site = await createSite('SORREL', 'Pacific/Kiritimati');
    const house = await createHouse(site, 'Broiler house 2');
    await createFlock(house, { name: 'BH2-27', hatchDays: 4, placementDays: 6, birds: 18_000 });
    await createFlock(house, { name: 'BH2-26', hatchDays: -60, placementDays: -59, depletionDays: 5, birds: 17_500 });
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });
    const page = await context.newPage();
    await signInOnPage(page, suite.server.url, 'vet@test.example');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Flocks' }).click();
    const flocks = page.getByRole('table', { name: 'Flocks' });
    const unplaced = flocks.getByRole('row', { name: /BH2-27/ });
    await unplaced.waitFor();
    expect(await unplaced.innerText()).to.contain('not placed yet, 18,000 expected').and.contain('Planned');
    expect(await flocks.getByRole('row', { name: /BH2-26/ }).innerText(), 'a placed flock keeps its count').to.contain('17,500').and.not.contain('expected');
    await page.screenshot({ path: screenshotPath('flocks-unplaced'), fullPage: true });
    await unplaced.getByRole('link', { name: 'BH2-27' }).click();

    await page.getByRole('heading', { name: 'Flock BH2-27' }).waitFor();
    const birdsNow = page.locator('.facts div').filter({ hasText: 'Birds now' });
    expect((await birdsNow.innerText()).replace(/\s+/g, ' ')).to.contain('— (not placed yet, 18,000 expected)').and.not.match(/Birds now\s*18,000/);
    expect(await page.getByRole('note').filter({ hasText: 'Not placed yet' }).innerText()).to.contain(`the birds arrive on ${siteDay(site, 6)}`);
    expect(await page.getByRole('button', { name: 'Record birds' }).count()).to.equal(0);
    expect(await page.getByRole('button', { name: 'Record depletion' }).count()).to.equal(0);
    expect(await page.getByRole('button', { name: 'Edit flock' }).count(), 'its dates can still be changed').to.equal(1);
    expect(await page.getByRole('table', { name: 'Bird numbers' }).innerText()).to.contain(`18,000 birds expected on ${siteDay(site, 6)}`);
    await expectAccessible(page, 'flock page before placement');
    await page.screenshot({ path: screenshotPath('flock-unplaced'), fullPage: true });

    // The placed flock in the same house still offers both.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Flocks' }).click();
    await flocks.getByRole('row', { name: /BH2-26/ }).getByRole('link', { name: 'BH2-26' }).click();
    await page.getByRole('heading', { name: 'Flock BH2-26' }).waitFor();
    await page.getByRole('button', { name: 'Record birds' }).waitFor();
    expect(await page.getByRole('button', { name: 'Record depletion' }).count()).to.equal(1);
    expect(await page.locator('.facts div').filter({ hasText: 'Birds now' }).innerText()).to.contain('17,500');
  });
});
