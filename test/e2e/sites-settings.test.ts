// The sites page in Chromium: an admin creates a site, changes a setting, sees bad values refused beside their fields
// (by the form, and by the server when the form is bypassed); the form's limits agree with the shared schema.
import { expect } from 'chai';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Locator, Page } from 'playwright-core';
import { Site } from '../../database/models/index.js';
import { projectRoot } from '../../database/scripts/runtime-dir.js';
import { siteInputSchema, siteSettingsSchema } from '../../shared/sites/site-schemas.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';

interface Limit { min: number; max: number; integer: boolean }
interface ClientLimits {
  settingLimits: Record<string, Limit>;
  expiryWindowLimits: { min: number; max: number; most: number };
  heatLimitF: { min: number; max: number };
  siteCodePattern: RegExp;
  siteNameMaxLength: number;
  settingDefaults: Record<string, unknown>;
}

/** The client's limits file, loaded as it is (it imports nothing), so a drift from the schema fails here. */
async function clientLimits(): Promise<ClientLimits> {
  return (await import(pathToFileURL(join(projectRoot, 'client/src/app/pages/sites/site-setting-limits.ts')).href)) as ClientLimits;
}

const accepts = (settings: Record<string, unknown>) => siteSettingsSchema.partial().safeParse(settings).success;

async function expectAccessible(page: Page, what: string): Promise<void> {
  await page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
  const violations = await seriousAccessibilityViolations(page);
  expect(violations, `${what}: ${describeViolations(violations)}`).to.have.length(0);
}

