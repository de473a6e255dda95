import path from 'node:path';
import type { Page } from 'playwright-core';
import { Op } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type Certificate, Letter, OutboxMessage, closeSequelize } from '@/lib/db';
import { generateLetters } from '@/lib/letters/generate-letters';
import { importParcelRegister } from '@/lib/parcels/import-parcel-register';
import { demoParcelsCsv } from '../integration/support/liaison-fixtures';
import { createCertifiedScheme } from '../integration/support/scheme-factory';
import { createTestUser } from '../integration/support/user-factory';
import { ARTIFACTS, useServedPortal } from './support/served-portal';
import { freePort } from './support/app-server';

type Person = Awaited<ReturnType<typeof createTestUser>>;

// Before the portal starts: its own local mail server on a free port, so the outbox read below is this portal's.
beforeAll(async () => {
  process.env.SMTP_PORT = String(await freePort());
  delete process.env.SMTP_URL;
});
const portal = useServedPortal();
let people: { designer: Person; checker: Person; liaison: Person; admin: Person };
let certificate: Certificate;
let schemeId: string;
const REASON = 'The Mill Lane bridge soffit was surveyed 0.3 m too high; the afflux upstream is understated.';

beforeAll(async () => {
  process.env.DATABASE_PATH = portal.app.databasePath;
  people = { designer: await createTestUser('designer'), checker: await createTestUser('checker'), liaison: await createTestUser('liaison'), admin: await createTestUser('admin') };
  const certified = await createCertifiedScheme({ designer: people.designer, checker: people.checker });
  certificate = certified.certificate;
  schemeId = certified.scheme.id;
  await importParcelRegister({ user: people.liaison.sessionUser, schemeId, bytes: demoParcelsCsv(), originalName: 'harrowfield-parcels.csv' });
  await generateLetters({ user: people.liaison.sessionUser, input: { schemeId, revisionId: certified.revision.id }, baseUrl: portal.app.baseUrl });
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

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(ARTIFACTS, `revocation-${name}.png`), fullPage: true });

describe('an administrator revokes a certificate', () => {
  it('with confirmation and password; the liaison pages then show it, letters are refused and held, and the people concerned are e-mailed', async () => {
    const number = certificate.number;
    const admin = await signedInPage(people.admin);
    await admin.goto(`${portal.app.baseUrl}/admin/certificates`);
    const form = admin.getByRole('form', { name: `Revoke certificate ${number}` });
    await form.getByLabel(`Reason for revoking ${number}`).fill(REASON);
    await form.getByLabel('Your password').fill(`${people.admin.password}-wrong`);
    await form.getByRole('button', { name: `Revoke ${number}` }).click();
    await form.getByText('Tick the statement to confirm').waitFor();
    await form.getByRole('checkbox').check();
    await form.getByRole('button', { name: `Revoke ${number}` }).click();
    await form.getByText('That is not your password.').waitFor();
    await form.getByLabel('Your password').fill(people.admin.password);
    await shot(admin, '1-confirm');
    await form.getByRole('button', { name: `Revoke ${number}` }).click();
    await admin.getByText('Revoked; nothing more to do.').waitFor();

    const liaison = await signedInPage(people.liaison);
    await liaison.goto(`${portal.app.baseUrl}/liaison/${schemeId}`);
    await liaison.getByRole('heading', { name: `Certificate ${number} of revision 1 is revoked` }).waitFor();
    expect(await liaison.getByText(REASON).count()).toBe(1);
    expect(await liaison.getByText('From revision 1 (countersigned, certificate revoked), so no letter can be made from it.').count()).toBe(1);
    await shot(liaison, '2-liaison');

    await liaison.goto(`${portal.app.baseUrl}/liaison/${schemeId}/letters`);
    await liaison.getByLabel('From revision').selectOption({ label: 'Revision 1 (countersigned, certificate revoked)' });
    await liaison.getByRole('button', { name: 'Make letters' }).click();
    await liaison.getByRole('alert').filter({ hasText: `Letters cannot be made from revision 1: its certificate ${number} was revoked.` }).waitFor();
    await liaison.getByTestId('batch-progress').filter({ hasText: 'held and not sent' }).waitFor();
    await shot(liaison, '3-letters-refused');

    const letters = await Letter.findAll({ where: { revisionId: certificate.revisionId } });
    expect(letters.length).toBeGreaterThan(0);
    expect(letters.every((l) => l.status === 'held')).toBe(true);
    const notices = await OutboxMessage.findAll({ where: { subject: { [Op.like]: `%certificate ${number} %is revoked` } } });
    const recipients = notices.map((m) => m.envelopeTo);
    for (const person of [people.designer, people.checker, people.liaison]) expect(recipients).toContain(person.user.email);
    expect(recipients).not.toContain(people.admin.user.email);
  });
});
