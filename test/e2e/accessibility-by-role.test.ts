// axe-core on every page each role reaches from the navigation (read from the shell's own nav list, so new pages are covered
// as they are added), with a company's data present and each page's first "New …"/"Add …" dialog open: 0 serious or critical.
import { expect } from 'chai';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Browser, Page } from 'playwright-core';
import { roles, type Role } from '../../shared/auth/roles.js';
import { projectRoot } from '../../database/scripts/runtime-dir.js';
import { siteLocalDate } from '../../shared/receiving/site-local-date.js';
import { describeViolations, screenshotPath, seriousAccessibilityViolations } from '../support/browser.js';
import { browserSuite } from '../support/browser-suite.js';
import { createFlock, createHouse, createProgramme, createVaccination, siteDay } from '../support/flock-fixtures.js';
import { createFridge as createLoggedFridge, createLogger, uploadLog } from '../support/fridge-fixtures.js';
import { createCatalogue, createPurchaseOrder, lineInput, makeJpeg, postShipment, shipmentInput } from '../support/receiving-fixtures.js';
import { clearPhotoFiles } from '../support/receiving-state.js';
import { createSite, createTestUser, signInAs, testPassword } from '../support/test-app.js';
import type { Product } from '../../database/models/index.js';

interface NavItemLike {
  label: string;
  link: string;
  roles?: Role[];
}

/** The client's nav list, loaded as it is (its imports are type-only), so the pages to visit follow the product. */
async function navItems(): Promise<NavItemLike[]> {
  const file = pathToFileURL(join(projectRoot, 'client/src/app/shell/nav-items.ts')).href;
  return ((await import(file)) as { navItems: NavItemLike[] }).navItems;
}

const settled = (page: Page) => page.waitForFunction(() => document.getAnimations().every((a) => a.playState !== 'running'));

async function loaded(page: Page): Promise<void> {
  await page.getByRole('heading', { level: 1 }).first().waitFor();
  // Lists and charts load after the heading; wait for their progress indicators to go (or give up after 5 s and check anyway).
  await page.waitForFunction(() => !document.querySelector('[role="progressbar"]'), undefined, { timeout: 5_000 }).catch(() => undefined);
  await settled(page);
}

/** A company's worth of records on one site: readings with an excursion, an order due, a lot on hold, a flock with vaccinations. */
async function scene() {
  clearPhotoFiles();
  const site = await createSite('AXE');
  const fridge = await createLoggedFridge(site, { code: 'AXE-F1' });
  const logger = await createLogger(fridge);
  const storage = await signInAs(['storage'], [site]);
  const start = Date.now() - 2 * 86_400_000;
  const rows = Array.from({ length: 200 }, (_, i) => `${new Date(start + i * 10 * 60_000).toISOString()},${i >= 100 && i < 104 ? 9.5 : 4 + (i % 4) * 0.3}`);
  await uploadLog(storage, logger.id, `Time,Temperature (°C)\n${rows.join('\n')}\n`).expect(201);
  const catalogue = await createCatalogue({ name: 'Axe test spray' });
  await createPurchaseOrder(site, catalogue, { expectedDate: siteLocalDate(new Date(), site.timeZone) });
  const clerk = await signInAs(['receiving'], [site]);
  const warm = shipmentInput([lineInput({ presentationId: catalogue.presentation.id, fridgeId: fridge.id })], { reading: { value: 52, unit: 'F', place: 'probe' }, outcome: 'accepted_with_discrepancies' });
  const received = await postShipment(clerk, site.id, warm, [{ content: await makeJpeg(320, 240), name: 'box.jpg' }]);
  expect(received.status, JSON.stringify(received.body)).to.equal(201);
  const product = catalogue.product as Product;
  const programme = await createProgramme([{ product, ageValue: 14 }, { product, ageValue: 6, ageUnit: 'weeks' }]);
  const flock = await createFlock(await createHouse(site, 'House 1'), { name: 'Layers 24A', programmeId: programme.id });
  await createVaccination(flock, product, siteDay(site, 0), 'confirmed');
  await createVaccination(flock, product, siteDay(site, 3));
  for (const role of roles) await createTestUser({ email: `${role}@axe.example`, roles: [role], sites: [site] });
}

async function signIn(browser: Browser, url: string, role: Role): Promise<Page> {
  // axe-core is injected as a script, which the CSP would block; the CSP is tested on its own.
  const context = await browser.newContext({ bypassCSP: true, viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(`${role}@axe.example`);
  await page.getByLabel('Password', { exact: true }).fill(testPassword);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
  return page;
}

describe('accessibility of every page, per role, in Chromium', function () {
  this.timeout(180_000);
  const suite = browserSuite();
  let items: NavItemLike[];
  let dialogsOpened = 0;

  before(async () => {
    items = await navItems();
    await scene();
  });

  it('reads the navigation list of the shell', () => {
    expect(items.length).to.be.greaterThan(8);
    expect(items.map((item) => item.link)).to.include.members(['/', '/receiving', '/fridges', '/review']);
  });

  for (const role of roles) {
    it(`${role}: every page in the navigation and its first New/Add dialog have no serious or critical violation`, async () => {
      const page = await signIn(suite.browser, suite.server.url, role);
      const mine = items.filter((item) => !item.roles || item.roles.includes(role));
      const shown = await page.getByRole('navigation', { name: 'Main' }).getByRole('link').count();
      expect(shown, 'the shell shows the role its nav items').to.equal(mine.length);
      const problems: string[] = [];
      for (const item of mine) {
        await page.goto(`${suite.server.url}${item.link}`);
        await loaded(page);
        const name = `axe-${role}-${item.link.replace(/\W+/g, '-').replace(/^-|-$/g, '') || 'home'}`;
        await page.screenshot({ path: screenshotPath(name) });
        const violations = await seriousAccessibilityViolations(page);
        if (violations.length) problems.push(`${item.label} (${item.link}):\n${describeViolations(violations)}`);
        const opener = page.getByRole('main').getByRole('button', { name: /^(\w+ )?(New|Add) / }).first();
        if (await opener.count()) {
          await opener.click();
          const dialog = page.getByRole('dialog');
          if (await dialog.waitFor({ timeout: 3_000 }).then(() => true, () => false)) {
            dialogsOpened++;
            await settled(page);
            await page.screenshot({ path: screenshotPath(`${name}-dialog`) });
            const inDialog = await seriousAccessibilityViolations(page);
            if (inDialog.length) problems.push(`${item.label}, dialog of "${await opener.innerText()}":\n${describeViolations(inDialog)}`);
            await page.keyboard.press('Escape');
            await dialog.waitFor({ state: 'detached' });
          }
        }
      }
      expect(problems, problems.join('\n\n')).to.deep.equal([]);
      await page.context().close();
    });
  }

  it('opened dialogs along the way', () => {
    expect(dialogsOpened, 'New/Add dialogs checked').to.be.at.least(4);
  });
});
