import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Revision, closeSequelize } from '@/lib/db';
import { createCertifiedScheme, createTestScheme, demoCase } from '../integration/support/scheme-factory';
import { createTestUser } from '../integration/support/user-factory';
import { accessibilityViolations } from './support/accessibility';
import { signInAs } from './support/browser';
import { ARTIFACTS, useServedPortal } from './support/served-portal';

// Issue 16: the designer's and checker's screens at practitioner grade.

type Person = Awaited<ReturnType<typeof createTestUser>>;

const portal = useServedPortal();
let people: { designer: Person; checker: Person; admin: Person };

beforeAll(async () => {
  process.env.DATABASE_PATH = portal.app.databasePath;
  people = { designer: await createTestUser('designer'), checker: await createTestUser('checker'), admin: await createTestUser('admin') };
});
afterAll(async () => {
  await closeSequelize();
});

async function signedIn(person: Person, viewport = { width: 1280, height: 900 }): Promise<Page> {
  const page = await (await portal.browser.newContext({ viewport, acceptDownloads: true })).newPage();
  await signInAs(page, portal.app.baseUrl, person.user.email, person.password);
  return page;
}

/** Document width against the viewport's: equal when nothing makes the page scroll sideways. */
const widths = (page: Page) => page.evaluate(() => ({ document: document.documentElement.scrollWidth, viewport: window.innerWidth }));

