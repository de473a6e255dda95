import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_USERS } from '../../db/seeds/demo-users';
import { seriousAccessibilityViolations } from './support/accessibility';
import { freePort, startApp, type RunningApp } from './support/app-server';
import { launchBrowser, signInAs } from './support/browser';
import { addCountersignedRevision, makeLetterOverdue } from './support/countersigned-revision';

const CSV = path.resolve('db', 'seeds', 'parcels', 'harrowfield-parcels.csv');
const user = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
const folder = mkdtempSync(path.join(tmpdir(), 'sillmark-e2e-casework-'));

let app: RunningApp;
let browser: Awaited<ReturnType<typeof launchBrowser>>;
let schemeId: string;

async function checked(page: Page, name: string) {
  await page.screenshot({ path: `tests/.artifacts/casework-${name}.png`, fullPage: true });
  expect(await seriousAccessibilityViolations(page), name).toEqual([]);
}

async function upload(page: Page, file: string, version: number) {
  await page.goto(`${app.baseUrl}/liaison/${schemeId}/upload`);
  await page.getByLabel('Parcels CSV file').setInputFiles(file);
  await page.getByText('All 9 parcels are valid.').waitFor();
  await page.getByRole('button', { name: 'Store as the register' }).click();
  await page.getByText(`Stored as register version ${version} with 9 parcels.`).waitFor();
}

beforeAll(async () => {
  process.env.SMTP_PORT = String(await freePort());
  delete process.env.SMTP_URL;
  app = await startApp();
  schemeId = addCountersignedRevision(app.databasePath);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('the liaison officer’s casework', () => {
  let affected: string[] = [];
  let byPost: string[] = [];

  it('withdraws a batch made by mistake, then e-mails some letters, prints and posts the rest, logs a typed response and reminds an overdue landowner', async () => {
    const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
    const liaison = user('liaison');
    await signInAs(page, app.baseUrl, liaison.email, liaison.password);
    await upload(page, CSV, 1);
    await page.goto(`${app.baseUrl}/liaison/${schemeId}/impact`);
    await page.getByRole('table', { name: /Impact of the scheme on each parcel/ }).waitFor();
    affected = await page.locator('[data-category="affected"]').evaluateAll((rows) => rows.map((r) => (r.getAttribute('data-testid') ?? '').replace('impact-', '')));
    expect(affected.length).toBeGreaterThan(3);
    // The last two affected parcels lose their e-mail address: their letters go by post.
    byPost = affected.slice(-2);
    const lines = readFileSync(CSV, 'utf8').trimEnd().split('\n');
    const noEmail = path.join(folder, 'parcels-without-some-email.csv');
    writeFileSync(noEmail, lines.map((l) => (byPost.some((r) => l.startsWith(`${r},`)) ? l.replace(/,[^,@]+@[^,]+,/, ',,') : l)).join('\n'));
    await upload(page, noEmail, 2);

    await page.goto(`${app.baseUrl}/liaison/${schemeId}/letters`);
    await page.getByText(`Parcels to write to`).waitFor();
    await page.getByRole('button', { name: 'Make letters' }).click();
    await page.getByText(`${affected.length} letters made`).waitFor();
    await page.getByRole('button', { name: 'Withdraw this batch' }).click();
    await page.getByRole('button', { name: 'Yes, withdraw the batch' }).click();
    await page.getByTestId('batch-progress').filter({ hasText: `Withdrawn before sending: none of its ${affected.length} letters went out.` }).waitFor();

    // This time one e-mail parcel is left out.
    const leftOut = affected[0];
    await page.getByRole('checkbox', { name: new RegExp(`^${leftOut} `) }).uncheck();
    await page.getByRole('button', { name: 'Make letters' }).click();
    await page.getByText(`${affected.length - 1} letters made`).waitFor();
    const byEmail = affected.length - 1 - byPost.length;
    const batch = page.getByTestId('letter-batch').first();
    await batch.getByRole('button', { name: `Send ${byEmail} letters` }).click();
    await checked(page, 'confirm-send');
    await batch.getByRole('button', { name: `Yes, e-mail ${byEmail} letters` }).click();
    await batch.getByTestId('batch-progress').filter({ hasText: `${byEmail} of ${byEmail} sent, 0 failed, 0 waiting. 2 to post, 0 posted.` }).waitFor({ timeout: 60_000 });
    expect(await batch.getByTestId(`batch-letter-${leftOut}`).count()).toBe(0);

    const printHref = await batch.getByRole('link', { name: 'Print the 2 letters to post' }).getAttribute('href');
    const printed = await page.request.get(`${app.baseUrl}${printHref}`);
    expect(printed.headers()['content-type']).toBe('application/pdf');
    const file = path.join(folder, 'to-post.pdf');
    writeFileSync(file, await printed.body());
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).split('\n').map((l) => l.trim());
    for (const reference of byPost) {
      const [, owner, address] = lines.find((l) => l.startsWith(`${reference},`))!.match(/^[^,]+,([^,]+),"([^"]+)"/)!;
      const at = text.indexOf(owner);
      expect(at, owner).toBeGreaterThanOrEqual(0);
      expect(text.slice(at + 1, at + 1 + address.split(',').length)).toEqual(address.split(',').map((p) => p.trim()));
    }
    for (const reference of byPost) {
      await batch.getByRole('button', { name: `Mark posted (the letter to ${reference})` }).click();
      await batch.getByRole('button', { name: `Mark posted (the letter to ${reference})` }).waitFor({ state: 'detached' });
      expect(await batch.getByTestId(`batch-letter-${reference}`).textContent()).toMatch(/Posted\d{4}-\d{2}-\d{2}/);
    }
    await batch.getByTestId('batch-progress').filter({ hasText: '0 to post, 2 posted.' }).waitFor();
    await checked(page, 'letters-posted');

    // A typed response to the first e-mailed letter.
    const answered = affected[1];
    await page.goto(`${app.baseUrl}/liaison/${schemeId}/letters`);
    await page.locator('tr', { hasText: answered }).first().getByRole('link', { name: /Version 2/ }).click();
    await page.getByLabel('Kind of response').selectOption('objection');
    await page.getByLabel('Received by').selectOption('telephone');
    await page.getByLabel('What the landowner said').fill('Objects to any rise at the lower gateway.');
    await page.getByRole('button', { name: 'Log the response' }).click();
    await page.getByTestId('letter-response').filter({ hasText: 'Objection by telephone' }).waitFor();
    await checked(page, 'letter-response');

    // Another letter has passed its deadline unanswered: an e-mailed one if there is one left, else a posted one.
    const byEmailLeft = affected.slice(2, -2);
    const overdue = byEmailLeft[0] ?? byPost[0];
    makeLetterOverdue(app.databasePath, overdue);
    await page.goto(`${app.baseUrl}/home`);
    const section = page.locator('section', { has: page.getByRole('heading', { name: 'Letters overdue for a response' }) });
    await section.getByRole('link', { name: new RegExp(overdue) }).click();
    await page.getByTestId('letter-deadline').filter({ hasText: 'Overdue' }).waitFor();
    await page.getByRole('button', { name: byEmailLeft.length ? 'E-mail a reminder' : 'Make a reminder letter to post' }).click();
    await page.getByText(byEmailLeft.length ? /Reminder made and e-mailed; the response is now due/ : /Reminder made to post; the response is now due/).waitFor();
    await checked(page, 'reminder');
  });
});

