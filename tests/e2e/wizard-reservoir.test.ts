import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeSequelize } from '@/lib/db';
import { createTestScheme, demoCase } from '../integration/support/scheme-factory';
import { createTestUser } from '../integration/support/user-factory';
import { accessibilityViolations } from './support/accessibility';
import { ARTIFACTS, useServedPortal } from './support/served-portal';
import { canvasInk } from './support/wizard-helpers';

// Issue 17: a designer routes the floods of the Upper Pond spillway (the demo case, crest 55.0 m) through its reservoir,
// entering the storage and the 10% AEP inflow from CSV files as the seed holds them, reads the peak level and the chart,
// and the countersigned certificate carries the routing summary. The scheme starts with the reservoir taken out.

type Person = Awaited<ReturnType<typeof createTestUser>>;
type Seed = { reservoir: { storage: { rows: { level: number; area: number }[] } }; events: { hydrograph: { points?: { time: number; discharge: number }[] } }[] };

const portal = useServedPortal();
let people: { designer: Person; checker: Person };
let schemeId: string;
let revisionId: string;
const STORAGE = path.join(ARTIFACTS, 'harrowfield-reservoir-storage.csv');
const INFLOW = path.join(ARTIFACTS, 'harrowfield-inflow.csv');
const BAD_INFLOW = path.join(ARTIFACTS, 'harrowfield-inflow-bad.csv');

beforeAll(async () => {
  process.env.DATABASE_PATH = portal.app.databasePath;
  people = { designer: await createTestUser('designer'), checker: await createTestUser('checker') };
  const seed = demoCase('wendle-harrowfield-reservoir-spillway.json') as unknown as Seed;
  const steady = demoCase('wendle-harrowfield-reservoir-spillway.json', (value) => {
    delete value.reservoir;
    // Without the reservoir no event carries a hydrograph; the 10% AEP is checked steadily at its hydrograph's peak.
    value.events = (value.events as Record<string, unknown>[]).map(({ hydrograph: _h, ...e }, i) => (i === 0 ? { ...e, discharge: 30 } : e));
  });
  const created = await createTestScheme(people.designer.user.id, steady);
  schemeId = created.scheme.id;
  revisionId = created.revision.id;
  writeFileSync(STORAGE, ['level,area', ...seed.reservoir.storage.rows.map((row) => `${row.level},${row.area}`)].join('\n'));
  writeFileSync(INFLOW, ['time,discharge', ...seed.events[0].hydrograph.points!.map((p) => `${p.time},${p.discharge}`)].join('\n'));
  writeFileSync(BAD_INFLOW, ['time,discharge', '0,3', '2,nine', '1,14'].join('\n'));
});

afterAll(async () => {
  await closeSequelize();
});

