import { afterAll, beforeAll } from 'vitest';
import type { Browser } from 'playwright-core';
import { startTestApp, type TestApp } from './app-server';
import { launchBrowser } from './browser';

/** The app and the browser one test file drives; filled in before its first test runs. */
export interface AppAndBrowser {
  readonly app: TestApp;
  readonly browser: Browser;
}

/**
 * Starts the real app (own scratch database) and Debian's Chromium before the file's first test,
 * and closes both after its last. Call once at the top level of a browser test file.
 *
 * @param timeoutMs - how long starting or stopping may take
 * @example const e2e = appAndBrowserForThisFile(120_000); … newPage(e2e.browser, e2e.app.url)
 */
export function appAndBrowserForThisFile(timeoutMs: number): AppAndBrowser {
  const handles: { app?: TestApp; browser?: Browser } = {};
  beforeAll(async () => {
    handles.app = await startTestApp();
    handles.browser = await launchBrowser();
  }, timeoutMs);
  afterAll(async () => {
    await handles.browser?.close();
    await handles.app?.close();
  }, timeoutMs);
  return {
    get app() {
      if (!handles.app) throw new Error('the app is not started yet (use it inside a test)');
      return handles.app;
    },
    get browser() {
      if (!handles.browser) throw new Error('the browser is not started yet (use it inside a test)');
      return handles.browser;
    },
  };
}
