// In Chromium: errors only the server can find (a limit the form does not check, a name already taken) show beside their fields.
import { expect } from 'chai';
import type { Locator, Page } from 'playwright-core';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createCatalogue } from '../support/receiving-fixtures.js';
import { createTestUser, testPassword } from '../support/test-app.js';

async function signIn(page: Page, url: string, email: string): Promise<void> {
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

/** The form field (label, input and its error) around the input labelled `label`. */
function fieldOf(dialog: Locator, label: string): Locator {
  return dialog.locator('mat-form-field').filter({ has: dialog.page().getByLabel(label, { exact: true }) });
}

describe('server field errors beside their fields, in Chromium', () => {
  const suite = browserSuite();

  it('the product dialog shows a withdrawal over the limit and a name already taken beside those fields', async () => {
    await createCatalogue({ name: 'Brightfield ND spray' });
    await createTestUser({ email: 'buyer@test.example', roles: ['purchasing'] });
    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signIn(page, suite.server.url, 'buyer@test.example');
    await page.goto(`${suite.server.url}/catalogue`);
    // The pack's figures as the rest of the app shows them: thousands separated, the price in money and per vial (the
    // stored unit price is per vial: stock values and order amounts are vials × it), the pack's price beside it.
    const packs = page.getByRole('table', { name: 'Packs of Brightfield ND spray' });
    await packs.waitFor();
    expect(await packs.getByRole('columnheader').allInnerTexts()).to.include.members(['Price per vial', 'Price per pack']);
    const cells = await packs.getByRole('row').nth(1).getByRole('cell').allInnerTexts();
    expect([cells[0], cells[1], cells[4], cells[5]]).to.deep.equal(['1,000', '10', '$42.50', '$425.00']);
    await page.screenshot({ path: screenshotPath('catalogue-packs') });
    await page.getByRole('button', { name: 'New product' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Name', { exact: true }).fill('Brightfield ND spray');
    await dialog.getByRole('combobox', { name: 'Kind' }).click();
    await page.getByRole('option').first().click();
    await dialog.getByRole('combobox', { name: 'Route' }).click();
    await page.getByRole('option').first().click();
    // The form checks only that the days are not negative; the server's limit is 365.
    await dialog.getByLabel('Slaughter withdrawal (days)').fill('400');
    await dialog.getByRole('button', { name: 'Save' }).click();

    const withdrawal = fieldOf(dialog, 'Slaughter withdrawal (days)');
    await withdrawal.locator('mat-error').filter({ hasText: 'At most 365 days.' }).waitFor();
    expect(await dialog.getByLabel('Slaughter withdrawal (days)').getAttribute('aria-invalid')).to.equal('true');
    const errorId = await withdrawal.locator('mat-error').getAttribute('id');
    expect(await dialog.getByLabel('Slaughter withdrawal (days)').getAttribute('aria-describedby'), 'the error is read with the field').to.contain(errorId!);
    expect(await fieldOf(dialog, 'Name').locator('mat-error').count(), 'no error on the name yet').to.equal(0);
    await page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
    await page.screenshot({ path: screenshotPath('server-error-withdrawal') });
    const violations = await seriousAccessibilityViolations(page);
    expect(violations, describeViolations(violations)).to.have.length(0);

    await dialog.getByLabel('Slaughter withdrawal (days)').fill('21');
    await dialog.getByRole('button', { name: 'Save' }).click();
    await fieldOf(dialog, 'Name').locator('mat-error').filter({ hasText: 'Already in the catalogue.' }).waitFor();
    expect(await withdrawal.locator('mat-error').count(), 'the fixed field has no error left').to.equal(0);
    expect(await dialog.isVisible(), 'the dialog stays open to correct the name').to.equal(true);
    await page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
    await page.screenshot({ path: screenshotPath('server-error-name-taken') });
    await context.close();
  });
});
