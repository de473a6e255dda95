import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeSequelize } from '@/lib/db';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { createTestScheme, demoCase } from '../integration/support/scheme-factory';
import { createTestUser } from '../integration/support/user-factory';
import { rawFieldPaths } from '../support/raw-field-paths';
import { accessibilityViolations } from './support/accessibility';
import { ARTIFACTS, useServedPortal } from './support/served-portal';
import { canvasInk } from './support/wizard-helpers';

type Person = Awaited<ReturnType<typeof createTestUser>>;

const portal = useServedPortal();
let checker: Person;
let revisionId: string;

beforeAll(async () => {
  process.env.DATABASE_PATH = portal.app.databasePath;
  const designer = await createTestUser('designer');
  checker = await createTestUser('checker');
  const inputs = demoCase('wendle-harrowfield-broad-crested.json', (c) => {
    c.sensitivity = { manningN: 20, discharge: 20, coefficient: 10 };
  });
  const { revision } = await createTestScheme(designer.user.id, inputs);
  revisionId = revision.id;
  await submitForCheck({ revisionId, checkerId: checker.user.id, designer: designer.sessionUser, baseUrl: portal.app.baseUrl });
});

afterAll(async () => {
  await closeSequelize();
});

async function signedInPage(person: Person): Promise<Page> {
  const context = await portal.browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  await page.goto(`${portal.app.baseUrl}/sign-in`);
  await page.getByLabel('E-mail address').fill(person.user.email);
  await page.getByLabel('Password').fill(person.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${portal.app.baseUrl}/home`);
  return page;
}

describe('the checker sees what the designer saw', () => {
  it('shows the stored long-section and cross-section, warnings, sensitivity and step table beside the re-run, every column and every input in words', async () => {
    const page = await signedInPage(checker);
    await page.goto(`${portal.app.baseUrl}/checks/${revisionId}`);
    await page.getByRole('heading', { name: 'Independent re-run' }).waitFor();
    const results = page.getByTestId('designer-results');
    await results.waitFor();

    const longSection = await canvasInk(page, '[data-testid="designer-results"] [data-testid="long-section-chart"]');
    expect(longSection.inked / longSection.total).toBeGreaterThan(0.02);
    // The structure's rating, worked out by the engine from the frozen inputs, with the events among its numbers.
    const rating = await canvasInk(page, '[data-testid="designer-results"] [data-testid="rating-chart"]');
    expect(rating.inked / rating.total).toBeGreaterThan(0.01);
    expect(await results.getByTestId('rating-numbers').locator('td', { hasText: /AEP/ }).count()).toBeGreaterThan(0);
    const canvases = results.locator('canvas');
    expect(await canvases.count()).toBeGreaterThanOrEqual(2);
    const crossSection = await canvases.nth(1).evaluate((canvas: HTMLCanvasElement) => {
      const data = canvas.getContext('2d')?.getImageData(0, 0, canvas.width, canvas.height).data ?? new Uint8ClampedArray();
      let inked = 0;
      for (let i = 3; i < data.length; i += 4) if (data[i] !== 0) inked++;
      return inked;
    });
    expect(crossSection).toBeGreaterThan(500);

    await results.getByRole('heading', { name: /^Warnings \(\d+\)$/ }).waitFor();
    await results.getByRole('heading', { name: 'Sensitivity' }).waitFor();
    expect(await results.locator('table').filter({ hasText: /Manning/ }).count()).toBeGreaterThan(0);
    await results.getByRole('heading', { name: /^Step table: / }).waitFor();
    const stepRows = results.locator('table', { has: page.locator('caption', { hasText: /^Step table of/ }) }).locator('tbody tr');
    expect(await stepRows.count()).toBeGreaterThan(3);

    // The stored results table is not squeezed into half the page: every column is on screen.
    const storedTable = page.locator('table', { has: page.locator('caption', { hasText: /^Stored at submission: each design event/ }) });
    const headings = storedTable.locator('thead th');
    expect(await headings.count()).toBe(8);
    for (let i = 0; i < 8; i++) {
      const box = (await headings.nth(i).boundingBox())!;
      expect(box.x + box.width, await headings.nth(i).innerText()).toBeLessThanOrEqual(1280);
    }

    const inputs = page.locator('section', { has: page.getByRole('heading', { name: 'Frozen inputs' }) });
    const inputText = await inputs.innerText();
    expect(inputText).toContain('proposed structure: crest length');
    expect(inputText).toMatch(/flood-level limit “[^”]+”: highest allowed level/);
    expect(rawFieldPaths(await page.locator('main').innerText())).toEqual([]);
    await page.screenshot({ path: path.join(ARTIFACTS, 'check-page-results.png'), fullPage: true });
    expect(await accessibilityViolations(page)).toEqual([]);

    // The revision record: its inputs and history in words too.
    await page.getByRole('link', { name: 'Revision record and history' }).click();
    await page.waitForURL(`${portal.app.baseUrl}/revisions/${revisionId}`);
    expect(rawFieldPaths(await page.locator('main').innerText())).toEqual([]);
  });
});
