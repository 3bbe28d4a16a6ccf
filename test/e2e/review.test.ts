// In Chromium: a veterinarian opens the review queue, reads the held lot, and signs a decision with their password.
import { expect } from 'chai';
import { HoldDecision, Hold } from '../../database/models/index.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, testPassword } from '../support/test-app.js';
import { createPresentation, createProduct, createSiteFridge, stockLot } from '../support/flock-fixtures.js';
import { browserSuite } from '../support/browser-suite.js';

describe('the veterinarian\'s review in Chromium', () => {
  const suite = browserSuite();
  beforeEach(resetDatabase);

  it('opens the queue, sees the held lot, refuses a wrong password, then signs a release with condition', async () => {
    const site = await createSite('REV');
    const lot = await stockLot(await createSiteFridge(site), await createPresentation(await createProduct({ name: 'Spray vaccine R' }), 20_000), 3, '2030-06-30', { lotNumber: 'RV2201' });
    const hold = await Hold.create({ lotId: lot.id, cause: 'arrival', sourceKind: 'shipment', sourceId: 1, reason: 'arrived at 52 °F', openedBy: null });
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });

    const context = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await page.goto(`${suite.server.url}/`);
    await page.getByLabel('E-mail').fill('vet@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Waiting for your decision' }).waitFor();
    await page.getByText('1 held lot from 1 event, 3 vials in all.').waitFor();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review' }).click();
    await page.getByRole('heading', { name: 'Arrived outside its range' }).waitFor();
    expect(await page.getByRole('cell', { name: 'RV2201', exact: true }).count()).to.equal(1);
    expect(await page.locator('mat-card-subtitle').innerText()).to.match(/3 vials, 60,000 doses at risk/);
    let violations = await seriousAccessibilityViolations(page);
    expect(violations, describeViolations(violations)).to.have.length(0);

    await page.getByRole('button', { name: 'Decide lot RV2201' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Your password, to sign').waitFor();
    await page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
    // click, not check: under load the radio's state can trail the click, and the condition field below waits for it.
    await dialog.getByRole('radio', { name: 'Release with condition' }).click();
    await dialog.getByRole('textbox', { name: 'Condition' }).fill('Use first, before 2026-12-20');
    await dialog.getByLabel('Your password, to sign').fill('not my password');
    await dialog.getByRole('button', { name: 'Sign decision' }).click();
    await dialog.getByRole('alert').filter({ hasText: 'The password is not right, so the decision was not signed.' }).waitFor();
    violations = await seriousAccessibilityViolations(page);
    expect(violations, describeViolations(violations)).to.have.length(0);
    await page.screenshot({ path: screenshotPath('review-decision-dialog') });

    await dialog.getByLabel('Your password, to sign').fill(testPassword);
    await dialog.getByRole('button', { name: 'Sign decision' }).click();
    await dialog.waitFor({ state: 'detached' });
    await page.getByText('No hold is waiting for a decision.').waitFor();
    const decision = await HoldDecision.findOne({ where: { holdId: hold.id } });
    expect(decision).to.include({ decision: 'release_with_condition', condition: 'Use first, before 2026-12-20' });
    await page.screenshot({ path: screenshotPath('review-queue-empty') });
    await context.close();
  });
});
