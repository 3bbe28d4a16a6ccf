// Keyboard alone, in Chromium: a veterinarian reaches the review, opens a held lot and signs a release.
import { expect } from 'chai';
import type { Page } from 'playwright-core';
import { Hold, HoldDecision } from '../../database/models/index.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';
import { createPresentation, createProduct, createSiteFridge, stockLot } from '../support/flock-fixtures.js';
import { browserSuite } from '../support/browser-suite.js';

/** Presses Tab until the focused element's text matches (icon ligatures such as "fact_check" are part of it), so the walk never clicks. */
async function tabTo(page: Page, pattern: RegExp, limit = 40): Promise<void> {
  const seen: string[] = [];
  for (let i = 0; i < limit; i++) {
    await page.keyboard.press('Tab');
    const label = await page.evaluate(() => {
      const el = document.activeElement as HTMLInputElement | null;
      const labelText = el?.labels?.[0]?.textContent ?? '';
      const text = el?.textContent ?? '';
      return `${el?.getAttribute('aria-label') ?? ''} ${text} ${labelText} ${el?.getAttribute('formcontrolname') ?? ''}`.replace(/\s+/g, ' ').trim();
    });
    if (pattern.test(label)) return;
    seen.push(label);
  }
  throw new Error(`no focusable element matching ${pattern} within ${limit} tabs; focus went through: ${seen.join(' | ')}`);
}

describe('the review by keyboard in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('signs a release without the mouse', async () => {
    const site = await createSite('KEY');
    const lot = await stockLot(await createSiteFridge(site), await createPresentation(await createProduct(), 1000), 2, '2030-06-30', { lotNumber: 'KB1001' });
    const hold = await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'shipment', sourceId: 1, reason: 'warm box', openedBy: null });
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });
    const context = await suite.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/sign-in`);
    await page.getByLabel('E-mail').waitFor();
    await page.keyboard.press('Tab');
    await page.keyboard.type('vet@test.example');
    await page.keyboard.press('Tab');
    await page.keyboard.type(testPassword);
    await page.keyboard.press('Enter');
    await page.getByRole('navigation', { name: 'Main' }).waitFor();
    await tabTo(page, /^[a-z_]*Review$/);
    await page.keyboard.press('Enter');
    await page.getByRole('button', { name: 'Decide lot KB1001' }).waitFor();
    await tabTo(page, /Decide lot KB1001/);
    await page.keyboard.press('Enter');
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Your password, to sign').waitFor();
    await page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
    // The radio group takes focus as one stop; Space picks the focused option (Release is first).
    await tabTo(page, /^Release$/);
    await page.keyboard.press('Space');
    await tabTo(page, /\bpassword$/, 8);
    await page.keyboard.type(testPassword);
    await page.keyboard.press('Enter');
    await dialog.waitFor({ state: 'detached' });
    const decision = await HoldDecision.findOne({ where: { holdId: hold.id } });
    expect(decision?.decision).to.equal('release');
    await context.close();
  });
});
