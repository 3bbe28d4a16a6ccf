// In Chromium: a veterinarian reads a crew lead's day sheet and enters a water volume; an admin sets a site's heat limit on the sites page;
// the flock page links its vaccination history.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { Site, User } from '../../database/models/index.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createTestUser, testPassword } from '../support/test-app.js';
import { setUpDay } from '../support/vaccination-day-fixtures.js';
import { browserSuite } from '../support/browser-suite.js';

async function expectAccessible(page: Page, what: string): Promise<void> {
  const violations = await seriousAccessibilityViolations(page);
  expect(violations, `${what}: ${describeViolations(violations)}`).to.have.length(0);
}

async function signInPage(suite: ReturnType<typeof browserSuite>, email: string, timezoneId: string): Promise<Page> {
  const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 }, timezoneId });
  const page = await context.newPage();
  await page.goto(`${suite.server.url}/`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
  return page;
}

describe('vaccination-day planning in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('a veterinarian reads the crew lead’s day sheet, enters a water volume and sees it on the sheet', async function () {
    this.timeout(120_000);
    const day = await setUpDay({ code: 'HILL', birds: 8_000 });
    await day.lead.user.update({ name: 'Mara Quill' });
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });
    const page = await signInPage(suite, 'vet@test.example', day.site.timeZone);

    await page.goto(`${suite.server.url}/vaccination-day`);
    // The first lead of the day is chosen for a planner: their sheet, not the planner's own (empty) one.
    await page.getByText('Day sheet of Mara Quill').waitFor();
    await page.getByRole('heading', { name: '1. Site HILL · House 1' }).waitFor();
    await page.getByText('not recorded: see the label').waitFor();
    await expectAccessible(page, 'a lead’s day sheet');
    await page.screenshot({ path: screenshotPath('day-sheet-lead-picker'), fullPage: true });

    await page.getByRole('link', { name: 'Water volumes' }).click();
    await page.getByRole('heading', { name: 'Water volumes' }).waitFor();
    await page.getByText('No water volume entered yet.').waitFor();
    await page.getByRole('button', { name: 'Save the water volume' }).click();
    await page.getByText('Required.').first().waitFor();
    const form = page.getByRole('form', { name: 'Enter a water volume' });
    await form.getByRole('combobox', { name: 'Product' }).click();
    await page.getByRole('option', { name: day.product.name }).click();
    await form.getByLabel('From age (days)').fill('0');
    await form.getByLabel('To age (days)').fill('200');
    await form.getByLabel('mL of water per 1,000 birds').fill('300');
    await form.getByRole('combobox', { name: 'Where the volume comes from' }).click();
    await page.getByRole('option', { name: 'The label' }).click();
    await form.getByLabel('Note (optional)').fill('Label, section 4');
    await form.getByRole('button', { name: 'Save the water volume' }).click();
    await page.getByText('Saved: 300 mL per 1,000 birds for ages 0–200 days.').waitFor();
    // The emptied form is ready for the next entry, not showing errors.
    expect(await page.getByText('Required.').count()).to.equal(0);
    const row = page.getByRole('row', { name: new RegExp(day.product.name) });
    await expect(await row.textContent()).to.include('The label').and.include('Label, section 4').and.include('Test veterinarian');
    await expectAccessible(page, 'water volumes');
    await page.screenshot({ path: screenshotPath('water-volumes'), fullPage: true });

    // Hand-computed: 8,000 birds × 300 mL / 1,000 = 2,400 mL.
    await page.getByRole('link', { name: 'Day sheet' }).first().click();
    await page.getByText('2,400 mL').waitFor();
  });

  it('an admin sets a site’s spray heat limit in °C and the flock page links the vaccination history', async function () {
    this.timeout(120_000);
    const day = await setUpDay({ code: 'HILL' });
    const admin = await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
    await User.update({ displayUnit: 'C' }, { where: { id: admin.id } });
    const page = await signInPage(suite, 'admin@test.example', day.site.timeZone);

    await page.goto(`${suite.server.url}/sites`);
    const siteRow = page.getByRole('row', { name: /Site HILL/ });
    await expect(await siteRow.textContent()).to.include('No heat limit set');
    await page.getByRole('button', { name: 'Edit Site HILL' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Spray heat limit (°C)').fill('80');
    await dialog.getByRole('button', { name: 'Save changes' }).click();
    // 32–130 °F is 0–54.4 °C (hand-computed), so 80 °C is refused beside the field.
    await dialog.locator('mat-error').filter({ hasText: 'Between 0 and 54.4 °C.' }).waitFor();
    await expectAccessible(page, 'site settings dialog');
    await page.screenshot({ path: screenshotPath('site-settings-dialog') });
    await dialog.getByLabel('Spray heat limit (°C)').fill('30');
    await dialog.getByRole('button', { name: 'Save changes' }).click();
    await dialog.waitFor({ state: 'detached' });
    // Hand-computed: 30 °C = 86 °F, stored in °F and shown back in the admin's unit.
    await page.getByRole('row', { name: /Site HILL/ }).getByText('Heat limit 30 °C').waitFor();
    const saved = (await Site.findByPk(day.site.id))!.settings as { sprayHeatLimitF: number };
    expect(saved.sprayHeatLimitF).to.equal(86);
    await expectAccessible(page, 'sites page');

    await page.goto(`${suite.server.url}/flocks/${day.vaccination.flockId}`);
    const csv = page.getByRole('link', { name: /CSV/ });
    await csv.waitFor();
    const href = await csv.getAttribute('href');
    expect(href).to.equal(`/api/vaccination-day/flocks/${day.vaccination.flockId}/history.csv`);
    const response = await page.request.get(`${suite.server.url}${href}`);
    expect(response.status()).to.equal(200);
    expect(await page.getByRole('link', { name: /PDF record for audits/ }).getAttribute('href')).to.equal(`/api/vaccination-day/flocks/${day.vaccination.flockId}/history.pdf`);
    await expectAccessible(page, 'flock page');
  });
});
