import type { Locator, Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { useServedPortal } from './support/served-portal';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
const portal = useServedPortal();


/** Presses Tab until `target` has the focus; fails if the keyboard cannot reach it. */
async function tabToControl(page: Page, target: Locator, what: string): Promise<void> {
  const visited: string[] = [];
  for (let presses = 0; presses < 150; presses++) {
    if (await target.evaluate((el) => el === document.activeElement).catch(() => false)) return;
    await page.keyboard.press('Tab');
    visited.push(await page.evaluate(() => { const el = document.activeElement; return el ? `${el.tagName.toLowerCase()}${el.id ? `#${el.id}` : ''}${el.getAttribute('type') ? `[${el.getAttribute('type')}]` : ''}` : 'none'; }));
  }
  throw new Error(`the keyboard never reached ${what}; it went through ${[...new Set(visited)].join(' → ')}`);
}

const tabTo = (page: Page, label: string, within: Page | Locator = page) => tabToControl(page, within.getByLabel(label, { exact: true }), `"${label}"`);
const tabToButton = (page: Page, name: string | RegExp) => tabToControl(page, page.getByRole('button', { name }), `the button ${String(name)}`);

async function typeInto(page: Page, label: string, text: string, within: Page | Locator = page): Promise<void> {
  await tabTo(page, label, within);
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
}

/** The focused control draws a visible outline (Tailwind's focus-visible ring or the browser's own). */
const focusOutline = (page: Page) => page.evaluate(() => getComputedStyle(document.activeElement as Element).outlineStyle);

describe('the wizard by keyboard alone, from signing in to adopting the sized crest', () => {
  let page: Page;
  beforeAll(async () => {
    page = await (await portal.browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  });

  it('signs in, creates a scheme and enters its channel without a pointer', async () => {
    await page.goto(`${portal.app.baseUrl}/sign-in`, { waitUntil: 'networkidle' });
    await typeInto(page, 'E-mail address', designer.email);
    await typeInto(page, 'Password', designer.password);
    await page.keyboard.press('Enter');
    await page.waitForURL(`${portal.app.baseUrl}/home`);

    // Keys pressed before the page hydrates would go to a form without its handlers.
    await page.goto(`${portal.app.baseUrl}/schemes/new`, { waitUntil: 'networkidle' });
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
    await page.keyboard.press('Tab');
    expect(await focusOutline(page)).not.toBe('none');
  });

  it('enters two design flows, adding the second and choosing the governing one by keyboard', async () => {
    await typeInto(page, 'Name', '50% AEP');
    await typeInto(page, 'Discharge (m³/s)', '14');
    await typeInto(page, 'Annual exceedance probability (fraction)', '0.5');
    await tabToButton(page, '+ Add another event');
    await page.keyboard.press('Enter');
    const second = page.getByRole('group', { name: 'Event 2' });
    await second.waitFor();
    await typeInto(page, 'Name', '1% AEP', second);
    await typeInto(page, 'Discharge (m³/s)', '38', second);
    await typeInto(page, 'Annual exceedance probability (fraction)', '0.01', second);
    await typeInto(page, 'Climate-change allowance (%)', '20', second);
    // The governing choice is one radio group across the events: Tab stops once, at the chosen radio (at first "no
    // single governing event"), and the arrow keys choose another.
    await tabTo(page, 'No single governing event: check every event alike');
    await page.keyboard.press('ArrowUp');
    expect(await second.getByLabel('This is the governing event').isChecked()).toBe(true);
    await tabToButton(page, 'Save and continue');
    expect(await focusOutline(page)).not.toBe('none');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/wizard\/structure$/);
  });

  it('describes the structure, choosing from lists by typing, and sees the live head', async () => {
    await tabTo(page, 'Type of structure');
    await page.keyboard.type('broad');
    expect(await page.getByLabel('Type of structure', { exact: true }).inputValue()).toBe('broad-crested');
    await typeInto(page, 'Crest length (m)', '10');
    await typeInto(page, 'Sill height (m)', '1.6');
    await typeInto(page, 'Crest breadth (m)', '4');
    await tabTo(page, 'Upstream edge of the crest');
    await page.keyboard.type('round');
    expect(await page.getByLabel('Upstream edge of the crest', { exact: true }).inputValue()).toBe('round-nosed');
    await page.getByTestId('preview-head').first().waitFor();
    expect(await page.getByTestId('preview-head').first().textContent()).toMatch(/^\d+\.\d{3} m$/);
    await tabToButton(page, 'Save and continue');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/wizard\/reservoir$/);
    await tabToButton(page, 'Save and continue');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/wizard\/limits$/);
  });

  it('adds a flood-level limit, asks for crest sizing and reaches the results', async () => {
    await typeInto(page, 'Bank-top height above the bed (m)', '3.2');
    await tabToButton(page, '+ Add a limit');
    await page.keyboard.press('Enter');
    const limit = page.getByRole('group').filter({ has: page.getByLabel('Place', { exact: true }) }).last();
    await limit.waitFor();
    await typeInto(page, 'Place', 'Harrowfield Mill cottages', limit);
    await typeInto(page, 'Distance upstream (m)', '300', limit);
    await typeInto(page, 'Maximum level (m)', '35.6', limit);
    await typeInto(page, 'Freeboard (m)', '0.3', limit);
    await tabTo(page, 'Size the crest so that every limit passes in every event');
    await page.keyboard.press('Space');
    await typeInto(page, 'Step (m)', '0.05');
    await tabToButton(page, 'Save and see the results');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/results$/);
    expect(await page.getByTestId('verdict').textContent()).toMatch(/Pass|Fail/);
  });

  it('pages the step table, picks a cross-section and adopts the sized crest by keyboard', async () => {
    const caption = page.locator('caption').filter({ hasText: /^Step table of/ }).first();
    const firstRows = await caption.textContent();
    await tabToButton(page, 'Next rows →');
    await page.keyboard.press('Enter');
    await page.waitForFunction((before) => [...document.querySelectorAll('caption')].some((c) => c.textContent?.startsWith('Step table of') && c.textContent !== before), firstRows);
    expect(await caption.textContent()).toMatch(/rows 21–/);

    const pointPicker = page.getByLabel('Cross-section at', { exact: true });
    const before = await pointPicker.inputValue();
    await tabTo(page, 'Cross-section at');
    await page.keyboard.press('ArrowDown');
    expect(await pointPicker.inputValue()).not.toBe(before);

    await tabToButton(page, /^Adopt .* as the sill height$/);
    expect(await focusOutline(page)).not.toBe('none');
    await page.keyboard.press('Enter');
    await page.getByText('The draft already uses this sill height.').waitFor();
  });
});