describe('the administrator', () => {
  it('changes a role only through Save and a confirmation naming the person and both roles', async () => {
    const page = await (await browser.newContext()).newPage();
    await signInAs(page, app.baseUrl, user('admin').email, user('admin').password);
    await page.goto(`${app.baseUrl}/admin/users`);
    const planning = user('planning');
    const select = page.getByLabel(`Role of ${planning.name}`);
    await select.focus();
    await page.keyboard.press('ArrowUp');
    await page.reload();
    expect(await page.getByLabel(`Role of ${planning.name}`).inputValue()).toBe('planning');
    await page.getByLabel(`Role of ${planning.name}`).selectOption('checker');
    await page.getByRole('button', { name: `Save the role of ${planning.name}` }).click();
    await page.getByText(`Change ${planning.name}’s role from Planning officer to Checker?`).waitFor();
    await checked(page, 'confirm-role');
    await page.getByRole('button', { name: `Yes, make ${planning.name} Checker` }).click();
    await page.getByRole('status').filter({ hasText: `${planning.name}’s role is now Checker (was Planning officer).` }).waitFor();
    await page.reload();
    expect(await page.getByLabel(`Role of ${planning.name}`).inputValue()).toBe('checker');
  });

  it('deactivates a user, whose sign-in is then refused', async () => {
    const page = await (await browser.newContext()).newPage();
    await signInAs(page, app.baseUrl, user('admin').email, user('admin').password);
    await page.goto(`${app.baseUrl}/admin/users`);
    const designer = user('designer');
    await page.getByRole('button', { name: `Deactivate ${designer.name}` }).click();
    await page.getByRole('button', { name: `Yes, deactivate ${designer.name}` }).click();
    await page.getByText(`${designer.name} is deactivated and signed out.`).waitFor();

    const other = await (await browser.newContext()).newPage();
    await other.goto(`${app.baseUrl}/sign-in`);
    await other.getByLabel('E-mail address').fill(designer.email);
    await other.getByLabel('Password').fill(designer.password);
    await other.getByRole('button', { name: 'Sign in' }).click();
    await other.getByText('do not match an active account').waitFor();
    expect(other.url()).toContain('/sign-in');
  });
});
