import { mkdirSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { type RunningApp, startApp } from './app-server';
import { launchBrowser } from './browser';

export const ARTIFACTS = 'tests/.artifacts';

/**
 * For one test file: the built app served over a fresh database, and Debian Chromium, started before its tests and
 * stopped after them (after the file's own afterAll hooks). Read `app` and `browser` inside hooks and tests only.
 */
export function useServedPortal(): { readonly app: RunningApp; readonly browser: Browser } {
  let app: RunningApp | undefined;
  let browser: Browser | undefined;
  beforeAll(async () => {
    app = await startApp();
    browser = await launchBrowser();
    mkdirSync(ARTIFACTS, { recursive: true });
  });
  afterAll(async () => {
    await browser?.close();
    await app?.stop();
  });
  const started = <T>(value: T | undefined, what: string): T => {
    if (value === undefined) throw new Error(`${what} is not started yet: use it inside a hook or a test`);
    return value;
  };
  return {
    get app() {
      return started(app, 'the app');
    },
    get browser() {
      return started(browser, 'the browser');
    },
  };
}
