// In Chromium: programme steps whose day passed with nothing recorded stand out on the flocks list and the flock page;
// the veterinarian plans one for a new date and cancels the other with a reason, and the crew sees them without the
// buttons. axe runs on the page and on each dialog. Dates hand-computed from the site's today (hatch at today − 30:
// day 14 is today − 16, week 4 today − 2, week 6 today + 12).
import { expect } from 'chai';
import type { BrowserContext } from 'playwright-core';
import { reconcileFlock } from '../../api/flocks/reconcile-flock.js';
import { screenshotPath, signInOnPage, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createFlock, createHouse, createProduct, createProgramme, siteDay } from '../support/flock-fixtures.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testContext } from '../support/test-app.js';

describe('overdue programme steps on the flock page, in Chromium', () => {
  const suite = browserSuite();
  let context: BrowserContext;
  beforeEach(async () => {
    await resetDatabase();
    // axe-core is injected as a script, which the CSP would block; the CSP itself is tested on its own.
    context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
  });
  afterEach(() => context.close());

  async function pulletFlock() {
    const site = await createSite('FENNEL', 'America/Denver');
    const nd = await createProduct({ name: 'Spray vaccine ND' });
    const ib = await createProduct({ name: 'Water vaccine IB' });
    const programme = await createProgramme([{ product: nd, ageValue: 14 }, { product: ib, ageValue: 4, ageUnit: 'weeks' }, { product: nd, ageValue: 6, ageUnit: 'weeks' }], 'Pullet rearing');
    const flock = await createFlock(await createHouse(site, 'Pullet barn A'), { name: 'PA-26', hatchDays: -30, placementDays: -30, depletionDays: 82, programmeId: programme.id });
    const vet = await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });
    // The generation the API runs when a flock gets its programme.
    await testContext().sequelize.transaction((transaction) => reconcileFlock(flock.id, vet.id, transaction));
    return { site, flock };
  }

  it('shows the overdue steps, plans one for a new date and cancels the other with a reason', async function () {
    this.timeout(120_000);
    const { site } = await pulletFlock();
    const page = await context.newPage();
    await signInOnPage(page, suite.server.url, 'vet@test.example');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Flocks' }).click();
    const listRow = page.getByRole('table', { name: 'Flocks' }).getByRole('row', { name: /PA-26/ });
    await listRow.getByText('2 overdue').waitFor();
    expect(await listRow.innerText()).to.contain(`${siteDay(site, 12)} · Spray vaccine ND`);
    await listRow.getByRole('link', { name: 'PA-26' }).click();

    await page.getByRole('heading', { name: 'Flock PA-26' }).waitFor();
    const note = page.getByRole('note', { name: '2 vaccinations are overdue' });
    await note.waitFor();
    expect(await note.innerText()).to.contain(`Day 14 (Spray vaccine ND, due ${siteDay(site, -16)})`).and.contain(`Week 4 (Water vaccine IB, due ${siteDay(site, -2)})`);
    const schedule = page.getByRole('table', { name: 'Vaccination schedule' });
    const day14 = schedule.getByRole('row', { name: /Day 14/ });
    expect(await day14.innerText()).to.contain('Overdue').and.contain('16 days late');
    expect(await schedule.getByRole('row', { name: /Week 4/ }).innerText()).to.contain('2 days late');
    expect(await schedule.getByRole('row', { name: /Week 6/ }).innerText()).to.contain('Planned');
    expect(await day14.getByRole('button', { name: /^Confirm/ }).count(), 'a past day cannot be confirmed').to.equal(0);
    await expectAccessible(page, 'flock page with overdue steps');
    await page.screenshot({ path: screenshotPath('flock-schedule-overdue'), fullPage: true });

    await day14.getByRole('button', { name: `Plan a new date for Spray vaccine ND, due ${siteDay(site, -16)}` }).click();
    const dialog = page.getByRole('dialog', { name: 'Plan Spray vaccine ND again' });
    await dialog.waitFor();
    expect(await dialog.getByLabel('Planned date').inputValue(), 'starts on the site’s today').to.equal(siteDay(site));
    expect(await dialog.innerText()).to.contain('16 days ago').and.contain('flock veterinarian');
    await expectAccessible(page, 'plan-again dialog');
    await page.screenshot({ path: screenshotPath('flock-schedule-plan-again') });
    await dialog.getByLabel('Planned date').fill(siteDay(site, 2));
    await dialog.getByRole('button', { name: 'Plan', exact: true }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('note', { name: '1 vaccination is overdue' }).waitFor();
    const moved = schedule.getByRole('row', { name: /Day 14/ });
    expect(await moved.innerText()).to.contain(siteDay(site, 2)).and.contain(`moved from ${siteDay(site, -16)}`).and.contain('Planned');

    await schedule.getByRole('button', { name: `Cancel Water vaccine IB, due ${siteDay(site, -2)}` }).click();
    const cancel = page.getByRole('dialog');
    await cancel.getByLabel('Reason').fill('Given at the rearing farm before transfer; paper record filed.');
    await expectAccessible(page, 'cancel dialog');
    await cancel.getByRole('button', { name: 'Cancel vaccination' }).click();
    await cancel.waitFor({ state: 'detached' });
    const week4 = schedule.getByRole('row', { name: /Week 4/ });
    await week4.getByText('Cancelled').waitFor();
    expect(await week4.innerText()).to.contain('Given at the rearing farm before transfer');
    expect(await page.getByRole('note').count(), 'nothing overdue any more').to.equal(0);
    await expectAccessible(page, 'flock page after planning and cancelling');
    await page.screenshot({ path: screenshotPath('flock-schedule-resolved'), fullPage: true });
  });

  it('shows the crew, on a phone, the overdue steps without the buttons to change them', async function () {
    this.timeout(60_000);
    const { site, flock } = await pulletFlock();
    await createTestUser({ email: 'crew@test.example', roles: ['crew'], sites: [site] });
    const phone = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await phone.newPage();
    await signInOnPage(page, suite.server.url, 'crew@test.example');
    await page.goto(`${suite.server.url}/flocks/${flock.id}`);
    const note = page.getByRole('note', { name: '2 vaccinations are overdue' });
    await note.waitFor();
    expect(await note.innerText()).to.contain('A veterinarian, purchasing or an admin plans each');
    expect(await page.getByRole('button', { name: /^Plan a new date/ }).count()).to.equal(0);
    await expectAccessible(page, 'flock page for the crew');
    await page.getByRole('table', { name: 'Vaccination schedule' }).scrollIntoViewIfNeeded();
    await page.screenshot({ path: screenshotPath('flock-schedule-overdue-phone'), fullPage: true });
    await phone.close();
  });
});
