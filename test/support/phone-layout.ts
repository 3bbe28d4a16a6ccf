// Checks for pages on a 390×844 phone: nothing scrolls sideways, and the buttons a person needs lie on the screen.
import { expect } from 'chai';
import type { Locator, Page } from 'playwright-core';

/** A phone's browser context (axe is injected as a script, which the CSP would block; the CSP is tested on its own). */
export const phone = { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true, bypassCSP: true };

/** The page is no wider than the screen, and every button given lies wholly inside it, across and (scrolled to) down. */
export async function expectFitsPhone(page: Page, what: string, buttons: Locator, options: { pageToo?: boolean } = {}): Promise<void> {
  if (options.pageToo !== false) await expectNoSidewaysScroll(page, what);
  const innerWidth = await page.evaluate(() => window.innerWidth);
  const count = await buttons.count();
  expect(count, `${what}: the action buttons are there`).to.be.greaterThan(0);
  for (let i = 0; i < count; i++) {
    const button = buttons.nth(i);
    const name = (await button.getAttribute('aria-label')) ?? (await button.innerText());
    // Across first, before anything scrolls: scrolling it into view could move a sideways-scrolling table under it.
    const across = (await button.boundingBox())!;
    expect(across.x, `${what}: "${name}" starts off the left edge`).to.be.at.least(0);
    expect(across.x + across.width, `${what}: "${name}" ends at ${across.x + across.width} px on a 390 px screen`).to.be.at.most(innerWidth);
    await button.scrollIntoViewIfNeeded();
    const box = (await button.boundingBox())!;
    expect(box.y, `${what}: "${name}" above the screen`).to.be.at.least(0);
    expect(box.y + box.height, `${what}: "${name}" below the screen`).to.be.at.most(844);
    expect(box.x, `${what}: "${name}" moved sideways when scrolled to`).to.equal(across.x);
  }
}

/** The document, and the shell's content pane (the element that scrolls the page), are no wider than the screen. */
export async function expectNoSidewaysScroll(page: Page, what: string): Promise<void> {
  const { scrollWidth, innerWidth, paneScroll, paneWidth } = await page.evaluate(() => {
    const pane = document.querySelector('mat-sidenav-content')!;
    return { scrollWidth: document.documentElement.scrollWidth, innerWidth: window.innerWidth, paneScroll: pane.scrollWidth, paneWidth: pane.clientWidth };
  });
  expect(scrollWidth, `${what}: the page scrolls sideways`).to.be.at.most(innerWidth);
  expect(paneScroll, `${what}: the content pane scrolls sideways`).to.be.at.most(paneWidth);
}
