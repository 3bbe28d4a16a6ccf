// In Chromium: storage staff open the lots list, filter it, open a lot, transfer vials, and count a fridge.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { Hold, PlannedTransfer, StockCount, StockMovement } from '../../database/models/index.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';
import { createFridge } from '../support/fridge-fixtures.js';
import { createPresentation, createProduct, siteDay, stockLot } from '../support/flock-fixtures.js';
import { balanceOf } from '../support/receiving-state.js';
import { browserSuite } from '../support/browser-suite.js';

async function expectAccessible(page: Page): Promise<void> {
  const violations = await seriousAccessibilityViolations(page);
  expect(violations, describeViolations(violations)).to.have.length(0);
}

const settle = (page: Page) => page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));

async function choose(page: Page, scope: ReturnType<Page['getByRole']> | Page, label: string, option: string): Promise<void> {
  await scope.getByRole('combobox', { name: label }).click();
  await page.getByRole('option', { name: option }).click();
  await settle(page);
}

const utcInput = (ms: number) => new Date(ms).toISOString().slice(0, 16);

describe('lots, transfers and stock counts in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('lists and filters lots, opens one, transfers vials and submits a fridge count, at desktop and phone widths', async function () {
    this.timeout(120_000);
    const site = await createSite('LOTS', 'UTC');
    const main = await createFridge(site, { code: 'LOTS-MAIN' });
    const spare = await createFridge(site, { code: 'LOTS-SPARE' });
    const spray = await createProduct({ name: 'Spray vaccine L' });
    await spray.update({ timeOutLimitMinutes: 30 });
    const usable = await stockLot(main, await createPresentation(spray, 1000), 20, siteDay(site, 60), { lotNumber: 'LT1001' });
    const held = await stockLot(main, await createPresentation(await createProduct({ name: 'Drinking-water vaccine M' }), 2500), 6, siteDay(site, 200), { lotNumber: 'LT2002' });
    await Hold.create({ lotId: held.id, cause: 'arrival', sourceKind: 'test', sourceId: 1, reason: 'arrived at 52 °F', openedBy: null });
    await createTestUser({ email: 'storage@test.example', roles: ['storage'], sites: [site] });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 }, timezoneId: 'UTC' });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/`);
    await page.getByLabel('E-mail').fill('storage@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    // The storage card lists both never-counted fridges.
    await page.getByRole('heading', { name: 'Stock count due' }).waitFor();
    expect(await page.getByRole('link', { name: 'LOTS-MAIN' }).count()).to.be.greaterThan(0);
    await page.screenshot({ path: screenshotPath('home-storage-card-counts-due') });

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Lots' }).click();
    await page.getByRole('heading', { name: 'Lots', level: 1 }).waitFor();
    await page.getByText('2 lots').waitFor();
    const numbers = () => page.getByRole('list', { name: 'Lots' }).locator('a.lot-number').allInnerTexts();
    // Earliest expiry first; status in words.
    expect(await numbers()).to.deep.equal(['Lot LT1001', 'Lot LT2002']);
    await page.getByText('On hold: arrival').waitFor();
    await settle(page);
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('lots-list-desktop'), fullPage: true });

    await choose(page, page, 'Status', 'On hold');
    await page.getByRole('button', { name: 'Show lots' }).click();
    await page.getByText('1 lot', { exact: true }).waitFor();
    expect(await numbers()).to.deep.equal(['Lot LT2002']);
    await page.getByRole('button', { name: 'Clear' }).click();
    await page.getByLabel('Lot number').fill('lt10');
    await page.getByRole('button', { name: 'Show lots' }).click();
    await page.getByText('1 lot', { exact: true }).waitFor();
    expect(await numbers()).to.deep.equal(['Lot LT1001']);

    await page.getByRole('link', { name: 'Lot LT1001' }).click();
    await page.getByRole('heading', { name: 'Lot LT1001', level: 1 }).waitFor();
    await page.getByText('20 vials (20,000 doses) on hand').waitFor();
    await page.getByRole('heading', { name: 'Temperature exposure' }).waitFor();
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('lot-page-desktop'), fullPage: true });

    await page.getByRole('button', { name: 'Transfer vials' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('heading', { name: 'Transfer vials of lot LT1001' }).waitFor();
    await settle(page);
    await choose(page, dialog, 'To fridge', 'LOTS-SPARE');
    await dialog.getByLabel('Vials').fill('3');
    const now = Date.now();
    await dialog.getByLabel('Left the fridge at').fill(utcInput(now - 20 * 60_000));
    await dialog.getByLabel('Arrived at').fill(utcInput(now));
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('lot-transfer-dialog') });
    await dialog.getByRole('button', { name: 'Record transfer' }).click();
    await dialog.waitFor({ state: 'detached' });
    // 20 min out, under the 30 min limit: moved, no hold.
    await page.locator('mat-snack-bar-container').getByText('Moved. 20 min out of a fridge.', { exact: true }).waitFor();
    expect([await balanceOf(usable.id, main.id), await balanceOf(usable.id, spare.id)]).to.deep.equal([17, 3]);
    expect(await Hold.count({ where: { lotId: usable.id } })).to.equal(0);
    await page.getByRole('row', { name: /Transferred/ }).waitFor();

    await page.getByRole('button', { name: 'Discard vials' }).click();
    await dialog.getByRole('heading', { name: 'Discard vials of lot LT1001' }).waitFor();
    await settle(page);
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('lot-discard-dialog') });
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'detached' });

    await page.getByRole('link', { name: 'LOTS-MAIN' }).first().click();
    await page.getByText('Stock count due:').waitFor();
    await page.getByText('Vaccine in this fridge: 2 lots, 23 vials').click();
    await page.getByRole('link', { name: 'Lot LT2002' }).waitFor();
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('fridge-count-due') });
    await page.getByRole('link', { name: 'Count sheet' }).click();
    await page.getByRole('heading', { name: 'Stock count · LOTS-MAIN' }).waitFor();
    const lines = page.getByRole('list', { name: 'Lots to count' }).getByRole('listitem');
    expect(await lines.count()).to.equal(2);
    await lines.nth(0).getByLabel('Counted vials').fill('16');
    await lines.nth(0).getByText('1 fewer than expected').waitFor();
    await lines.nth(0).getByLabel('Why it differs').fill('one vial cracked in the tray');
    await lines.nth(1).getByLabel('Counted vials').fill('6');
    await lines.nth(1).getByText('matches').waitFor();
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('stock-count-desktop'), fullPage: true });
    await page.getByRole('button', { name: 'Submit count' }).click();
    await page.locator('mat-snack-bar-container').getByText('Count saved; 1 adjustment posted.').waitFor();
    await page.getByText('16 of 17 expected (-1: one vial cracked in the tray)').waitFor();
    expect(await balanceOf(usable.id, main.id)).to.equal(16);
    expect(await StockCount.count()).to.equal(1);
    expect(await StockMovement.count({ where: { kind: 'adjust' } })).to.equal(1);

    // Phone width: the same pages stay usable and accessible.
    await page.setViewportSize({ width: 390, height: 844 });
    await page.reload();
    await page.getByRole('heading', { name: 'Stock count · LOTS-MAIN' }).waitFor();
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('stock-count-phone'), fullPage: true });
    await page.goto(`${suite.server.url}/lots`);
    await page.getByText('2 lots').waitFor();
    await settle(page);
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('lots-list-phone'), fullPage: true });
    // On a phone the filters beyond the lot number start folded.
    expect(await page.getByRole('combobox', { name: 'Status' }).isVisible()).to.equal(false);
    await page.getByRole('button', { name: 'More filters' }).click();
    await page.getByRole('combobox', { name: 'Status' }).waitFor();
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('lots-filters-phone'), fullPage: true });
    await page.goto(`${suite.server.url}/lots/${held.id}`);
    await page.getByRole('heading', { name: 'Lot LT2002', level: 1 }).waitFor();
    await page.getByRole('link', { name: 'Print the "do not use" tag (PDF)' }).waitFor();
    await expectAccessible(page);
    await page.screenshot({ path: screenshotPath('lot-page-phone'), fullPage: true });
    await context.close();
  });

  it('the lot page, its dialogs (carrying out a planned transfer) and the count sheet run under the enforced CSP without a violation', async function () {
    this.timeout(60_000);
    const site = await createSite('CSP', 'UTC');
    const fridge = await createFridge(site, { code: 'CSP-F1' });
    await createFridge(site, { code: 'CSP-F2' });
    const other = await createSite('CSP2', 'UTC');
    const otherFridge = await createFridge(other, { code: 'CSP2-F1' });
    const lot = await stockLot(fridge, await createPresentation(await createProduct(), 1000), 4, siteDay(site, 90), { lotNumber: 'CSP1' });
    const planned = await PlannedTransfer.create({ lotId: lot.id, fromSiteId: site.id, toSiteId: other.id, vials: 2, plannedOn: siteDay(other, 1), createdBy: null });
    await createTestUser({ email: 'csp@test.example', roles: ['storage'], sites: [site, other] });
    const context = await suite.browser.newContext();
    const page = await context.newPage();
    const violations: string[] = [];
    page.on('console', (message) => {
      if (/Content Security Policy|Refused to/i.test(message.text())) violations.push(message.text());
    });
    await page.addInitScript(() => {
      document.addEventListener('securitypolicyviolation', (event) => console.error(`Refused to load: CSP ${event.violatedDirective} ${event.blockedURI}`));
    });
    await page.goto(`${suite.server.url}/`);
    await page.getByLabel('E-mail').fill('csp@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('navigation', { name: 'Main' }).waitFor();
    await page.goto(`${suite.server.url}/lots/${lot.id}`);
    await page.getByRole('heading', { name: 'Lot CSP1', level: 1 }).waitFor();
    for (const action of ['Transfer vials', 'Discard vials']) {
      await page.getByRole('button', { name: action }).click();
      await page.getByRole('dialog').waitFor();
      await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
      await page.getByRole('dialog').waitFor({ state: 'detached' });
    }
    // Carrying out the planned transfer: the dialog offers only the receiving site's fridges and the planned vials.
    await page.getByRole('button', { name: `Carry out the transfer planned for ${planned.plannedOn}` }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText(`Carries out the transfer planned for ${planned.plannedOn}: 2 vials from Site CSP to Site CSP2.`).waitFor();
    expect(await dialog.getByLabel('Vials').inputValue()).to.equal('2');
    await settle(page);
    await choose(page, dialog, 'To fridge', 'CSP2-F1');
    await dialog.getByRole('button', { name: 'Record transfer' }).click();
    await dialog.waitFor({ state: 'detached' });
    expect((await planned.reload()).status).to.equal('done');
    expect(await balanceOf(lot.id, otherFridge.id)).to.equal(2);
    await page.getByRole('heading', { name: 'Planned transfers' }).waitFor({ state: 'detached' });
    await page.goto(`${suite.server.url}/fridges/${fridge.id}/count`);
    await page.getByRole('heading', { name: 'Stock count · CSP-F1' }).waitFor();
    await page.waitForLoadState('networkidle');
    // Someone takes a vial after the sheet was opened: the count is refused and the sheet offers a reload.
    await page.getByLabel('Counted vials').fill('2');
    await StockMovement.create({ lotId: lot.id, kind: 'discard', vials: 1, fromFridgeId: fridge.id, toFridgeId: null, leftAt: null, at: new Date(), sourceKind: 'test', sourceId: null, recordedBy: null });
    await page.getByRole('button', { name: 'Submit count' }).click();
    await page.getByRole('alert').filter({ hasText: 'reload the sheet and count again' }).waitFor();
    await page.screenshot({ path: screenshotPath('stock-count-stale') });
    await page.getByRole('button', { name: 'Reload the sheet' }).click();
    await page.getByText('Expected 1 vials').waitFor();
    expect(await page.getByLabel('Counted vials').inputValue()).to.equal('');
    expect(await StockCount.count()).to.equal(0);
    expect(violations).to.deep.equal([]);
    await context.close();
  });
});
