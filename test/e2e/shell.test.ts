// In Chromium: sign in through the real page, see the shell, use the users page and the account page; axe on every page.
import { expect } from 'chai';
import type { BrowserContext, Page } from 'playwright-core';
import { screenshotPath, expectAccessible } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';
import { browserSuite } from '../support/browser-suite.js';

async function signInThroughPage(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

describe('the client shell in Chromium', () => {
  const suite = browserSuite();
  let context: BrowserContext;
  // axe-core is injected as a script, which the CSP would block; the CSP itself is tested on its own.
  beforeEach(async () => {
    await resetDatabase();
    context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 800 } });
  });
  afterEach(() => context.close());

  it('an admin signs in through the page, sees the shell with their name, and it is accessible', async () => {
    const site = await createSite('LKN');
    await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
    await createTestUser({ email: 'crew@test.example', roles: ['crew'], sites: [site] });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/`);
    await page.waitForURL(/\/sign-in/);
    await expectAccessible(page, 'sign-in page');

    await page.getByLabel('E-mail').fill('admin@test.example');
    await page.getByLabel('Password', { exact: true }).fill('wrong password entirely');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(await page.getByRole('alert').innerText()).to.match(/e-mail or password is not right/);

    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { level: 1 }).filter({ hasText: /Good (morning|afternoon|evening), Test/ }).waitFor();
    expect(await page.getByRole('navigation', { name: 'Main' }).innerText()).to.contain('Users');
    await page.getByText('Site LKN (LKN)').waitFor();
    await page.mouse.move(0, 0);
    await page.screenshot({ path: screenshotPath('shell-admin-home'), fullPage: true });
    await expectAccessible(page, 'admin home');
  });

  it('an admin creates a user in the dialog, sees a field error first, then the user in the table', async () => {
    await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
    const page = await context.newPage();
    await signInThroughPage(page, suite.server.url, 'admin@test.example');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Users' }).click();
    await page.getByRole('table', { name: 'Users' }).waitFor();
    await expectAccessible(page, 'users page');

    await page.getByRole('button', { name: 'New user' }).click();
    const dialog = page.getByRole('dialog');
    // Type only once the dialog has finished opening (focus moves into it at the end of its animation).
    await dialog.getByLabel('E-mail').waitFor();
    await page.waitForFunction(() => document.getAnimations().every((animation) => animation.playState !== 'running'));
    await dialog.getByLabel('E-mail').fill('new.crew@test.example');
    await dialog.getByLabel('Name').fill('Nadia Field');
    await dialog.getByRole('checkbox', { name: 'Vaccination crew' }).check();
    await dialog.getByLabel('Password').fill('too short');
    await dialog.getByRole('button', { name: 'Create user' }).click();
    // The error comes back from the server: wait for it rather than read the dialog at once.
    await dialog.locator('mat-error').first().waitFor();
    expect(await dialog.locator('mat-error').allInnerTexts()).to.deep.equal(['Use at least 15 characters (this one has 9).']);
    await expectAccessible(page, 'user dialog');
    await page.screenshot({ path: screenshotPath('users-dialog') });

    await dialog.getByLabel('Password').fill('meadow lantern quietly hums');
    await dialog.getByRole('button', { name: 'Create user' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByRole('cell', { name: 'new.crew@test.example' }).waitFor();
    await page.screenshot({ path: screenshotPath('users-table') });
  });

  it('a crew member on a phone-sized screen opens the drawer, reaches My account and switches to °C', async () => {
    await createTestUser({ email: 'crew@test.example', roles: ['crew'] });
    const phone = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
    const page = await phone.newPage();
    try {
      await page.goto(`${suite.server.url}/`);
      await page.getByLabel('E-mail').fill('crew@test.example');
      await page.getByLabel('Password', { exact: true }).fill(testPassword);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByRole('button', { name: 'Open navigation' }).click();
      const nav = page.getByRole('navigation', { name: 'Main' });
      expect(await nav.innerText()).to.not.contain('Users');
      await nav.getByRole('link', { name: 'My account' }).click();
      await page.getByRole('heading', { name: 'My account' }).waitFor();
      await page.getByRole('radio', { name: /°C/ }).or(page.getByRole('button', { name: /°C/ })).first().click();
      await page.getByText('Temperatures now show in °C.').waitFor();
      await expectAccessible(page, 'account page on a phone');
      await page.screenshot({ path: screenshotPath('account-phone'), fullPage: true });
    } finally {
      await phone.close();
    }
  });

  it('an unknown address inside the app shows the not-found page', async () => {
    await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
    const page = await context.newPage();
    await signInThroughPage(page, suite.server.url, 'admin@test.example');
    await page.goto(`${suite.server.url}/no/such/page`);
    await page.getByRole('heading', { name: 'Page not found' }).waitFor();
    await expectAccessible(page, 'not-found page');
  });
  it('signs in and reaches the users page with the keyboard alone', async () => {
    await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/sign-in`);
    await page.getByLabel('E-mail').waitFor();
    await page.keyboard.press('Tab');
    await page.keyboard.type('admin@test.example');
    await page.keyboard.press('Tab');
    await page.keyboard.type(testPassword);
    await page.keyboard.press('Enter');
    await page.getByRole('navigation', { name: 'Main' }).waitFor();
    // Tab from the top of the page until the Users link has focus, then follow it with Enter.
    for (let i = 0; i < 12; i++) {
      await page.keyboard.press('Tab');
      const focused = await page.evaluate(() => document.activeElement?.textContent?.trim() ?? '');
      if (focused.endsWith('Users') && focused.length < 20) break;
    }
    await page.keyboard.press('Enter');
    await page.getByRole('table', { name: 'Users' }).waitFor();
    expect(page.url()).to.match(/\/users$/);
  });
});
