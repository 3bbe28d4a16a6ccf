// In Chromium: storage staff import a logger file, map its columns on the preview, see the chart and the excursion, record a check.
import { expect } from 'chai';
import type { BrowserContext, Page } from 'playwright-core';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';
import { createFridge, createLogger } from '../support/fridge-fixtures.js';
import { browserSuite } from '../support/browser-suite.js';

async function signIn(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

/** A file whose header names neither the temperature column nor its unit: the person has to choose both. */
function unhelpfulFile(): string {
  const start = Date.now() - 6 * 3_600_000;
  const temps = [4, 4.2, 4.1, 9.2, 9.8, 9.1, 4.3, 4, 4.1, 4.2, 4, 4.1];
  const other = [61, 58, 63, 60, 62, 59, 64, 57, 61, 60, 62, 58];
  const pad = (n: number) => String(n).padStart(2, '0');
  const rows = temps.map((t, i) => {
    const d = new Date(start + i * 10 * 60_000);
    return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())}T${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}:00Z,${t},${other[i]}`;
  });
  return ['Cooler export', 'When,Reading,Other', ...rows].join('\n') + '\n';
}

describe('fridge logs in Chromium', () => {
  const suite = browserSuite();
  let context: BrowserContext;
  beforeEach(async () => {
    await resetDatabase();
    context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
  });
  afterEach(() => context.close());

  it('imports a file after mapping its columns on the preview, then shows the chart and the excursion', async function () {
    this.timeout(90_000);
    const site = await createSite('LKN');
    const fridge = await createFridge(site, { code: 'LKN-F1' });
    await createLogger(fridge, 'primary', 'LK1-0417');
    await createTestUser({ email: 'storage@test.example', roles: ['storage'] });
    const page = await context.newPage();
    await signIn(page, suite.server.url, 'storage@test.example');
    await page.getByText('Not checked today').waitFor();
    await expectAccessible(page, 'home with the storage card');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Fridges' }).click();
    await page.getByRole('table', { name: 'Fridges' }).waitFor();
    await page.getByText('No recent data').waitFor();
    await expectAccessible(page, 'fridges list');
    await page.getByRole('button', { name: 'New fridge' }).click();
    await page.getByRole('dialog').getByLabel('Name').waitFor();
    await expectAccessible(page, 'new fridge dialog');
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
    await page.getByRole('dialog').waitFor({ state: 'detached' });

    await page.getByRole('link', { name: 'LKN-F1 · Fridge' }).click();
    await page.getByRole('link', { name: 'Import a logger file' }).click();
    await page.getByRole('heading', { name: 'Import a logger file' }).waitFor();
    await page.locator('input[type=file]').setInputFiles({ name: 'cooler.csv', mimeType: 'text/csv', buffer: Buffer.from(unhelpfulFile()) });
    await page.getByText(/could not tell the temperature column, the unit/).waitFor();
    expect(await page.getByRole('button', { name: 'Import the file' }).isDisabled()).to.equal(true);
    await page.getByRole('combobox', { name: 'Temperature column' }).click();
    await page.getByRole('option', { name: 'Reading (column 2)' }).click();
    await page.getByRole('combobox', { name: 'Unit' }).click();
    await page.getByRole('option', { name: '°C' }).click();
    await page.getByText('Vialyard read the layout.').waitFor();
    // The preview reads line 3 (after a metadata line and the header) as 4 °C, shown in the user's °F: (4 × 1.8) + 32 (NIST SP 811).
    await page.getByText(/Line 3: .* · 39\.2 °F/).waitFor();
    await page.mouse.move(0, 0);
    await page.screenshot({ path: screenshotPath('fridge-import-preview') });
    await expectAccessible(page, 'import page with the mapping preview');

    await page.getByRole('button', { name: 'Import the file' }).click();
    await page.getByText('Stored 12 readings; 1 excursion opened.').waitFor({ timeout: 30_000 });
    await page.getByText(/do not discard it unless directed/).first().waitFor();
    await page.screenshot({ path: screenshotPath('fridge-import-done') });
    await expectAccessible(page, 'import result');

    await page.getByRole('link', { name: 'Back to the fridge' }).click();
    await page.getByRole('table', { name: 'Excursions' }).getByText('Too warm').waitFor();
    await page.getByRole('img', { name: /Temperature chart/ }).waitFor();
    await page.getByText(/every reading; shaded columns are excursions/).waitFor();
    await page.getByText("The chart's data as a table (12 rows)").click();
    await page.getByRole('table', { name: 'Chart data' }).getByRole('row').nth(12).waitFor();
    await page.getByRole('table', { name: 'Uploaded files' }).getByText('cooler.csv').waitFor();
    await page.getByRole('radio', { name: 'Day' }).or(page.getByRole('button', { name: 'Day' })).first().click();
    await page.getByText(/every reading; shaded columns are excursions/).waitFor();
    await page.mouse.move(0, 0);
    await page.screenshot({ path: screenshotPath('fridge-page') });
    await expectAccessible(page, 'fridge page');

    await page.getByRole('button', { name: 'Add logger' }).click();
    await page.getByRole('dialog').getByLabel('Serial number').waitFor();
    await expectAccessible(page, 'add logger dialog');
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
  });

  it('records a daily check out of range, which opens an excursion and says the vaccine stays in the fridge', async function () {
    this.timeout(60_000);
    const fridge = await createFridge(await createSite('LKN'), { code: 'LKN-F2' });
    await createTestUser({ email: 'storage@test.example', roles: ['storage'] });
    const page = await context.newPage();
    await signIn(page, suite.server.url, 'storage@test.example');
    await page.goto(`${suite.server.url}/daily-check?fridge=${fridge.id}`);
    await page.getByRole('heading', { name: 'Daily check' }).waitFor();
    await page.getByText(/LKN-F2 · Fridge/).waitFor();
    await page.getByLabel('Current').fill('41');
    await page.getByLabel('Minimum since reset').fill('36.5');
    await page.getByLabel('Maximum since reset').fill('48.2');
    await page.getByLabel('Your initials').fill('gl');
    await page.getByRole('button', { name: 'Record the check' }).click();
    await page.getByRole('alert').getByText('Out of range: an excursion record was opened.').waitFor();
    expect(await page.getByRole('alert').innerText()).to.match(/Do not discard it unless directed: the veterinarian decides/);
    await page.screenshot({ path: screenshotPath('fridge-daily-check') });
    await expectAccessible(page, 'daily check page');
    await page.getByRole('link', { name: 'Open the fridge' }).click();
    await page.getByText('found at a daily check').waitFor();
  });
});
