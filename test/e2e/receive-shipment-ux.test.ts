// In Chromium on a phone: the receiving form hands the focus to the scan field whenever scanning is next — after a scan,
// when a removed line took the focused button with it, when a draft reopens on its lots — but never takes it from a
// field the clerk is typing in; a lot added by hand gets the focus in its own first field.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createCatalogue, createFridge, createPurchaseOrder } from '../support/receiving-fixtures.js';
import { clearPhotoFiles } from '../support/receiving-state.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';

/** Whether the scan field has the focus (its input is described by the scan hint). */
const scanFieldFocused = (page: Page) => page.evaluate(() => /scan-hint/.test(document.activeElement?.getAttribute('aria-describedby') ?? ''));

/** The focused element's label, its role and the line it belongs to. */
const focusedControl = (page: Page) =>
  page.evaluate(() => {
    const el = document.activeElement as HTMLInputElement | null;
    return {
      label: el?.labels?.[0]?.textContent?.trim() ?? '',
      role: el?.getAttribute('role') ?? el?.tagName.toLowerCase() ?? '',
      line: el?.closest('article')?.getAttribute('aria-labelledby') ?? null,
    };
  });

/** The draft is saved a moment after each change; wait until it holds this many lines. */
const draftHasLines = (page: Page, count: number) =>
  page.waitForFunction((n) => Object.keys(localStorage).some((key) => key.startsWith('vialyard.receiving-draft') && JSON.parse(localStorage.getItem(key)!).value.lines.length === n), count);

describe('the receiving form’s focus in Chromium', () => {
  const suite = browserSuite();
  beforeEach(async () => {
    await resetDatabase();
    clearPhotoFiles();
  });

  it('moves the focus to the scan field when scanning comes next, without taking it from a field in use', async function () {
    this.timeout(120_000);
    const site = await createSite('FOCR');
    await createFridge(site, 'FOCR-F1');
    const catalogue = await createCatalogue({ name: 'Focusline ND spray', packGtin: '09506000134352' });
    const order = await createPurchaseOrder(site, catalogue, { expectedDate: siteLocalDate(new Date(), site.timeZone), packs: 2 });
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [site] });
    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    try {
      const page = await context.newPage();
      await page.goto(`${suite.server.url}/sign-in`);
      await page.getByLabel('E-mail').fill('clerk@test.example');
      await page.getByLabel('Password', { exact: true }).fill(testPassword);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('heading', { level: 1 }).filter({ hasText: /Good/ }).waitFor();
      const formUrl = `${suite.server.url}/receiving/new?site=${site.id}&order=${order.id}`;
      await page.goto(formUrl);
      await page.getByText('Lot 1: scan or type').waitFor();
      // A new shipment opens on its arrival checks: the scan field does not jump ahead of them.
      expect(await scanFieldFocused(page), 'not on the lots step yet').to.equal(false);

      await page.getByRole('button', { name: 'All checks fine' }).click();
      await page.keyboard.type('39.5');
      await page.getByRole('radio', { name: 'Probe' }).or(page.getByRole('button', { name: 'Probe' })).first().click();
      expect(await scanFieldFocused(page), 'the reading placed').to.equal(true);
      await page.keyboard.type(`01${catalogue.presentation.packGtin}17280300` + '10FOC101');
      await page.keyboard.press('Enter');
      await page.getByRole('heading', { name: /Lot FOC101/ }).waitFor();
      expect(await scanFieldFocused(page), 'after a scan, ready for the next carton').to.equal(true);

      // A lot by hand has no barcode: its own first field takes the focus.
      await page.getByRole('button', { name: 'Add a lot by hand' }).click();
      await page.getByText('Lot 2: scan or type').waitFor();
      await page.waitForFunction(() => document.activeElement?.closest('article')?.getAttribute('aria-labelledby') === 'line-title-1');
      const byHand = await focusedControl(page);
      expect(byHand.role).to.equal('combobox');
      expect(byHand.line).to.equal('line-title-1');
      await page.screenshot({ path: screenshotPath('receive-ux-by-hand-focused') });
      await expectAccessible(page, 'receiving form with a line added by hand');

      // Removing it takes the focused button away; the focus goes back to scanning rather than to nowhere.
      await page.getByRole('button', { name: 'Remove line 2' }).click();
      await page.getByText('Lot 2: scan or type').waitFor({ state: 'detached' });
      await page.waitForFunction(() => /scan-hint/.test(document.activeElement?.getAttribute('aria-describedby') ?? ''));

      // The draft reopens on its lots: the next carton can be scanned at once, without a tap.
      await draftHasLines(page, 1);
      await page.reload();
      await page.getByRole('heading', { name: /Lot FOC101/ }).waitFor();
      await page.waitForFunction(() => /scan-hint/.test(document.activeElement?.getAttribute('aria-describedby') ?? ''));
      await page.keyboard.type(`01${catalogue.presentation.packGtin}17280300` + '10FOC102');
      await page.keyboard.press('Enter');
      await page.getByRole('heading', { name: /Lot FOC102/ }).waitFor();
      expect(await scanFieldFocused(page)).to.equal(true);
      await page.screenshot({ path: screenshotPath('receive-ux-reopened-scanned') });

      // Typing in another field while the page loads: the focus stays there when the draft comes back.
      await draftHasLines(page, 2);
      let release = () => undefined as void;
      const held = new Promise<void>((resolve) => (release = resolve));
      await page.route('**/api/shipments/sites/*/context', async (route) => {
        await held;
        await route.continue();
      });
      await page.reload();
      const carrier = page.getByLabel('Carrier');
      await carrier.click();
      await page.keyboard.type('Frost');
      release();
      await page.getByRole('heading', { name: /Lot FOC102/ }).waitFor();
      await page.waitForFunction(() => !(document.querySelector('button.send') as HTMLButtonElement | null)?.disabled);
      const kept = await focusedControl(page);
      expect(kept.label, 'the clerk’s field keeps the focus').to.equal('Carrier');
      expect(await scanFieldFocused(page)).to.equal(false);
      await page.unroute('**/api/shipments/sites/*/context');
      await expectAccessible(page, 'receiving form reopened');
    } finally {
      await context.close();
    }
  });
});
