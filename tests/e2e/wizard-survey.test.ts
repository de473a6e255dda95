import { existsSync, readdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { signInAs } from './support/browser';
import { canvasInk, fillByLabel } from './support/wizard-helpers';
import { useServedPortal } from './support/served-portal';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!;
const DEMO_SURVEY = path.resolve('db/seeds/surveys/wendle-harrowfield-survey.csv');
const BAD_SURVEY = path.resolve('tests/.artifacts/bad-survey.csv');
const portal = useServedPortal();

beforeAll(async () => {
  writeFileSync(BAD_SURVEY, ['distance_upstream,station,elevation,bank,manning_n', '0,0,34.6,,0.05', '0,10,thirty,,', '0,20,34.6,,', '400,0,34.9,,0.05', '400,20,34.9,,', '200,0,34.8,,0.05'].join('\n'));
});

const save = (page: Page, name = 'Save and continue') => page.getByRole('button', { name }).click();

describe('a designer builds a scheme on surveyed cross-sections from a CSV file', () => {
  it('is told every bad line first, previews the good survey, and reaches a verdict on the long-section', async () => {
    const context = await portal.browser.newContext({ viewport: { width: 1024, height: 900 } });
    const page = await context.newPage();
    await signInAs(page, portal.app.baseUrl, designer.email, designer.password);
    await page.goto(`${portal.app.baseUrl}/schemes/new`);
    await fillByLabel(page, 'Scheme name', 'Harrowfield Mill weir on the surveyed reach');
    await fillByLabel(page, 'Watercourse', 'River Wendle');
    await fillByLabel(page, 'Site', 'Harrowfield Mill');
    await fillByLabel(page, 'Level datum', 'Wendle Valley local datum');
    await save(page, 'Create the scheme and continue');
    await page.waitForURL(/\/wizard\/channel$/);

    await page.getByLabel('Surveyed cross-sections from a CSV file').check();
    await page.getByLabel('Survey CSV file').setInputFiles(BAD_SURVEY);
    const errors = page.getByTestId('survey-errors');
    await errors.waitFor();
    expect(await errors.textContent()).toContain('Line 3: elevation "thirty" is not a number');
    await page.screenshot({ path: 'tests/.artifacts/wizard-survey-errors.png', fullPage: true });

    await page.getByLabel('Survey CSV file').setInputFiles(DEMO_SURVEY);
    await page.getByText('6 cross-sections, 66 points, no problems found').waitFor();
    expect(await page.getByRole('table', { name: 'Cross-sections found in the file' }).locator('tbody tr').count()).toBe(6);
    const plot = await canvasInk(page, 'canvas');
    expect(plot.inked).toBeGreaterThan(500);
    await page.screenshot({ path: 'tests/.artifacts/wizard-survey-preview.png', fullPage: true });
    await page.getByRole('button', { name: 'Use this survey and continue' }).click();
    await page.waitForURL(/\/wizard\/flows$/);

    await fillByLabel(page, 'Name', '1% AEP');
    await fillByLabel(page, 'Discharge (m³/s)', '30');
    await fillByLabel(page, 'Annual exceedance probability (fraction)', '0.01');
    await save(page);
    await page.waitForURL(/\/wizard\/structure$/);

    await fillByLabel(page, 'Crest length (m)', '11');
    await fillByLabel(page, 'Sill height (m)', '1.6');
    await fillByLabel(page, 'Crest breadth (m)', '3.5');
    await page.getByTestId('preview-head').first().waitFor();
    await save(page);
    await page.waitForURL(/\/wizard\/reservoir$/);
    await save(page);
    await page.waitForURL(/\/wizard\/limits$/);

    expect(await page.getByRole('table').locator('tbody tr').count()).toBe(6);
    await page.getByLabel('Bank-top level at 900 m').fill('34.3');
    await page.getByRole('button', { name: '+ Add a limit' }).click();
    await page.getByLabel('Place').fill('Wendle Meadows footpath');
    await page.getByLabel('Distance upstream (m)').fill('2200');
    await page.getByLabel('Maximum level (m)').fill('35.6');
    await save(page, 'Save and see the results');
    await page.waitForURL(/\/results$/);

    expect(await page.getByTestId('verdict').textContent()).toMatch(/Pass|Fail/);
    const extent = (await page.getByTestId('event-facts').textContent())?.match(/Extent of impact(?:beyond )?(\d+) m upstream/);
    expect(Number(extent?.[1])).toBeGreaterThan(0);
    const chart = await canvasInk(page, '[data-testid="long-section-chart"]');
    expect(chart.inked / chart.total).toBeGreaterThan(0.02);
    expect(chart.colours).toBeGreaterThan(4);
    await page.getByLabel('Cross-section at').selectOption({ index: 3 });
    await page.screenshot({ path: 'tests/.artifacts/wizard-survey-results.png', fullPage: true });
    await context.close();
  });

  it('starts a scheme in US customary units from a case file and reads the results in ft and ft³/s', async () => {
    const context = await portal.browser.newContext({ viewport: { width: 820, height: 1100 } });
    const page = await context.newPage();
    await signInAs(page, portal.app.baseUrl, designer.email, designer.password);
    await page.goto(`${portal.app.baseUrl}/schemes`);
    await page.getByLabel('Start a scheme from a case file').setInputFiles(path.resolve('db/seeds/cases/wendle-harrowfield-us-customary.json'));
    await page.waitForURL(/\/results$/);
    const facts = (await page.getByTestId('event-facts').textContent()) ?? '';
    expect(facts).toMatch(/ft³\/s/);
    expect(facts).toMatch(/\d+\.\d{3} ft/);
    const chart = await canvasInk(page, '[data-testid="long-section-chart"]');
    expect(chart.inked / chart.total).toBeGreaterThan(0.02);
    await page.screenshot({ path: 'tests/.artifacts/wizard-us-results-tablet.png', fullPage: true });
    await page.getByRole('link', { name: /Structure/ }).click();
    await expect.poll(() => page.getByLabel('Crest length (ft)').inputValue()).not.toBe('');
    await context.close();
  });

  it('shows the demo scheme’s draft to its checker read-only: results, but no wizard and no adopting', async () => {
    const checker = DEMO_USERS.find((u) => u.role === 'checker')!;
    const context = await portal.browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    await signInAs(page, portal.app.baseUrl, checker.email, checker.password);
    await page.goto(`${portal.app.baseUrl}/schemes`);
    await page.getByRole('link', { name: 'Harrowfield Mill weir renewal' }).click();
    await page.getByRole('link', { name: /^Results sheet of revision 1/ }).click();
    await page.getByTestId('verdict').waitFor();
    expect(await page.getByRole('navigation', { name: 'Wizard steps' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /^Adopt/ }).count()).toBe(0);
    expect(await page.getByRole('link', { name: '+ New scheme' }).count()).toBe(0);
    const response = await page.goto(`${page.url().replace(/\/results.*$/, '')}/wizard/structure`);
    expect(response?.status()).toBe(403);
    await context.close();
  });

  it('refuses a 50 MB survey through the whole server stack, storing nothing', async () => {
    const context = await portal.browser.newContext();
    const page = await context.newPage();
    await signInAs(page, portal.app.baseUrl, designer.email, designer.password);
    const created = await page.request.post(`${portal.app.baseUrl}/api/schemes`, { data: { name: 'Upload limit check', watercourse: 'River Wendle', site: 'Harrowfield Mill', datum: 'local datum', units: 'SI' } });
    expect(created.status()).toBe(201);
    const { revisionId } = await created.json();
    const uploads = path.join(path.dirname(portal.app.databasePath), 'uploads');
    const stored = () => (existsSync(uploads) ? readdirSync(uploads).sort() : []);
    const filesBefore = stored();
    const before = await (await page.request.get(`${portal.app.baseUrl}/api/revisions/${revisionId}`)).json();
    const huge = Buffer.alloc(50 * 1024 * 1024, '0,1,2,,0.03\n');
    const refused = await page.request.post(`${portal.app.baseUrl}/api/uploads/survey?revision=${revisionId}`, { data: huge, headers: { 'content-type': 'text/csv' } });
    expect(refused.status()).toBe(413);
    expect((await refused.json()).error).toMatch(/The file is 50\.0 MB; a survey CSV may be at most 2\.0 MB\. Nothing was stored\./);
    const after = await (await page.request.get(`${portal.app.baseUrl}/api/revisions/${revisionId}`)).json();
    expect(after.inputs).toEqual(before.inputs);
    expect(stored()).toEqual(filesBefore);
    await context.close();
  });
});

