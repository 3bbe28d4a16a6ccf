// Launches Debian's Chromium through playwright-core with flags that keep it off the network, and runs axe-core on pages.
import { expect } from 'chai';
import { chromium, type Browser, type Page } from 'playwright-core';
import { existsSync, mkdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { runtimeDir } from '../../database/scripts/runtime-dir.js';
import { testPassword } from './test-app.js';

export const chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

export async function launchBrowser(): Promise<Browser> {
  if (!existsSync(chromiumPath)) {
    throw new Error(`Chromium not found at ${chromiumPath}; install it with: apt-get install -y chromium`);
  }
  return chromium.launch({
    executablePath: chromiumPath,
    headless: true,
    args: [
      '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage',
      '--host-resolver-rules=MAP * ~NOTFOUND , EXCLUDE localhost , EXCLUDE 127.0.0.1',
    ],
  });
}

export function screenshotPath(name: string): string {
  const dir = runtimeDir('artifacts', 'screenshots');
  mkdirSync(dir, { recursive: true });
  return join(dir, `${name}.png`);
}

const axePath = createRequire(import.meta.url).resolve('axe-core/axe.min.js');

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

/** Runs axe-core's WCAG 2.2 AA rules on the page and returns the serious and critical violations. */
export async function seriousAccessibilityViolations(page: Page): Promise<AxeViolation[]> {
  // A colour measured mid-fade fails contrast: let running animations finish first.
  // An element shown a moment ago may start its fade on a later frame: wait a few frames, then for every animation.
  await page.evaluate(async () => {
    // No named functions in here: the test transpiler would wrap them in a helper the page does not have.
    for (let round = 0; round < 3; round++) {
      for (let frames = 0; frames < 2; frames++) await new Promise((resolve) => requestAnimationFrame(() => resolve(undefined)));
      await Promise.all(document.getAnimations().map((animation) => animation.finished.catch(() => undefined)));
    }
  });
  await page.addScriptTag({ path: axePath });
  const violations = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(context: Document, options: object): Promise<{ violations: unknown[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'] } });
    return result.violations;
  });
  return (violations as AxeViolation[]).filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

export function describeViolations(violations: AxeViolation[]): string {
  return violations.map((v) => `${v.impact} ${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(' ')).join('; ')}`).join('\n');
}

/** Signs in through the sign-in page as a person does, and waits for the home page's greeting. */
export async function signInOnPage(page: Page, baseUrl: string, email: string, password = testPassword): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { level: 1 }).filter({ hasText: /Good (morning|afternoon|evening)/ }).waitFor();
}

/** Fails with axe's findings when the page shows any serious or critical accessibility violation. */
export async function expectAccessible(page: Page, what: string): Promise<void> {
  const violations = await seriousAccessibilityViolations(page);
  expect(violations, `${what}:\n${describeViolations(violations)}`).to.have.length(0);
}
