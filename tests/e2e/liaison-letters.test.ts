import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdirSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Database from 'better-sqlite3';
import { simpleParser } from 'mailparser';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseParcelsCsv } from '@/lib/parcels/parcels-csv';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { seriousAccessibilityViolations } from './support/accessibility';
import { freePort, startApp, type RunningApp } from './support/app-server';
import { addCountersignedRevision } from './support/countersigned-revision';
import { launchBrowser, signInAs } from './support/browser';

const CSV = path.resolve('db', 'seeds', 'parcels', 'harrowfield-parcels.csv');
const user = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
const sha256 = (b: Buffer | string) => createHash('sha256').update(b).digest('hex');

let app: RunningApp;
let browser: Browser;
let schemeId: string;

/** A screenshot to look at; no serious or critical accessibility violation; nothing wider than the window (wide tables scroll inside it). */
async function shot(page: Page, name: string) {
  await page.screenshot({ path: `tests/.artifacts/liaison-${name}.png`, fullPage: true });
  expect(await seriousAccessibilityViolations(page), name).toEqual([]);
  const overflow = await page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    return [...document.querySelectorAll('body *')].filter((e) => e.getBoundingClientRect().right > width + 1 && !e.closest('[role="region"]')).map((e) => `${e.tagName.toLowerCase()}.${e.className}`.slice(0, 80)).slice(0, 5);
  });
  expect(overflow, `${name}: wider than the window`).toEqual([]);
  expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth), `${name}: scrolls sideways`).toBeLessThanOrEqual(0);
}

