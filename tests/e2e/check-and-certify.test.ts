import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Revision, closeSequelize } from '@/lib/db';
import { createTestScheme } from '../integration/support/scheme-factory';
import { createTestUser } from '../integration/support/user-factory';
import { ARTIFACTS, useServedPortal } from './support/served-portal';

type Person = Awaited<ReturnType<typeof createTestUser>>;

const portal = useServedPortal();
let people: { designer: Person; checker: Person; planning: Person; admin: Person };
let scheme: Awaited<ReturnType<typeof createTestScheme>>['scheme'];
let firstRevisionId: string;

beforeAll(async () => {
  // This test's own people and scheme, written straight into the served database (WAL lets both processes use it).
  process.env.DATABASE_PATH = portal.app.databasePath;
  people = { designer: await createTestUser('designer'), checker: await createTestUser('checker'), planning: await createTestUser('planning'), admin: await createTestUser('admin') };
  const created = await createTestScheme(people.designer.user.id);
  scheme = created.scheme;
  firstRevisionId = created.revision.id;
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

async function shot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: path.join(ARTIFACTS, `check-${name}.png`), fullPage: true });
}

async function openCheck(page: Page, revisionNumber: number): Promise<void> {
  await page.goto(`${portal.app.baseUrl}/checks`);
  await page.getByRole('link', { name: `${scheme.reference} ${scheme.name} — revision ${revisionNumber}` }).click();
  await page.getByRole('heading', { name: 'Independent re-run' }).waitFor();
}