async function signedInPage(person: Person): Promise<Page> {
  const context = await portal.browser.newContext({ acceptDownloads: true, viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await page.goto(`${portal.app.baseUrl}/sign-in`);
  await page.getByLabel('E-mail address').fill(person.user.email);
  await page.getByLabel('Password').fill(person.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${portal.app.baseUrl}/home`);
  return page;
}

describe('a designer routes the design floods through the reservoir', () => {
  it('uploads a hydrograph, sees the peak level and the chart, and the certificate summarises the routing', async () => {
    const designer = await signedInPage(people.designer);
    await designer.goto(`${portal.app.baseUrl}/schemes/${schemeId}/wizard/reservoir`);
    await designer.getByLabel('Route the design floods through a reservoir behind the structure').check();
    await designer.locator('#storage-level-area-csv').setInputFiles(STORAGE);
    await designer.getByText('harrowfield-reservoir-storage.csv: 8 rows put in the table').waitFor();

    await designer.getByLabel('Inflow hydrograph').first().selectOption('table');
    await designer.locator('#inflow-0-csv').setInputFiles(BAD_INFLOW);
    const errors = designer.getByTestId('inflow-0-csv-errors');
    await errors.waitFor();
    expect(await errors.textContent()).toMatch(/Line 3/);
    await designer.locator('#inflow-0-csv').setInputFiles(INFLOW);
    await designer.getByText('harrowfield-inflow.csv: 10 rows put in the table').waitFor();
    await designer.getByLabel('Inflow hydrograph').nth(1).selectOption('unit-shape');
    await designer.getByLabel('Time to peak (hours)').fill('3');
    expect(await accessibilityViolations(designer)).toEqual([]);
    await designer.screenshot({ path: path.join(ARTIFACTS, 'wizard-reservoir.png'), fullPage: true });
    await designer.getByRole('button', { name: 'Save and continue' }).click();
    await designer.waitForURL(/\/wizard\/limits$/);
    await designer.getByRole('button', { name: 'Save and see the results' }).click();
    await designer.waitForURL(/\/results/);

    const facts = (await designer.getByTestId('routing-facts').textContent()) ?? '';
    const peak = facts.match(/Peak reservoir level(\d+\.\d{3}) m above/);
    expect(Number(peak?.[1])).toBeGreaterThan(55);
    expect(facts).toMatch(/Peak outflow\d+\.\d{3} m³\/s/);
    const chart = await canvasInk(designer, '[data-testid="routing-chart"]');
    expect(chart.inked / chart.total).toBeGreaterThan(0.02);
    expect(chart.colours).toBeGreaterThan(3);
    expect(await accessibilityViolations(designer)).toEqual([]);
    await designer.screenshot({ path: path.join(ARTIFACTS, 'results-routing.png'), fullPage: true });
    await designer.locator('section[aria-labelledby="routing-heading"]').screenshot({ path: path.join(ARTIFACTS, 'results-routing-section.png') });
    const csvHref = await designer.getByRole('link', { name: 'Download the whole routing table (CSV)' }).getAttribute('href');
    const csv = await (await designer.request.get(`${portal.app.baseUrl}${csvHref}`)).text();
    expect(csv).toMatch(/^Sillmark routing table/);
    expect(csv).toContain('Time (h),Inflow (m³/s),Outflow (m³/s)');

    // Submit, countersign, and read the certificate's text.
    await designer.goto(`${portal.app.baseUrl}/revisions/${revisionId}`);
    await designer.getByLabel('Checker').selectOption(people.checker.user.id);
    await designer.getByRole('button', { name: 'Submit for check' }).click();
    await designer.locator('dd', { hasText: /^[0-9a-f]{64}$/ }).first().waitFor();
    const checker = await signedInPage(people.checker);
    await checker.goto(`${portal.app.baseUrl}/checks`);
    await checker.getByRole('link', { name: /— revision 1$/ }).first().click();
    await checker.getByRole('heading', { name: 'Independent re-run' }).waitFor();
    await checker.getByLabel(/I have checked this revision independently/).check();
    await checker.getByLabel('Your password').fill(people.checker.password);
    await checker.getByRole('button', { name: 'Countersign' }).click();
    await checker.waitForURL(`${portal.app.baseUrl}/revisions/${revisionId}`);
    const link = checker.locator('p', { hasText: 'Download the signed PDF' }).locator('a').first();
    const [download] = await Promise.all([checker.waitForEvent('download'), link.click()]);
    const saved = path.join(ARTIFACTS, 'routing-certificate.pdf');
    await download.saveAs(saved);
    const text = execFileSync('pdftotext', ['-layout', saved, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('Flood routed through the reservoir, 10% AEP');
    expect(text).toContain('10 points entered by the designer');
    expect(text).toContain('table of surface area by level, 8 rows from 50.000 to 60.000 m above');
    expect(text).toMatch(/Peak reservoir level \d+\.\d{3} m above .* at \d+\.\d{2} h/);
    expect(text).toContain(`${peak?.[1]} m above`);
    expect(text).toMatch(/Routing method [^.]*modified Puls/);
    expect(text).toContain('Inflow, outflow and reservoir level, 1% AEP with climate allowance');
  });
});
