import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { startApp, type RunningApp } from './support/app-server';
import { launchBrowser } from './support/browser';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
let app: RunningApp;
let browser: Browser;

beforeAll(async () => {
  app = await startApp();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** Presses Tab until the control labelled `label` has the focus; fails if the keyboard cannot reach it. */
async function tabTo(page: Page, label: string): Promise<void> {
  const target = page.getByLabel(label, { exact: true });
  for (let presses = 0; presses < 60; presses++) {
    if (await target.evaluate((el) => el === document.activeElement).catch(() => false)) return;
    await page.keyboard.press('Tab');
  }
  throw new Error(`the keyboard never reached "${label}"`);
}

async function typeInto(page: Page, label: string, text: string): Promise<void> {
  await tabTo(page, label);
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
}

describe('the wizard by keyboard alone', () => {
  it('signs in, creates a scheme and enters its channel without a pointer', async () => {
    const page = await (await browser.newContext()).newPage();
    await page.goto(`${app.baseUrl}/sign-in`);
    await typeInto(page, 'E-mail address', designer.email);
    await typeInto(page, 'Password', designer.password);
    await page.keyboard.press('Enter');
    await page.waitForURL(`${app.baseUrl}/home`);

    await page.goto(`${app.baseUrl}/schemes/new`);
    await typeInto(page, 'Scheme name', 'Keyboard walk weir');
    await typeInto(page, 'Watercourse', 'River Wendle');
    await typeInto(page, 'Site', 'Harrowfield Mill tail race');
    await typeInto(page, 'Level datum', 'Wendle Valley local datum');
    await typeInto(page, 'Bed level at the structure (m)', '31.2');
    await typeInto(page, 'Reach length (m)', '6000');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/wizard\/channel$/);

    await tabTo(page, 'Cross-section shape');
    await page.keyboard.type('trap');
    expect(await page.getByLabel('Cross-section shape', { exact: true }).inputValue()).toBe('trapezoidal');
    await typeInto(page, 'Bottom width (m)', '10');
    await typeInto(page, 'Side slope (z horizontal : 1 vertical)', '2');
    await typeInto(page, "Manning's n (dimensionless)", '0.035');
    await typeInto(page, 'Bed slope (m/m)', '0.0006');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/wizard\/flows$/);
    // Focus is visible where the keyboard is: the focused control has an outline (Tailwind's focus-visible ring).
    await page.keyboard.press('Tab');
    const outline = await page.evaluate(() => getComputedStyle(document.activeElement as Element).outlineStyle);
    expect(outline).not.toBe('none');
  });
});