async function signInPage(suite: ReturnType<typeof browserSuite>, email: string): Promise<Page> {
  const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await page.goto(`${suite.server.url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
  return page;
}

/** The form field (label, input, hint or error) around the input labelled `label`. */
function fieldOf(dialog: Locator, label: string): Locator {
  return dialog.locator('mat-form-field').filter({ has: dialog.page().getByLabel(label, { exact: true }) });
}

/** Expects `message` under the field labelled `label`, read with the input (aria-describedby) and marking it invalid. */
async function expectFieldError(dialog: Locator, label: string, message: string): Promise<void> {
  const error = fieldOf(dialog, label).locator('mat-error').filter({ hasText: message });
  await error.waitFor();
  const input = dialog.getByLabel(label, { exact: true });
  expect(await input.getAttribute('aria-invalid'), `${label} is marked invalid`).to.equal('true');
  expect(await input.getAttribute('aria-describedby'), `${label}'s error is read with it`).to.contain((await error.getAttribute('id'))!);
}

describe('the sites form’s limits', () => {
  it('are the shared schema’s: each numeric setting’s ends accepted, a step past them refused, fractions where whole numbers are asked', async () => {
    const limits = await clientLimits();
    expect(Object.keys(limits.settingLimits).sort()).to.deep.equal(
      Object.keys(siteSettingsSchema.shape).filter((key) => key !== 'expiryAlertDays' && key !== 'sprayHeatLimitF').sort(),
    );
    for (const [setting, { min, max, integer }] of Object.entries(limits.settingLimits)) {
      expect(accepts({ [setting]: min }), `${setting} = ${min}`).to.equal(true);
      expect(accepts({ [setting]: max }), `${setting} = ${max}`).to.equal(true);
      expect(accepts({ [setting]: min - 0.5 }), `${setting} below ${min}`).to.equal(false);
      expect(accepts({ [setting]: max + 0.5 }), `${setting} above ${max}`).to.equal(false);
      expect(accepts({ [setting]: min + 0.5 }), `${setting} = ${min + 0.5}`).to.equal(!integer);
    }
    const { min, max, most } = limits.expiryWindowLimits;
    expect(accepts({ expiryAlertDays: [min, max] })).to.equal(true);
    expect(accepts({ expiryAlertDays: Array.from({ length: most }, (_, i) => min + i) })).to.equal(true);
    expect(accepts({ expiryAlertDays: Array.from({ length: most + 1 }, (_, i) => min + i) })).to.equal(false);
    expect(accepts({ expiryAlertDays: [min - 1] })).to.equal(false);
    expect(accepts({ expiryAlertDays: [max + 1] })).to.equal(false);
    expect(accepts({ expiryAlertDays: [60, 30] }), 'descending').to.equal(false);
    expect(accepts({ expiryAlertDays: [30, 30] }), 'repeated').to.equal(false);
    expect(accepts({ sprayHeatLimitF: limits.heatLimitF.min })).to.equal(true);
    expect(accepts({ sprayHeatLimitF: limits.heatLimitF.max })).to.equal(true);
    expect(accepts({ sprayHeatLimitF: limits.heatLimitF.min - 0.1 })).to.equal(false);
    expect(accepts({ sprayHeatLimitF: limits.heatLimitF.max + 0.1 })).to.equal(false);
    expect(limits.settingDefaults, 'a new site starts from the schema’s defaults').to.deep.equal(siteSettingsSchema.parse({}));
    const site = (code: string, name = 'N') => siteInputSchema.safeParse({ code, name, timeZone: 'UTC' }).success;
    for (const code of ['AB', 'ab-1', 'A'.repeat(16), 'A', 'A'.repeat(17), 'A B', 'A_B']) {
      expect(limits.siteCodePattern.test(code), code).to.equal(site(code));
    }
    expect(site('AB', 'n'.repeat(limits.siteNameMaxLength))).to.equal(true);
    expect(site('AB', 'n'.repeat(limits.siteNameMaxLength + 1))).to.equal(false);
  });
});

describe('the sites page in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('an admin creates a site, changes a setting, and sees bad values refused beside their fields', async function () {
    this.timeout(120_000);
    await createSite('HILL');
    await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
    const page = await signInPage(suite, 'admin@test.example');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' }).click();
    await page.getByRole('heading', { level: 1, name: 'Sites' }).waitFor();
    const hill = page.getByRole('row', { name: /Site HILL/ });
    expect(await hill.textContent()).to.include('America/Chicago').and.include('Expiry alerts at 30, 60, 90 days').and.include('No heat limit set');

    await page.getByRole('button', { name: 'New site' }).click();
    const dialog = page.getByRole('dialog', { name: 'New site' });
    for (const group of ['The site', 'Receiving: deliveries at the door', 'Storage: fridges and their loggers', 'Purchasing: the stock outlook and orders', 'Vaccination day: spraying']) {
      await dialog.getByRole('heading', { name: group }).waitFor();
    }
    // A new site starts from the schema's defaults.
    expect(await dialog.getByLabel('No recent data after (hours)').inputValue()).to.equal('24');
    expect(await dialog.getByLabel('Expiry alerts (days)').inputValue()).to.equal('30, 60, 90');
    // Typing only once the dialog has finished opening: a busy machine can still be running its entry animation.
    await page.waitForFunction(() => document.getAnimations().every((animation) => animation.playState !== 'running'));
    await dialog.getByLabel('Code', { exact: true }).fill('ridge-2');
    await dialog.getByLabel('Name', { exact: true }).fill('Ridge pullets');
    expect(await dialog.getByLabel('Code', { exact: true }).inputValue(), 'the code as typed').to.equal('ridge-2');
    await dialog.getByLabel('Time zone').fill('Denver');
    await page.getByRole('option', { name: 'America/Denver' }).click();
    await dialog.getByLabel('No recent data after (hours)').fill('0');
    await dialog.getByLabel('Expiry alerts (days)').fill('90, 30');
    await dialog.getByRole('button', { name: 'Create site' }).click();
    await expectFieldError(dialog, 'No recent data after (hours)', 'Between 1 and 336 hours.');
    await expectFieldError(dialog, 'Expiry alerts (days)', 'List the windows from the shortest up, each longer than the one before.');
    expect(await fieldOf(dialog, 'Code').locator('mat-error').count(), 'no error on a good field').to.equal(0);
    expect(await dialog.getByLabel('No recent data after (hours)').evaluate((input) => input === document.activeElement), 'focus on the first field to correct').to.equal(true);
    expect(await Site.count(), 'nothing sent while the form has errors').to.equal(1);
    await expectAccessible(page, 'new site dialog with errors');
    await page.screenshot({ path: screenshotPath('sites-dialog-errors') });
    await dialog.locator('mat-dialog-content').evaluate((content) => content.scrollTo(0, content.scrollHeight));
    await page.screenshot({ path: screenshotPath('sites-dialog-errors-end') });

    await dialog.getByLabel('No recent data after (hours)').fill('36');
    await dialog.getByLabel('Expiry alerts (days)').fill('14, 45');
    await dialog.getByRole('button', { name: 'Create site' }).click();
    await dialog.waitFor({ state: 'detached' });
    const ridge = page.getByRole('row', { name: /Ridge pullets/ });
    await ridge.waitFor();
    expect(await ridge.textContent()).to.include('RIDGE-2').and.include('America/Denver').and.include('No recent data after 36 h').and.include('Expiry alerts at 14, 45 days');
    const created = (await Site.findOne({ where: { code: 'RIDGE-2' } }))!;
    expect(created.timeZone).to.equal('America/Denver');
    expect(created.settings).to.deep.include({ staleDataHours: 36, expiryAlertDays: [14, 45], storeWithinMinutes: 30, reorderMarginDays: 3, sprayHeatLimitF: null });

    await page.getByRole('button', { name: 'Edit Ridge pullets' }).click();
    const edit = page.getByRole('dialog', { name: 'Edit Ridge pullets' });
    await edit.getByLabel('Reorder margin (days)').fill('5');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    await edit.waitFor({ state: 'detached' });
    await page.getByRole('row', { name: /Ridge pullets/ }).getByText('Reorder margin 5 days').waitFor();
    await created.reload();
    expect(created.settings).to.deep.include({ reorderMarginDays: 5, staleDataHours: 36, expiryAlertDays: [14, 45] });
    await expectAccessible(page, 'sites page');
    await page.screenshot({ path: screenshotPath('sites-page'), fullPage: true });

    // Errors only the server finds: a code already in use (409), and a setting the form would never send, slipped
    // into the request on its way, which the API's schema refuses with a 400 naming settings.staleDataHours.
    await page.getByRole('button', { name: 'Edit Ridge pullets' }).click();
    await edit.getByLabel('Code').fill('hill');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    await expectFieldError(edit, 'Code', 'Already in use.');
    await edit.getByLabel('Code').fill('RIDGE-2');
    await page.route('**/api/sites/*', async (route) => {
      const body = route.request().postDataJSON() as { settings: Record<string, unknown> };
      await route.continue({ postData: JSON.stringify({ ...body, settings: { ...body.settings, staleDataHours: 0 } }) });
    });
    const answer = page.waitForResponse((response) => response.request().method() === 'PUT');
    await edit.getByRole('button', { name: 'Save changes' }).click();
    const refused = await answer;
    expect(refused.status()).to.equal(400);
    const fields = ((await refused.json()) as { error: { fields: { field: string; message: string }[] } }).error.fields;
    expect(fields.map((f) => f.field)).to.deep.equal(['settings.staleDataHours']);
    await expectFieldError(edit, 'No recent data after (hours)', fields[0]!.message);
    expect(await edit.locator('.form-error').count(), 'no message left over above the form').to.equal(0);
    await expectAccessible(page, 'edit dialog with a server error');
    await page.screenshot({ path: screenshotPath('sites-dialog-server-error') });
    await page.unroute('**/api/sites/*');
    await created.reload();
    expect(created.settings).to.deep.include({ staleDataHours: 36 });

    // On a phone the dialog's fields stack and stay readable.
    await page.keyboard.press('Escape');
    await edit.waitFor({ state: 'detached' });
    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByRole('button', { name: 'New site' }).click();
    await page.getByRole('dialog', { name: 'New site' }).waitFor();
    await expectAccessible(page, 'new site dialog on a phone');
    await page.screenshot({ path: screenshotPath('sites-dialog-phone') });
    await page.keyboard.press('Escape');

    // One place edits sites: the users page no longer lists them.
    await page.goto(`${suite.server.url}/users`);
    await page.getByRole('table', { name: 'Users' }).waitFor();
    expect(await page.getByRole('table', { name: /Sites/ }).count()).to.equal(0);
    await page.context().close();
  });

  it('is for admins only: another role is sent home and has no Sites link', async function () {
    this.timeout(60_000);
    await createTestUser({ email: 'storage@test.example', roles: ['storage'] });
    const page = await signInPage(suite, 'storage@test.example');
    expect(await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Sites' }).count()).to.equal(0);
    await page.goto(`${suite.server.url}/sites`);
    await page.waitForURL((url) => url.pathname === '/');
    await page.context().close();
  });
});