beforeAll(async () => {
  process.env.SMTP_PORT = String(await freePort());
  delete process.env.SMTP_URL;
  app = await startApp();
  schemeId = addCountersignedRevision(app.databasePath);
  browser = await launchBrowser();
  mkdirSync('tests/.artifacts', { recursive: true });
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('the liaison officer informs every affected landowner', () => {
  let affected: string[] = [];

  it('uploads the demo parcels CSV, sees the impact table, makes the letters and sends them', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
    const page = await context.newPage();
    const liaison = user('liaison');
    await signInAs(page, app.baseUrl, liaison.email, liaison.password);
    await page.getByRole('link', { name: 'Landowners' }).click();
    await page.getByRole('link', { name: 'Harrowfield Mill weir renewal' }).click();
    await page.getByRole('link', { name: 'Upload CSV' }).click();

    await page.getByLabel('Parcels CSV file').setInputFiles(CSV);
    await page.getByText('All 9 parcels are valid.').waitFor();
    await shot(page, 'upload-preview');
    await page.getByRole('button', { name: 'Store as the register' }).click();
    await page.getByText('Stored as register version 1 with 9 parcels.').waitFor();
    for (const [tab, name] of [['Parcels register', 'register'], ['Letter template', 'template'], ['Overview', 'overview']] as const) {
      await page.getByRole('link', { name: tab, exact: true }).click();
      await page.waitForURL(new RegExp(`/liaison/${schemeId}${name === 'overview' ? '$' : `/${name}$`}`));
      await shot(page, name);
    }

    await page.getByRole('link', { name: 'Impact on parcels', exact: true }).click();
    await page.getByRole('table', { name: /Impact of the scheme on each parcel/ }).waitFor();
    const rows = page.locator('[data-testid^="impact-"]');
    expect(await rows.count()).toBe(9);
    for (let i = 0; i < 9; i++) {
      const row = rows.nth(i);
      if ((await row.getAttribute('data-category')) === 'affected') affected.push(((await row.getAttribute('data-testid')) ?? '').replace('impact-', ''));
    }
    expect(affected.length).toBeGreaterThan(3);
    expect(await page.locator('[data-category="affected"]').getByText('Affected', { exact: false }).count()).toBe(affected.length);
    expect(await page.getByRole('note').filter({ hasText: 'Caution.' }).count()).toBe(1);
    await shot(page, 'impact');

    await page.getByRole('link', { name: 'Letters', exact: true }).click();
    await page.getByRole('button', { name: 'Make letters' }).click();
    await page.getByText(`${affected.length} letters made, queued for sending below.`).waitFor();
    await page.getByRole('button', { name: `Send ${affected.length} letters` }).click();
    await page.getByRole('button', { name: `Yes, e-mail ${affected.length} letters` }).click();
    await page.getByTestId('batch-progress').filter({ hasText: `${affected.length} of ${affected.length} sent, 0 failed, 0 waiting.` }).waitFor({ timeout: 60_000 });
    await shot(page, 'letters-sent');
    await context.close();
  });

  it('the fake SMTP server received one message per affected parcel, each with that parcel’s PDF letter attached', async () => {
    const outbox = path.join(path.dirname(app.databasePath), 'outbox');
    const messages = await Promise.all(readdirSync(outbox).map(async (f) => simpleParser(readFileSync(path.join(outbox, f)))));
    const letters = messages.filter((m) => m.attachments.some((a) => a.contentType === 'application/pdf'));
    const parcels = parseParcelsCsv(readFileSync(CSV, 'utf8')).rows.map((r) => r.parcel!);
    expect(letters).toHaveLength(affected.length);
    const db = new Database(app.databasePath, { readonly: true });
    const stored = db.prepare('SELECT pdf_sha256 AS sha, recipient_email AS email, status FROM letters').all() as { sha: string; email: string; status: string }[];
    db.close();
    for (const reference of affected) {
      const parcel = parcels.find((p) => p.reference === reference)!;
      const received = letters.filter((m) => (Array.isArray(m.to) ? m.to : [m.to]).some((to) => to?.text.includes(parcel.email)));
      expect(received, reference).toHaveLength(1);
      const pdf = received[0].attachments.find((a) => a.contentType === 'application/pdf')!;
      expect(stored.find((s) => s.email === parcel.email)).toMatchObject({ sha: sha256(pdf.content), status: 'sent' });
      const file = path.join(tmpdir(), `sillmark-e2e-letter-${reference}.pdf`);
      writeFileSync(file, pdf.content);
      const text = execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
      expect(text).toContain(parcel.ownerName);
      expect(text).toContain(`Your land (${reference}`);
      expect(text).toMatch(/These figures are estimates/);
    }
  });

  it('shows the received letters to an admin in the outbox', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signInAs(page, app.baseUrl, user('admin').email, user('admin').password);
    await page.goto(`${app.baseUrl}/admin/outbox`);
    expect(await page.getByTestId('outbox-message').filter({ hasText: 'application/pdf' }).count()).toBe(affected.length);
    await shot(page, 'admin-outbox');
    await context.close();
  });

  it('a planning officer never sees owner details; the scheme’s designer reads them but cannot send', async () => {
    const planning = await (await browser.newContext()).newPage();
    await signInAs(planning, app.baseUrl, user('planning').email, user('planning').password);
    expect((await planning.goto(`${app.baseUrl}/liaison/${schemeId}/register`))?.status()).toBe(403);
    const api = await planning.request.get(`${app.baseUrl}/api/parcels/${schemeId}`);
    expect(api.status()).toBe(403);
    expect(await api.text()).not.toContain('Edith Lowther');

    const designer = await (await browser.newContext({ viewport: { width: 820, height: 1180 } })).newPage();
    await signInAs(designer, app.baseUrl, user('designer').email, user('designer').password);
    await designer.goto(`${app.baseUrl}/liaison/${schemeId}/register`);
    await designer.getByText('Edith Lowther').waitFor();
    await shot(designer, 'designer-register-tablet');
    await designer.goto(`${app.baseUrl}/liaison/${schemeId}/impact`);
    await shot(designer, 'designer-impact-tablet');
    await designer.goto(`${app.baseUrl}/liaison/${schemeId}/letters`);
    expect(await designer.getByRole('button', { name: /Send|Make letters/ }).count()).toBe(0);
    await shot(designer, 'designer-letters');
  });
});
