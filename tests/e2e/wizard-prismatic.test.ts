import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { signInAs } from './support/browser';
import { accessibilityViolations } from './support/accessibility';
import { canvasInk, fillByLabel, previewNumbers } from './support/wizard-helpers';
import { useServedPortal } from './support/served-portal';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
const SCHEME = 'Wendle Meadows footbridge weir';
const portal = useServedPortal();


async function signedInPage(): Promise<Page> {
  const context = await portal.browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await signInAs(page, portal.app.baseUrl, designer.email, designer.password);
  return page;
}

const save = (page: Page, name = 'Save and continue') => page.getByRole('button', { name }).click();

describe('a designer creates a prismatic scheme with the wizard, leaves, comes back and sizes the crest', () => {
  let schemeUrl = '';

  it('enters the scheme, the channel and the design flows, then leaves', async () => {
    const page = await signedInPage();
    await page.goto(`${portal.app.baseUrl}/schemes`);
    await page.getByRole('link', { name: '+ New scheme' }).click();
    await page.waitForURL(/\/schemes\/new$/);
    await fillByLabel(page, 'Scheme name', SCHEME);
    await fillByLabel(page, 'Watercourse', 'River Wendle');
    await fillByLabel(page, 'Site', 'Wendle Meadows, below the footbridge');
    await fillByLabel(page, 'Level datum', 'Wendle Valley local datum');
    await fillByLabel(page, 'Bed level at the structure (m)', '31.2');
    await fillByLabel(page, 'Reach length (m)', 'six km');
    await save(page, 'Create the scheme and continue');
    expect(await page.getByRole('alert').filter({ hasText: 'The reach length must be a number (m)' }).count()).toBe(1);
    await fillByLabel(page, 'Reach length (m)', '6000');
    await save(page, 'Create the scheme and continue');
    await page.waitForURL(/\/wizard\/channel$/);
    schemeUrl = page.url().replace(/\/wizard\/channel$/, '');

    await page.getByLabel('Cross-section shape').selectOption('trapezoidal');
    await fillByLabel(page, 'Bottom width (m)', '10');
    await fillByLabel(page, 'Side slope (z horizontal : 1 vertical)', '2');
    await page.getByLabel('Or start from a typical value').selectOption({ label: 'Natural stream, as above with more stones and weeds: n = 0.035' });
    expect(await page.getByLabel("Manning's n (dimensionless)").inputValue()).toBe('0.035');
    await fillByLabel(page, 'Bed slope (m/m)', '0.0006');
    const section = await canvasInk(page, 'canvas');
    expect(section.inked).toBeGreaterThan(500);
    await page.screenshot({ path: 'tests/.artifacts/wizard-prismatic-channel.png', fullPage: true });
    await save(page);
    await page.waitForURL(/\/wizard\/flows$/);

    await fillByLabel(page, 'Name', '50% AEP');
    await fillByLabel(page, 'Discharge (m³/s)', '14');
    await fillByLabel(page, 'Annual exceedance probability (fraction)', '0.5');
    await page.getByRole('button', { name: '+ Add another event' }).click();
    const second = page.getByRole('group', { name: 'Event 2' });
    await second.getByLabel('Name', { exact: true }).fill('1% AEP');
    await second.getByLabel('Discharge (m³/s)').fill('38');
    await second.getByLabel('Annual exceedance probability (fraction)').fill('0.01');
    await second.getByLabel('Climate-change allowance (%)').fill('20');
    await second.getByLabel('This is the governing event').check();
    await save(page);
    await page.waitForURL(/\/wizard\/structure$/);
    await page.context().close();
  });

  it('resumes the draft in a new session, with every saved value restored', async () => {
    const page = await signedInPage();
    await page.goto(`${portal.app.baseUrl}/schemes`);
    await page.getByRole('link', { name: SCHEME }).click();
    await page.getByRole('link', { name: /Continue draft revision 1: Structure/ }).click();
    await page.waitForURL(/\/wizard\/structure$/);
    await page.getByRole('link', { name: /Design flows/ }).click();
    await page.waitForURL(/\/wizard\/flows$/);
    const second = page.getByRole('group', { name: 'Event 2' });
    expect(await second.getByLabel('Discharge (m³/s)').inputValue()).toBe('38');
    expect(await second.getByLabel('This is the governing event').isChecked()).toBe(true);
    await page.getByRole('link', { name: /Channel/ }).click();
    expect(await page.getByLabel('Bottom width (m)').inputValue()).toBe('10');
    await page.context().close();
  });

  it('sees the head and control depth update while typing, sets the limits, and adopts the sized crest', async () => {
    const page = await signedInPage();
    await page.goto(`${schemeUrl}/wizard/structure`);
    await page.getByLabel('Type of structure').selectOption('broad-crested');
    await fillByLabel(page, 'Crest length (m)', '10');
    await fillByLabel(page, 'Sill height (m)', '1.2');
    await fillByLabel(page, 'Crest breadth (m)', '4');
    await page.getByLabel('Upstream edge of the crest').selectOption('round-nosed');
    const first = await previewNumbers(page);
    expect(first.head).toMatch(/^\d+\.\d{3} m$/);
    await fillByLabel(page, 'Sill height (m)', '1.6');
    await page.waitForFunction((before) => document.querySelector('[data-testid="preview-control-depth"]')?.textContent !== before, first.depth);
    const second = await previewNumbers(page);
    expect(parseFloat(second.depth)).toBeGreaterThan(parseFloat(first.depth));
    await page.screenshot({ path: 'tests/.artifacts/wizard-prismatic-structure.png', fullPage: true });
    expect(await accessibilityViolations(page)).toEqual([]);
    await save(page);
    // No reservoir: the reservoir step is saved as it opens, with the floods checked at their steady discharges.
    await page.waitForURL(/\/wizard\/reservoir$/);
    await save(page);
    await page.waitForURL(/\/wizard\/limits$/);

    await fillByLabel(page, 'Bank-top height above the bed (m)', '3.2');
    for (const [place, distance, level, freeboard] of [['Harrowfield Mill cottages', '300', '35.6', '0.3'], ['Mill Lane bridge soffit', '850', '35.9', '0.6']]) {
      await page.getByRole('button', { name: '+ Add a limit' }).click();
      const limit = page.getByRole('group').last();
      await limit.getByLabel('Place').fill(place);
      await limit.getByLabel('Distance upstream (m)').fill(distance);
      await limit.getByLabel('Maximum level (m)').fill(level);
      await limit.getByLabel('Freeboard (m)').fill(freeboard);
    }
    await page.getByLabel('Size the crest so that every limit passes in every event').check();
    await fillByLabel(page, 'Step (m)', '0.05');
    await page.getByLabel(/Show how the levels at the limits change/).check();
    await save(page, 'Save and see the results');
    await page.waitForURL(/\/results$/);

    expect(await page.getByTestId('verdict').textContent()).toMatch(/Pass|Fail/);
    expect(await page.getByRole('note').filter({ hasText: 'never replace, the judgement of a licensed engineer' }).count()).toBeGreaterThan(0);
    expect(await page.getByTestId('event-facts').textContent()).toMatch(/Extent of impact\d+ m upstream/);
    const chart = await canvasInk(page, '[data-testid="long-section-chart"]');
    expect(chart.inked / chart.total).toBeGreaterThan(0.02);
    expect(chart.colours).toBeGreaterThan(4);
    await page.screenshot({ path: 'tests/.artifacts/wizard-prismatic-results.png', fullPage: true });
    expect(await accessibilityViolations(page)).toEqual([]);

    const adopt = page.getByRole('button', { name: /^Adopt .* as the sill height$/ });
    const sized = (await adopt.textContent())!.match(/Adopt ([\d.]+) m/)![1];
    await adopt.click();
    await page.getByText('The draft already uses this sill height.').waitFor();
    await page.goto(`${schemeUrl}/wizard/structure`);
    // The form fills its fields when it hydrates, which on a busy machine comes after the load event.
    await expect.poll(async () => Number(await page.getByLabel('Sill height (m)').inputValue())).toBeCloseTo(Number(sized), 6);
    await page.goto(schemeUrl);
    await page.getByText(/^What changed/).click();
    expect(await page.getByRole('table', { name: 'History of revision 1' }).textContent()).toMatch(/Adopted the sized crest: proposed structure: sill height above the bed 1\.6 → [\d.]+/);
    await page.screenshot({ path: 'tests/.artifacts/wizard-prismatic-history.png', fullPage: true });
    await page.context().close();
  });
});
