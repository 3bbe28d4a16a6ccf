// With the CSP enforced (no bypass), the built client runs without a single policy violation, and its HTML has no inline script.
import { expect } from 'chai';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { resetDatabase } from '../support/test-database.js';
import { createTestUser, testPassword } from '../support/test-app.js';
import { browserSuite } from '../support/browser-suite.js';

describe('Content-Security-Policy in Chromium', () => {
  const suite = browserSuite();

  it('the built index.html has no inline script', () => {
    const html = readFileSync(join(suite.server.context.config.CLIENT_DIST_DIR, 'index.html'), 'utf8');
    const inline = [...html.matchAll(/<script(?![^>]*\bsrc=)[^>]*>/g)];
    expect(inline, 'inline <script> tags').to.have.length(0);
    expect(html).to.not.match(/\son[a-z]+=/i);
  });

  beforeEach(resetDatabase);

  it('signing in and opening every admin page reports no CSP violation', async () => {
    await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
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
    await page.getByLabel('E-mail').fill('admin@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    const nav = page.getByRole('navigation', { name: 'Main' });
    await nav.waitFor();
    for (const link of await nav.getByRole('link').all()) {
      await link.click();
      await page.waitForLoadState('networkidle');
    }
    expect(violations).to.deep.equal([]);
    await context.close();
  });
  it('stored text with markup in it shows as text, and no script from it runs', async () => {
    const hostile = '<img src=x onerror="window.__vyInjected=1"><script>window.__vyInjected=2</script>';
    await createTestUser({ email: 'admin@test.example', roles: ['admin'] });
    const victim = await createTestUser({ email: 'odd@test.example', roles: ['crew'] });
    await victim.update({ name: hostile });
    const context = await suite.browser.newContext();
    const page = await context.newPage();
    let dialogs = 0;
    page.on('dialog', (dialog) => {
      dialogs++;
      void dialog.dismiss();
    });
    await page.goto(`${suite.server.url}/`);
    await page.getByLabel('E-mail').fill('admin@test.example');
    await page.getByLabel('Password', { exact: true }).fill(testPassword);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Users' }).click();
    await page.getByRole('cell', { name: 'odd@test.example' }).waitFor();
    expect(await page.getByRole('cell', { name: hostile, exact: true }).count()).to.equal(1);
    expect(await page.evaluate(() => (window as unknown as { __vyInjected?: number }).__vyInjected)).to.equal(undefined);
    expect(await page.locator('table img').count()).to.equal(0);
    expect(dialogs).to.equal(0);
    await context.close();
  });
});
