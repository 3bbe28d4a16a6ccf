// In Chromium: the lots list lines its figures up in columns — numbers right-aligned in tabular figures under headers
// aligned with them, expiry dates in one form — at a desktop width and on a phone.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createFridge } from '../support/fridge-fixtures.js';
import { createPresentation, createProduct, siteDay, stockLot } from '../support/flock-fixtures.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';

const settle = (page: Page) => page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));

interface Box { left: number; right: number; width: number; visible: boolean; text: string; numeric: string }

/** Where each column's header and values sit (the text itself, not its cell), per `data-col`. */
function columnBoxes(page: Page, column: string): Promise<{ header: Box | null; values: Box[] }> {
  return page.evaluate((col) => {
    // No named functions in here (the test transpiler would wrap them in a helper the page does not have).
    const header = document.querySelector(`.lot-head [data-col="${col}"] .value`);
    const boxes = [header, ...Array.from(document.querySelectorAll(`.lot-list [data-col="${col}"] .value`))].map((el) => {
      if (!el) return null;
      const rect = el.getBoundingClientRect();
      return { left: rect.left, right: rect.right, width: rect.width, visible: rect.width > 0 && getComputedStyle(el).visibility !== 'hidden', text: (el.textContent ?? '').trim(), numeric: getComputedStyle(el).fontVariantNumeric };
    });
    return { header: boxes[0]!, values: boxes.slice(1) as NonNullable<(typeof boxes)[number]>[] };
  }, column);
}

const close = (a: number, b: number) => Math.abs(a - b) < 0.75;

describe('the lots list lines up its columns in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('right-aligns vials and doses in tabular figures under their headers, and shows every expiry the same way, at 1280 px and 390 px', async function () {
    this.timeout(90_000);
    const site = await createSite('ALIGN', 'UTC');
    const fridge = await createFridge(site, { code: 'ALIGN-F1' });
    const spray = await createProduct({ name: 'Spray vaccine R' });
    const water = await createProduct({ name: 'Drinking-water vaccine S' });
    // Vials chosen so the figures differ in width (1 to 4 digits), and 111 and 808 have the same digit count.
    await stockLot(fridge, await createPresentation(spray, 1000), 111, siteDay(site, 20), { lotNumber: 'AL101' });
    await stockLot(fridge, await createPresentation(water, 2500), 808, siteDay(site, 90), { lotNumber: 'AL2' });
    await stockLot(fridge, await createPresentation(spray, 500), 7, siteDay(site, 150), { lotNumber: 'AL30003' });
    // Given on the label as month and year only: stored as the month's last day (February 2028 has 29 days).
    await stockLot(fridge, await createPresentation(water, 10_000), 1250, '2028-02-29', { lotNumber: 'AL44', expiryDayGiven: false });
    await createTestUser({ email: 'storage@test.example', roles: ['storage'], sites: [site] });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 }, timezoneId: 'UTC' });
    try {
      const page = await context.newPage();
      await page.goto(`${suite.server.url}/sign-in`);
      await page.getByLabel('E-mail').fill('storage@test.example');
      await page.getByLabel('Password', { exact: true }).fill(testPassword);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('navigation', { name: 'Main' }).waitFor();
      await page.goto(`${suite.server.url}/lots`);
      await page.getByText('4 lots').waitFor();
      await settle(page);
      await page.screenshot({ path: screenshotPath('lots-ux-desktop'), fullPage: true });

      for (const column of ['dosesPerVial', 'vials', 'doses']) {
        const { header, values } = await columnBoxes(page, column);
        expect(values, column).to.have.length(4);
        expect(header?.visible, `${column} has a header`).to.equal(true);
        for (const value of values) {
          expect(close(value.right, header!.right), `${column} "${value.text}" ends where its header ends (${value.right} vs ${header!.right})`).to.equal(true);
          expect(value.numeric, `${column} "${value.text}"`).to.contain('tabular-nums');
        }
      }
      const vials = await columnBoxes(page, 'vials');
      expect(vials.values.map((v) => v.text)).to.deep.equal(['111', '808', '7', '1,250']);
      // Tabular figures: every digit is as wide as every other, so 111 and 808 take the same room.
      expect(close(vials.values[0]!.width, vials.values[1]!.width), `111 is ${vials.values[0]!.width} px wide, 808 ${vials.values[1]!.width} px`).to.equal(true);
      expect((await columnBoxes(page, 'doses')).values.map((v) => v.text)).to.deep.equal(['111,000', '2,020,000', '3,500', '12,500,000']);

      const expiry = await columnBoxes(page, 'expiry');
      expect(expiry.values.map((v) => v.text)).to.deep.equal([siteDay(site, 20), siteDay(site, 90), siteDay(site, 150), '2028-02-29']);
      for (const value of expiry.values) expect(close(value.left, expiry.header!.left), `expiry ${value.text} starts under its header`).to.equal(true);
      expect(expiry.values.every((v) => v.numeric.includes('tabular-nums'))).to.equal(true);
      // The month-only expiry says so beside the date, without pushing the date out of its column.
      expect(await page.getByRole('listitem').filter({ hasText: 'Lot AL44' }).innerText()).to.match(/month end/);
      // Screen readers hear each figure with its name: the visual header row is not read, the labels in each line are.
      expect(await page.getByRole('listitem').filter({ hasText: 'Lot AL2' }).locator('[data-col="vials"]').innerText()).to.match(/Vials\s*808/);
      await expectAccessible(page, 'lots list at 1280 px');

      // A phone opens the page afresh (the shell lays itself out for the width it starts at).
      await page.setViewportSize({ width: 390, height: 844 });
      await page.goto(`${suite.server.url}/lots`);
      await page.getByText('4 lots').waitFor();
      await settle(page);
      await page.locator('.lot-table').scrollIntoViewIfNeeded();
      await page.screenshot({ path: screenshotPath('lots-ux-phone') });
      await page.locator('.lot-table').screenshot({ path: screenshotPath('lots-ux-phone-list') });
      expect(await page.evaluate(() => document.documentElement.scrollWidth), 'no sideways scrolling on a phone').to.be.at.most(390);
      expect(await page.locator('.lot-head').isVisible(), 'the header row gives way to labels on a phone').to.equal(false);
      for (const column of ['vials', 'doses']) {
        const { values } = await columnBoxes(page, column);
        expect(values.every((v) => close(v.right, values[0]!.right)), `${column} line up across the lots on a phone: ${values.map((v) => v.right).join(', ')}`).to.equal(true);
      }
      const phoneExpiry = await columnBoxes(page, 'expiry');
      expect(phoneExpiry.values.every((v) => close(v.left, phoneExpiry.values[0]!.left)), 'expiry dates line up on a phone').to.equal(true);
      expect(await page.getByRole('listitem').filter({ hasText: 'Lot AL2' }).getByText('Vials', { exact: true }).isVisible()).to.equal(true);
      await expectAccessible(page, 'lots list at 390 px');
    } finally {
      await context.close();
    }
  });
});