describe('designer → checker → designer → checker → planning officer', () => {
  it('submits, returns with a comment, revises, resubmits, countersigns, and the planning officer downloads and verifies the certificate', async () => {
    // The designer submits revision 1 to the chosen checker.
    const designer = await signedInPage(people.designer);
    await designer.goto(`${portal.app.baseUrl}/revisions/${firstRevisionId}`);
    await designer.getByLabel('Checker').selectOption(people.checker.user.id);
    await shot(designer, '1-submit');
    await designer.getByRole('button', { name: 'Submit for check' }).click();
    await designer.getByText('SHA-256 of the revision').waitFor();
    await designer.locator('dd', { hasText: /^[0-9a-f]{64}$/ }).first().waitFor();

    // The checker sees the independent re-run, comments on the structure and returns the revision.
    const checker = await signedInPage(people.checker);
    await openCheck(checker, 1);
    expect(await checker.getByText('The independent re-run reproduces the stored results.').count()).toBe(1);
    await checker.getByLabel('Part of the revision').selectOption('structure');
    await checker.getByRole('textbox', { name: 'Comment', exact: true }).fill('The 10 m crest gives little margin at the Mill Lane bridge; lengthen it to 12 m.');
    await checker.getByRole('button', { name: 'Add comment' }).click();
    await checker.getByText('The 10 m crest gives little margin').first().waitFor();
    await shot(checker, '2-review');
    await checker.getByLabel('What should change').fill('Lengthen the crest to 12 m and resubmit.');
    await checker.getByRole('button', { name: /Return with comments/ }).click();
    await checker.waitForURL(`${portal.app.baseUrl}/checks`);

    // The designer reads the comment, starts a new draft from revision 1 and lengthens the crest in the wizard.
    await designer.goto(`${portal.app.baseUrl}/revisions/${firstRevisionId}`);
    await designer.getByText('The 10 m crest gives little margin').waitFor();
    await shot(designer, '3-returned');
    await designer.getByRole('button', { name: 'Start a new draft from revision 1' }).click();
    await designer.waitForURL(`${portal.app.baseUrl}/schemes/${scheme.id}/wizard/scheme`);
    await designer.goto(`${portal.app.baseUrl}/schemes/${scheme.id}/wizard/structure`);
    const carried = designer.getByRole('complementary', { name: 'The checker’s comments on revision 1' });
    await carried.getByText('The 10 m crest gives little margin').waitFor();
    await shot(designer, '3-carried-comments');
    await designer.getByLabel('Crest length (m)').fill('12');
    await designer.getByRole('button', { name: 'Save and continue' }).click();
    await designer.waitForURL((url) => !url.pathname.endsWith('/wizard/structure'));
    const second = await Revision.findOne({ where: { schemeId: scheme.id, number: 2 } });
    expect(second?.status).toBe('draft');
    await designer.goto(`${portal.app.baseUrl}/revisions/${second!.id}`);
    await designer.getByRole('button', { name: 'Submit for check' }).click();
    await designer.locator('dd', { hasText: /^[0-9a-f]{64}$/ }).first().waitFor();

    // The checker takes revision 2 from the queue, sees what changed since revision 1, and countersigns.
    await openCheck(checker, 2);
    const changes = checker.locator('table', { has: checker.getByText('Inputs changed since revision 1') });
    // The field is named in words (issue 12 §6), never by its case-file path.
    expect(await changes.getByRole('cell', { name: /^proposed structure: crest length/ }).count()).toBe(1);
    expect(await changes.getByRole('cell', { name: 'control.crestLength' }).count()).toBe(0);
    await checker.setViewportSize({ width: 820, height: 1100 });
    await shot(checker, '4-review-tablet');
    await checker.setViewportSize({ width: 1280, height: 900 });
    await checker.getByLabel(/I have checked this revision independently/).check();
    await checker.getByLabel('Your password').fill(people.checker.password);
    await shot(checker, '4-countersign');
    await checker.getByRole('button', { name: 'Countersign' }).click();
    await checker.waitForURL(`${portal.app.baseUrl}/revisions/${second!.id}`);
    const number = (await checker.locator('p', { hasText: 'Download the signed PDF' }).locator('.num').first().textContent())!.trim();
    expect(number).toMatch(/^SMC-\d{4}-\d{4}$/);
    await shot(checker, '5-certified');

    // The planning officer's home links to the certificate; visiting it downloads nothing, so it logs no download.
    const planning = await signedInPage(people.planning);
    await planning.getByRole('link', { name: `Download ${number}` }).waitFor();
    await planning.waitForLoadState('networkidle');
    const downloads = () => AuditEvent.count({ where: { action: 'certificate.downloaded', actorId: people.planning.user.id } });
    expect(await downloads()).toBe(0);

    // The planning officer finds the certificate in the register, downloads it and verifies it.
    await planning.goto(`${portal.app.baseUrl}/certificates`);
    await planning.getByLabel('Scheme, site or number').fill(scheme.reference);
    await planning.getByRole('button', { name: 'Search' }).click();
    await planning.getByRole('link', { name: number, exact: true }).waitFor();
    await shot(planning, '6-register');
    const [download] = await Promise.all([planning.waitForEvent('download'), planning.getByRole('link', { name: `Download ${number}` }).click()]);
    const saved = path.join(ARTIFACTS, `${number}.pdf`);
    await download.saveAs(saved);
    expect(readFileSync(saved).subarray(0, 5).toString()).toBe('%PDF-');
    expect(await downloads()).toBe(1);

    await planning.goto(`${portal.app.baseUrl}/verify`);
    await planning.getByLabel('Certificate PDF').setInputFiles(saved);
    await planning.getByRole('button', { name: 'Check the PDF' }).click();
    await planning.getByText('Authentic and current').waitFor();
    await shot(planning, '7-verified');

    const tampered = readFileSync(saved);
    tampered[Math.floor(tampered.length / 3)] ^= 0x01;
    const tamperedFile = path.join(ARTIFACTS, `${number}-tampered.pdf`);
    writeFileSync(tamperedFile, tampered);
    await planning.getByLabel('Certificate PDF').setInputFiles(tamperedFile);
    await planning.getByRole('button', { name: 'Check the PDF' }).click();
    await planning.getByText('Not verified: do not rely on this file').waitFor();
    await shot(planning, '8-tampered');

    // Verification by number needs no account.
    const anonymous = await (await portal.browser.newContext()).newPage();
    await anonymous.goto(`${portal.app.baseUrl}/verify?number=${number}`);
    await anonymous.getByText('This certificate is current').waitFor();
    await shot(anonymous, '9-public-lookup');

    // An administrator revokes it with a reason; the public lookup says so from then on.
    const admin = await signedInPage(people.admin);
    await admin.goto(`${portal.app.baseUrl}/admin/certificates`);
    const revokeForm = admin.getByRole('form', { name: `Revoke certificate ${number}` });
    await revokeForm.getByLabel(`Reason for revoking ${number}`).fill('Revoked in the end-to-end test: the bridge soffit level was re-surveyed.');
    await revokeForm.getByRole('checkbox').check();
    await revokeForm.getByLabel('Your password').fill(people.admin.password);
    await shot(admin, '10-revoke');
    await admin.getByRole('button', { name: `Revoke ${number}` }).click();
    await admin.getByText('Revoked; nothing more to do.').waitFor();
    await anonymous.reload();
    await anonymous.getByText('This certificate is revoked and must not be relied on.').waitFor();
    expect(await anonymous.getByText('the bridge soffit level was re-surveyed').count()).toBe(1);
  });
});
