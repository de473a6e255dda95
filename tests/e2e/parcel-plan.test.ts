import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { seriousAccessibilityViolations } from './support/accessibility';
import { signInAs } from './support/browser';
import { ARTIFACTS, useServedPortal } from './support/served-portal';

// The liaison officer's plan of the parcels and the register's search and restore, in Chromium over the demo scenario.

const CSV = path.resolve('db', 'seeds', 'parcels', 'harrowfield-parcels.csv');
const PLAN = path.resolve('db', 'seeds', 'parcels', 'harrowfield-plan.geojson');
const portal = useServedPortal();
const liaison = DEMO_USERS.find((u) => u.role === 'liaison')!;

async function shot(page: Page, name: string) {
  await page.screenshot({ path: `${ARTIFACTS}/parcel-plan-${name}.png`, fullPage: true });
  expect(await seriousAccessibilityViolations(page), name).toEqual([]);
}

async function openScheme(page: Page) {
  await signInAs(page, portal.app.baseUrl, liaison.email, liaison.password);
  await page.getByRole('link', { name: 'Landowners' }).click();
  await page.getByRole('link', { name: 'Harrowfield Mill weir renewal' }).click();
}

describe('the plan of the parcels', () => {
  it('uploads the outlines, refuses a bad file by feature, and shows the plan with its categories beside a list of the same parcels', async () => {
    const context = await portal.browser.newContext({ viewport: { width: 1400, height: 1000 } });
    const page = await context.newPage();
    await openScheme(page);
    await page.getByRole('link', { name: 'Upload CSV' }).click();
    await page.getByLabel('Parcels CSV file').setInputFiles(CSV);
    await page.getByRole('button', { name: 'Store as the register' }).click();
    await page.getByText('Stored as register version 1 with 9 parcels.').waitFor();

    await page.getByRole('link', { name: 'Plan of the parcels', exact: true }).click();
    const bad = JSON.parse(readFileSync(PLAN, 'utf8'));
    bad.features[2].properties.parcel_reference = 'HM-99';
    const badFile = path.join(ARTIFACTS, 'plan-with-unknown-parcel.geojson');
    writeFileSync(badFile, JSON.stringify(bad));
    await page.getByLabel('Plan file (GeoJSON or CSV of vertices)').setInputFiles(badFile);
    await page.getByLabel('Coordinate system of the file').fill('Harrowfield site grid (invented, metres)');
    await page.getByRole('button', { name: 'Upload the plan' }).click();
    await page.getByRole('alert').filter({ hasText: 'Feature 3, parcel reference: HM-99 is not a parcel of the register' }).waitFor();

    await page.getByLabel('Plan file (GeoJSON or CSV of vertices)').setInputFiles(PLAN);
    await page.getByRole('button', { name: 'Upload the plan' }).click();
    await page.getByText('Stored as plan version 2 with 9 outlines.').waitFor();
    await page.getByText(/Plan version 2 from harrowfield-plan\.geojson/).waitFor();

    const plan = page.getByRole('group', { name: /Plan of the parcels, 9 outlines/ });
    const shapes = plan.getByRole('button');
    expect(await shapes.count()).toBe(9);
    const list = page.getByRole('table', { name: 'Parcels on the plan' });
    const rows = list.locator('[data-testid^="plan-parcel-"]');
    expect(await rows.count()).toBe(9);
    const categories = new Set<string>();
    for (let i = 0; i < 9; i++) {
      const shape = shapes.nth(i);
      const category = (await shape.getAttribute('data-category'))!;
      categories.add(category);
      const reference = (await shape.getAttribute('aria-label'))!.split(':')[0];
      expect(await list.getByTestId(`plan-parcel-${reference}`).getAttribute('data-category')).toBe(category);
    }
    expect(categories.has('affected')).toBe(true);
    expect(categories.has('not-computed')).toBe(false);
    await page.getByRole('heading', { name: 'Key' }).waitFor();
    expect(await page.getByText('Affected', { exact: true }).count()).toBeGreaterThan(0);

    await plan.getByRole('button', { name: /^HM-02:/ }).click();
    const chosen = page.getByRole('region', { name: 'The chosen parcel' });
    await chosen.getByText('Edith Lowther').waitFor();
    expect(await chosen.getByText(/ ha$/).count()).toBe(1);
    await list.getByRole('button', { name: 'HM-05' }).press('Enter');
    await chosen.getByText('Harrowfield Allotment Society').waitFor();
    expect(await page.getByRole('note').filter({ hasText: 'Caution.' }).count()).toBe(1);
    await shot(page, 'plan');
    await context.close();
  });
});

describe('the register', () => {
  it('is searched, filtered and sorted, and an earlier version is restored as a new one', async () => {
    const context = await portal.browser.newContext({ viewport: { width: 1400, height: 1000 } });
    const page = await context.newPage();
    await openScheme(page);
    await page.getByRole('link', { name: 'Parcels register', exact: true }).click();

    await page.getByRole('searchbox', { name: 'Search' }).fill('kestle');
    await page.getByRole('button', { name: 'Show' }).click();
    await page.getByText('Showing 1 of 9 parcels.').waitFor();
    expect(await page.getByRole('table', { name: 'Parcels register' }).getByRole('rowheader').allTextContents()).toEqual(['HM-04']);

    await page.getByRole('searchbox', { name: 'Search' }).fill('');
    await page.getByLabel('Bank', { exact: true }).selectOption('left');
    await page.getByLabel('Order by').selectOption('owner');
    await page.getByRole('button', { name: 'Show' }).click();
    await page.getByText('Showing 3 of 9 parcels.').waitFor();
    // Left bank: HM-02 Edith Lowther, HM-05 Harrowfield Allotment Society, HM-07 Osric Penrose, by owner's name.
    expect(await page.getByRole('table', { name: 'Parcels register' }).getByRole('rowheader').allTextContents()).toEqual(['HM-02', 'HM-05', 'HM-07']);
    await shot(page, 'register-filtered');

    await page.getByRole('link', { name: 'Clear', exact: true }).click();
    await page.getByLabel('Owner or occupier, row 4').fill('Ruth Kestle');
    await page.getByLabel('What changed (kept in the history)').fill('HM-04 sold to Ruth Kestle');
    await page.getByRole('button', { name: 'Save as a new version' }).click();
    await page.getByText('Saved as version 2: 0 added, 0 removed, 1 changed.').waitFor();

    await page.getByRole('link', { name: 'History of the register' }).click();
    await page.getByTestId('register-version-2').getByText('HM-04: owner or occupier').waitFor();
    await page.getByTestId('register-version-1').getByRole('button', { name: 'Restore v1' }).click();
    await page.getByRole('button', { name: 'Save v1 as a new version' }).click();
    await page.getByTestId('register-version-3').getByText('Restored from version 1').waitFor();
    await page.getByTestId('register-version-3').getByText('HM-04: owner or occupier').waitFor();
    await shot(page, 'register-history');

    await page.getByRole('link', { name: 'v3' }).click();
    await page.getByRole('heading', { name: /Version 3 \(current\)/ }).waitFor();
    expect(await page.getByLabel('Owner or occupier, row 4').inputValue()).toBe('Barnaby and Ruth Kestle');
    await context.close();
  });
});
