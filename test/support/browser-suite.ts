// One lifecycle for every browser suite: the app on a free port and one Chromium, started before and closed after.
import type { Browser } from 'playwright-core';
import { startServer, type RunningServer } from '../../api/server.js';
import { launchBrowser } from './browser.js';
import { resetDatabase } from './test-database.js';
import { testConfig } from './test-app.js';

export interface BrowserSuite {
  server: RunningServer;
  browser: Browser;
}

/** Registers the suite's before/after hooks; the returned object is filled once `before` has run. */
export function browserSuite(): BrowserSuite {
  const suite = {} as BrowserSuite;
  before(async function () {
    this.timeout(90_000);
    await resetDatabase();
    suite.server = await startServer(testConfig({ VIALYARD_PORT: '0' }));
    suite.browser = await launchBrowser();
  });
  after(async () => {
    await suite.browser?.close();
    await suite.server?.close();
  });
  return suite;
}
