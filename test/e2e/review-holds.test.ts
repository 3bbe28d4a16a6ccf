// In Chromium: a fridge file holds a lot automatically; storage staff fill in the troubleshooting record; the
// veterinarian sees the bell's count, opens the queue and the report, signs a decision, and the count changes.
import { expect } from 'chai';
import { HoldDecision, TroubleshootingRecord } from '../../database/models/index.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { resetDatabase } from '../support/test-database.js';
import { createSite, createTestUser, signInAs, testApp, testPassword } from '../support/test-app.js';
import { createFridge, createLogger } from '../support/fridge-fixtures.js';
import { browserSuite } from '../support/browser-suite.js';
import { holdsOf, lotIn, MIN, productWithRange, T0, uploadTemps } from '../api/holds/hold-test-setup.js';
import type { Page } from 'playwright-core';

async function signIn(page: Page, url: string, email: string): Promise<void> {
  await page.goto(`${url}/`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
}

async function expectAccessible(page: Page): Promise<void> {
  const violations = await seriousAccessibilityViolations(page);
  expect(violations, describeViolations(violations)).to.have.length(0);
}

describe('automatic holds, the troubleshooting record, the report and the bell in Chromium', () => {
  const suite = browserSuite();
  before(() => testApp());
  beforeEach(resetDatabase);

  it('storage records what happened; the veterinarian reads it, opens the report and signs; the bell follows', async () => {
    const site = await createSite('BEL');
    const fridge = await createFridge(site);
    const logger = await createLogger(fridge);
    const lot = await lotIn(fridge, await productWithRange(35, 45, 'F'), T0 - 60 * MIN, 8);
    await createTestUser({ email: 'store@test.example', roles: ['storage'] });
    await createTestUser({ email: 'vet@test.example', roles: ['veterinarian'] });
    const uploader = await signInAs(['storage']);
    await uploadTemps(uploader, logger.id, T0, [4, 4, 9, 9, 9, 4, 4]);
    const [hold] = await holdsOf(lot);

    const storageContext = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    const storage = await storageContext.newPage();
    await signIn(storage, suite.server.url, 'store@test.example');
    await storage.getByRole('link', { name: 'Notifications, 1 unread' }).waitFor();
    await storage.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review' }).click();
    await storage.getByRole('heading', { name: /^Fridge excursion · Fridge \d+: above the product range 35\.0 °F to 45\.0 °F$/ }).waitFor();
    // Degree-minutes in the reader's °F: a temperature difference, × 1.8 with no 32 added (NIST SP 811 §4.2.1.1).
    const queue = await (await storage.request.get(`${suite.server.url}/api/holds/queue`)).json();
    const degreeMinutesC = queue.items[0].exposureEvent.degreeMinutesC as number;
    expect(degreeMinutesC).to.be.above(0);
    const shown = (degreeMinutesC * 1.8).toLocaleString('en-US', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
    await storage.getByText(`${shown} °F·min`, { exact: true }).waitFor();
    await storage.getByRole('button', { name: 'Fill in the troubleshooting record' }).click();
    const dialog = storage.getByRole('dialog');
    await dialog.getByLabel('Found by').waitFor();
    await storage.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
    await dialog.getByLabel('Found (date and time)').fill('2026-03-01T03:10');
    await dialog.getByLabel('Found by').fill('R. Alvarez');
    await dialog.getByLabel('Unit temperature when found').fill('48');
    await dialog.getByLabel('Room temperature').fill('72');
    await dialog.getByLabel('What happened').fill('Door left ajar after the morning delivery.');
    await dialog.getByLabel('Who was contacted').fill('Flock veterinarian by phone');
    await expectAccessible(storage);
    await storage.screenshot({ path: screenshotPath('review-troubleshooting-dialog') });
    await dialog.getByRole('button', { name: 'Save record' }).click();
    await dialog.waitFor({ state: 'detached', timeout: 10_000 }).catch(async (error) => {
      await storage.screenshot({ path: screenshotPath('review-troubleshooting-failed') });
      throw new Error(`${(error as Error).message}\n${await dialog.innerText()}`);
    });
    await storage.getByText('Door left ajar after the morning delivery.').waitFor();
    expect((await TroubleshootingRecord.findOne())!.foundBy).to.equal('R. Alvarez');
    await expectAccessible(storage);
    await storage.screenshot({ path: screenshotPath('review-storage-event'), fullPage: true });
    await storageContext.close();

    const vetContext = await suite.browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
    const vet = await vetContext.newPage();
    await signIn(vet, suite.server.url, 'vet@test.example');
    await vet.getByRole('link', { name: 'Notifications, 1 unread' }).waitFor();
    await vet.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review' }).click();
    await vet.getByText('Door left ajar after the morning delivery.').waitFor();
    expect(await vet.getByRole('button', { name: /troubleshooting record/ }).count(), 'the veterinarian reads, storage writes').to.equal(0);
    const href = await vet.getByRole('link', { name: 'Excursion report (PDF)' }).getAttribute('href');
    const report = await vet.request.get(`${suite.server.url}${href}`);
    expect(report.status()).to.equal(200);
    expect(report.headers()['content-type']).to.match(/application\/pdf/);
    await expectAccessible(vet);
    await vet.screenshot({ path: screenshotPath('review-vet-event'), fullPage: true });

    await vet.getByRole('button', { name: `Decide lot ${lot.lotNumber}` }).click();
    const decide = vet.getByRole('dialog');
    await decide.getByLabel('Your password, to sign').waitFor();
    await vet.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
    await decide.getByRole('radio', { name: 'Release', exact: true }).click();
    await decide.getByLabel('Your password, to sign').fill(testPassword);
    await decide.getByRole('button', { name: 'Sign decision' }).click();
    await decide.waitFor({ state: 'detached' });
    await vet.getByText('No hold is waiting for a decision.').waitFor();
    expect(await HoldDecision.count({ where: { holdId: hold.id } })).to.equal(1);

    await vet.getByRole('link', { name: 'Notifications, 2 unread' }).click();
    await vet.getByRole('heading', { name: `Lot ${lot.lotNumber}: release` }).waitFor();
    await expectAccessible(vet);
    await vet.screenshot({ path: screenshotPath('notifications-page'), fullPage: true });
    await vet.getByRole('button', { name: 'Mark all read' }).click();
    await vet.getByRole('link', { name: 'Notifications, none unread' }).waitFor();

    // A recall: an unknown number is refused beside its field, the right one (any letter case) holds the lot.
    await vet.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Review' }).click();
    await vet.getByRole('button', { name: 'Place a recall' }).click();
    const recall = vet.getByRole('dialog');
    await recall.getByLabel('Lot number').waitFor();
    await vet.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));
    await recall.getByLabel('Lot number').fill('NO-SUCH-LOT');
    await recall.getByLabel('Reason').fill('Manufacturer notice of low potency');
    await recall.getByRole('button', { name: 'Recall' }).click();
    await recall.getByText('No lot with this number.').waitFor();
    await expectAccessible(vet);
    await vet.screenshot({ path: screenshotPath('review-recall-dialog') });
    await recall.getByLabel('Lot number').fill(lot.lotNumber.toLowerCase());
    await recall.getByRole('button', { name: 'Recall' }).click();
    await recall.waitFor({ state: 'detached' });
    await vet.getByRole('heading', { name: `Recall of lot ${lot.lotNumber.toLowerCase()}` }).waitFor();
    await vet.getByRole('link', { name: 'Notifications, 1 unread' }).waitFor();
    await vetContext.close();
  });
});