describe('the results sheet', () => {
  it('draws the limits at both levels and the structure, with the numbers as text, and submits for check from the sheet', async () => {
    const { scheme, revision } = await createTestScheme(people.designer.user.id);
    const page = await signedIn(people.designer);
    await page.goto(`${portal.app.baseUrl}/schemes/${scheme.id}/results`);
    const numbers = page.getByTestId('long-section-numbers');
    await numbers.waitFor({ state: 'attached' });
    await numbers.locator('summary').click();
    const rows = numbers.getByRole('row');
    // The demo case (our invented Wendle at Harrowfield): a 1.2 m sill on a bed at 31.2 m; two limits.
    expect(await rows.filter({ hasText: 'Structure: crest' }).textContent()).toMatch(/Structure: crest0\s*32\.400sill 1\.200 m above the bed at 31\.200/);
    for (const [place, distance, maximum, allowed] of [['Harrowfield Mill cottages, door threshold', '300.0', '35.600', '35.300'], ['Mill Lane bridge soffit', '850.0', '35.900', '35.300']]) {
      expect(await rows.filter({ hasText: `${place}: maximum level` }).filter({ hasNotText: 'freeboard' }).textContent()).toBe(`${place}: maximum level${distance}${maximum}`);
      expect(await rows.filter({ hasText: `${place}: maximum level less the freeboard` }).textContent()).toMatch(new RegExp(`^${place}: maximum level less the freeboard${distance}${allowed.replace('.', '\\.')}water \\d+\\.\\d{3}, (met|exceeded)$`));
    }
    expect(await numbers.locator('caption').textContent()).toMatch(/levels in m above the datum/);
    await page.getByLabel('Show the energy line (water level plus the velocity head)').check();

    // The rating of the structure, from the engine pool, with the events marked in its numbers.
    const rating = page.getByTestId('rating-numbers');
    await rating.waitFor({ state: 'attached' });
    await rating.locator('summary').click();
    expect(await rating.getByRole('row').filter({ hasText: '1% AEP' }).count()).toBe(1);
    expect(await rating.getByRole('row').filter({ hasText: '50% AEP' }).count()).toBe(1);
    await page.screenshot({ path: `${ARTIFACTS}/screens-results.png`, fullPage: true });
    expect(await accessibilityViolations(page)).toEqual([]);

    // The CSV starts with its header block.
    const csvHref = await page.getByRole('link', { name: 'Download the whole step table (CSV)' }).getAttribute('href');
    const csv = (await (await page.request.get(`${portal.app.baseUrl}${csvHref}`)).text()).split('\r\n');
    expect(csv.slice(0, 3)).toEqual(['Step table,the with-scheme profile point by point', `Scheme,${scheme.reference} ${scheme.name}`, 'Revision,1']);
    expect(csv).toContain('Level datum,not given');
    expect(csv.find((l) => l.startsWith('Event,Distance'))).toContain('Water level without the scheme (m above the datum),Afflux (m)');

    // The page's step table has the level without the scheme and the afflux beside the level with it, as the CSV does.
    const steps = page.locator('table', { has: page.locator('caption', { hasText: /^Step table of/ }) });
    const heads = await steps.locator('thead th').allInnerTexts();
    const at = (label: string) => heads.findIndex((h) => h.startsWith(label));
    expect(heads.slice(at('Water level with the scheme'), at('Water level with the scheme') + 3)).toEqual(['Water level with the scheme (m)', 'Water level without the scheme (m)', 'Afflux (m)']);
    const first = (await steps.locator('tbody tr').first().locator('td').allInnerTexts()).map(Number);
    const [withLevel, withoutLevel, rise] = [first[at('Water level with the scheme')], first[at('Water level without the scheme')], first[at('Afflux')]];
    expect(Math.abs(withLevel - withoutLevel - rise)).toBeLessThanOrEqual(0.0015);
    expect(rise).toBeGreaterThan(0);

    // Printed on A4 (about 794 px wide at 96 dpi): no navigation or form controls, nothing wider than the page.
    await page.emulateMedia({ media: 'print' });
    await page.setViewportSize({ width: 794, height: 1123 });
    expect(await page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Submit for check' }).isVisible()).toBe(false);
    expect(await widths(page)).toEqual({ document: 794, viewport: 794 });
    await page.screenshot({ path: `${ARTIFACTS}/screens-results-print.png`, fullPage: true });
    await page.emulateMedia({ media: 'screen' });
    await page.setViewportSize({ width: 1280, height: 900 });

    // Submitting from the sheet, with the checker chosen there.
    await page.getByLabel('Checker').selectOption(people.checker.user.id);
    await page.getByRole('button', { name: 'Submit for check' }).click();
    await page.waitForURL(`${portal.app.baseUrl}/revisions/${revision.id}`);
    await page.locator('dd', { hasText: /^[0-9a-f]{64}$/ }).first().waitFor();
    expect((await Revision.findByPk(revision.id))?.status).toBe('submitted');
    expect((await Revision.findByPk(revision.id))?.checkerId).toBe(people.checker.user.id);
    await page.context().close();
  });

  it('fits a 390 × 844 phone: the results sheet, the register and the audit trail scroll no page sideways', async () => {
    const { scheme } = await createCertifiedScheme({ designer: people.designer, checker: people.checker });
    const phone = { width: 390, height: 844 };
    const designer = await signedIn(people.designer, phone);
    await designer.goto(`${portal.app.baseUrl}/schemes/${scheme.id}/results`);
    await designer.getByTestId('long-section-chart').waitFor();
    expect(await widths(designer)).toEqual({ document: 390, viewport: 390 });
    // The verdict's margin and result are in view without scrolling sideways.
    const margin = designer.getByRole('columnheader', { name: 'Margin (m)' }).first();
    const box = await margin.boundingBox();
    expect(box!.x + box!.width).toBeLessThanOrEqual(390);
    const result = await designer.getByRole('columnheader', { name: 'Result' }).first().boundingBox();
    expect(result!.x + result!.width).toBeLessThanOrEqual(390);
    const clipped = await designer.getByRole('region', { name: /^Limits in / }).evaluateAll((regions) => regions.filter((r) => r.scrollWidth > r.clientWidth).length);
    expect(clipped).toBe(0);
    // The navigation is a menu.
    await designer.getByRole('button', { name: 'Menu' }).click();
    await designer.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Schemes' }).waitFor();
    await designer.screenshot({ path: `${ARTIFACTS}/screens-results-phone.png`, fullPage: true });
    expect(await accessibilityViolations(designer)).toEqual([]);

    const admin = await signedIn(people.admin, phone);
    for (const address of ['/certificates', '/admin/audit']) {
      await admin.goto(`${portal.app.baseUrl}${address}`);
      await admin.locator('main h1').waitFor();
      expect(await widths(admin), address).toEqual({ document: 390, viewport: 390 });
      await admin.screenshot({ path: `${ARTIFACTS}/screens-phone${address.replace(/\//g, '-')}.png`, fullPage: true });
      expect(await accessibilityViolations(admin), address).toEqual([]);
    }
    await designer.context().close();
    await admin.context().close();
  });
});

describe('the portal’s own icons', () => {
  it('serves the favicon, the app icons and the manifest to a browser that is not signed in', async () => {
    const stranger = await portal.browser.newContext();
    for (const [address, type] of [['/icon.svg', 'image/svg+xml'], ['/apple-icon.png', 'image/png'], ['/icons/icon-192.png', 'image/png'], ['/icons/icon-512.png', 'image/png'], ['/manifest.webmanifest', 'application/manifest+json']]) {
      const response = await stranger.request.get(`${portal.app.baseUrl}${address}`, { maxRedirects: 0 });
      expect(response.status(), address).toBe(200);
      expect(response.headers()['content-type'], address).toContain(type);
    }
    const page = await stranger.newPage();
    await page.goto(`${portal.app.baseUrl}/sign-in`);
    expect(await page.locator('link[rel="icon"]').first().getAttribute('href')).toMatch(/^\/icon\.svg/);
    await stranger.close();
  });
});

describe('the wizard', () => {
  it('opens the structure step with no error, the preview waiting for the fields in words, and focus on the heading after a page change', async () => {
    const { scheme } = await createTestScheme(people.designer.user.id, demoCase(undefined, (v) => delete v.control));
    const page = await signedIn(people.designer);
    await page.goto(`${portal.app.baseUrl}/schemes/${scheme.id}/wizard/structure`);
    const waiting = page.getByTestId('preview-waiting');
    await waiting.waitFor();
    expect(await waiting.textContent()).toBe('Worked out once you give the sill height and the crest length.');
    // Next's route announcer is an alert of its own, outside the page's main content.
    expect(await page.locator('main').getByRole('alert').count()).toBe(0);
    expect(await page.locator('[aria-invalid="true"]').count()).toBe(0);
    expect(await page.getByTestId('head-preview').textContent()).not.toMatch(/control\.|Not worked out yet|required/);
    expect(await accessibilityViolations(page)).toEqual([]);

    await page.getByRole('navigation', { name: 'Wizard steps' }).getByRole('link', { name: /Design flows/ }).click();
    await page.waitForURL(/\/wizard\/flows$/);
    await expect.poll(() => page.evaluate(() => document.activeElement?.tagName)).toBe('H1');
    await page.context().close();
  });
});
