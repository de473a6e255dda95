import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeSequelize } from '@/lib/db';
import { changeUserRole } from '@/lib/users/change-user-role';
import { createTestUser } from '../integration/support/user-factory';
import { seriousAccessibilityViolations } from './support/accessibility';
import { signInAs } from './support/browser';
import { ARTIFACTS, useServedPortal } from './support/served-portal';

type Person = Awaited<ReturnType<typeof createTestUser>>;

const portal = useServedPortal();
let admin: Person;
let rafe: Person;
const ROLE_CHANGE = 'changed Rafe Calloway’s role from landowner liaison to planning officer';
const FAILED = 'tried to sign in to Rafe Calloway’s account with a wrong password';

beforeAll(async () => {
  process.env.DATABASE_PATH = portal.app.databasePath;
  admin = await createTestUser('admin');
  await admin.user.update({ name: 'Ida Marchbank' });
  rafe = await createTestUser('liaison');
  await rafe.user.update({ name: 'Rafe Calloway' });
  await changeUserRole({ input: { userId: rafe.user.id, role: 'planning' }, admin: { ...admin.sessionUser, name: 'Ida Marchbank' } });
});
afterAll(async () => {
  await closeSequelize();
});

async function adminPage(width: number): Promise<Page> {
  const page = await (await portal.browser.newContext({ viewport: { width, height: 900 } })).newPage();
  await signInAs(page, portal.app.baseUrl, admin.user.email, admin.password);
  await page.goto(`${portal.app.baseUrl}/admin/audit`);
  return page;
}
const events = (page: Page) => page.getByRole('list', { name: 'Audit events, newest first' }).getByRole('listitem');

describe('an administrator investigates the audit trail', () => {
  it('reads events in plain words, filters them by person and kind, and is told when a filter is wrong', async () => {
    const stranger = await portal.browser.newPage();
    await stranger.goto(`${portal.app.baseUrl}/sign-in`);
    await stranger.getByLabel('E-mail address').fill(rafe.user.email);
    await stranger.getByLabel('Password').fill('not-his-password');
    await stranger.getByRole('button', { name: 'Sign in' }).click();
    await stranger.getByText('do not match an active account').waitFor();

    const page = await adminPage(1280);
    await page.getByText('The chain is intact.').waitFor();
    await events(page).filter({ hasText: ROLE_CHANGE }).waitFor();
    await events(page).filter({ hasText: FAILED }).filter({ hasText: 'Someone not signed in' }).waitFor();
    expect(await events(page).filter({ hasText: 'Ida Marchbank' }).filter({ hasText: /^.*signed in/ }).count()).toBeGreaterThan(0);
    expect(await page.locator('main').textContent()).not.toMatch(/user\.role-changed|user\.sign-in-failed/);

    const filters = page.getByRole('search', { name: 'Filter the audit trail' });
    await filters.getByLabel('Person (who did it, or whom it was about)').selectOption({ label: `Rafe Calloway (${rafe.user.email})` });
    await filters.getByLabel('What happened').selectOption({ label: 'Changed a role' });
    await filters.getByRole('button', { name: 'Filter' }).click();
    await page.waitForURL(/person=.*action=user\.role-changed/);
    await page.getByRole('status').filter({ hasText: 'Showing 1 event(s)' }).waitFor();
    expect(await events(page).allTextContents()).toEqual([expect.stringContaining(ROLE_CHANGE)]);
    await page.screenshot({ path: path.join(ARTIFACTS, 'audit-1-filtered.png'), fullPage: true });

    const csv = await page.getByRole('link', { name: 'Download every matching event as CSV' }).getAttribute('href');
    const download = await page.request.get(`${portal.app.baseUrl}${csv}`);
    expect(download.status()).toBe(200);
    expect(download.headers()['cache-control']).toMatch(/no-store/);
    const lines = (await download.text()).trim().split('\r\n');
    expect(lines).toHaveLength(2);
    expect(lines[1]).toContain(ROLE_CHANGE);

    await filters.getByLabel('Search names, e-mail addresses and details').fill('calloway');
    await filters.getByLabel('What happened').selectOption({ label: 'Failed sign-in' });
    await filters.getByRole('button', { name: 'Filter' }).click();
    await page.waitForURL(/q=calloway/);
    expect(await events(page).allTextContents()).toEqual([expect.stringContaining(FAILED)]);

    await page.goto(`${portal.app.baseUrl}/admin/audit?from=2026-02-30`);
    await page.getByRole('alert').filter({ hasText: 'The “from” date is not a day of the calendar.' }).waitFor();
    await page.getByText('The filters above need attention, so no events are shown.').waitFor();
    expect(await events(page).count()).toBe(0);
  });

  it('fits a 390 px wide screen, events stacked as cards, with no serious accessibility fault', async () => {
    const page = await adminPage(390);
    await events(page).first().waitFor();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    const box = await events(page).filter({ hasText: ROLE_CHANGE }).boundingBox();
    expect(box && box.width).toBeLessThanOrEqual(390);
    await page.screenshot({ path: path.join(ARTIFACTS, 'audit-2-narrow.png'), fullPage: true });
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
  });
});
