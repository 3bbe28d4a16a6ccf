// Keyboard alone, in Chromium: a receiving clerk signs in, opens the expected order, answers the checks, types the reading and
// a barcode, and puts the lot into stock — Tab, Enter, Space and typing only, each control showing where the focus is.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { Lot, Shipment, StockMovement } from '../../database/models/index.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createCatalogue, createFridge, createPurchaseOrder } from '../support/receiving-fixtures.js';
import { clearPhotoFiles } from '../support/receiving-state.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';

const settled = (page: Page) => page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));

/** What a person hears for the focused element: its label, text and name, in one line. */
function focusedLabel(page: Page): Promise<string> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLInputElement | null;
    const labelText = el?.labels?.[0]?.textContent ?? '';
    return `${el?.getAttribute('aria-label') ?? ''} ${el?.textContent ?? ''} ${labelText}`.replace(/\s+/g, ' ').trim();
  });
}

/** Presses Tab until the focused element matches; never clicks. */
async function tabTo(page: Page, pattern: RegExp, limit = 60): Promise<void> {
  const seen: string[] = [];
  for (let i = 0; i < limit; i++) {
    await page.keyboard.press('Tab');
    const label = await focusedLabel(page);
    if (pattern.test(label)) return;
    seen.push(label);
  }
  throw new Error(`no focusable element matching ${pattern} within ${limit} tabs; focus went through: ${seen.join(' | ')}`);
}

/**
 * The focus is visible when the focused control looks different from the same control unfocused: a picture of its
 * box (with room for an outline) focused, then after Shift+Tab moved the focus away; Tab brings it back.
 */
async function expectVisibleFocus(page: Page, what: string): Promise<void> {
  const box = await page.evaluate(() => {
    const rect = document.activeElement!.getBoundingClientRect();
    return { x: Math.max(0, rect.x - 6), y: Math.max(0, rect.y - 6), width: rect.width + 12, height: rect.height + 12 };
  });
  await settled(page);
  const focused = await page.screenshot({ clip: box });
  await page.keyboard.press('Shift+Tab');
  await settled(page);
  const away = await page.screenshot({ clip: box });
  await page.keyboard.press('Tab');
  await settled(page);
  expect(focused.equals(away), `${what}: the focus shows`).to.equal(false);
}

describe('receiving by keyboard in Chromium', () => {
  const suite = browserSuite();

  it('a clerk receives the expected order with a typed barcode without the mouse', async () => {
    clearPhotoFiles();
    const site = await createSite('KEYR');
    const fridge = await createFridge(site, 'KEYR-F1');
    const catalogue = await createCatalogue({ name: 'Keyline IB spray', packGtin: '09506000134352' });
    const order = await createPurchaseOrder(site, catalogue, { expectedDate: siteLocalDate(new Date(), site.timeZone), packs: 2 });
    await createTestUser({ email: 'clerk@test.example', roles: ['receiving'], sites: [site] });
    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();

    await page.goto(`${suite.server.url}/sign-in`);
    await page.getByLabel('E-mail').waitFor();
    await page.keyboard.press('Tab');
    await page.keyboard.type('clerk@test.example');
    await page.keyboard.press('Tab');
    await page.keyboard.type(testPassword);
    await page.keyboard.press('Enter');
    await page.getByRole('navigation', { name: 'Main' }).waitFor();

    await tabTo(page, /^[a-z_]*Receiving$/);
    await expectVisibleFocus(page, 'the Receiving link');
    await page.keyboard.press('Enter');
    await page.getByText(`Order ${order.reference}`).waitFor();
    await tabTo(page, new RegExp(`Receive order ${order.reference}`));
    await expectVisibleFocus(page, 'the order to receive');
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: 'Receive a shipment' }).waitFor();
    await settled(page);

    await tabTo(page, /All checks fine/);
    await expectVisibleFocus(page, 'All checks fine');
    await page.keyboard.press('Enter');
    // The checks answered, the focus goes to the reading.
    await page.keyboard.type('39.5');
    // Where it was read is one group, one Tab stop; the arrows move within it (and pick, as in a radio group), Space picks too.
    await tabTo(page, /^(Product surface|Probe|Air)/, 10);
    for (let i = 0; i < 4 && !/^Probe/.test(await focusedLabel(page)); i++) await page.keyboard.press('ArrowRight');
    expect(await focusedLabel(page)).to.match(/^Probe/);
    await expectVisibleFocus(page, 'the probe choice');
    await page.keyboard.press('Space');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-checked') ?? document.activeElement?.getAttribute('aria-pressed'))).to.equal('true');
    // The scan field comes next; a hand scanner types into it, and so can the clerk.
    await tabTo(page, /barcode/i, 3);
    await expectVisibleFocus(page, 'the scan field');
    await page.keyboard.type(`01${catalogue.presentation.packGtin}17280300` + '10KEY2041');
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: /Lot KEY2041/ }).waitFor();
    await settled(page);
    const violations = await seriousAccessibilityViolations(page);
    expect(violations, describeViolations(violations)).to.have.length(0);
    await page.screenshot({ path: screenshotPath('receiving-keyboard-form'), fullPage: true });

    await tabTo(page, /Save and put into stock/, 80);
    await expectVisibleFocus(page, 'Save and put into stock');
    await page.screenshot({ path: screenshotPath('receiving-keyboard-save-focused') });
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { name: /^Shipment \d+$/ }).waitFor();
    await page.screenshot({ path: screenshotPath('receiving-keyboard-received'), fullPage: true });

    const lot = await Lot.findOne({ where: { lotNumber: 'KEY2041' } });
    expect(lot, 'the lot is in the database').to.not.equal(null);
    expect(await Shipment.count()).to.equal(1);
    const movement = await StockMovement.findOne({ where: { lotId: lot!.id } });
    expect(movement).to.include({ kind: 'receive', vials: 20, toFridgeId: fridge.id });
    await context.close();
  });
});
