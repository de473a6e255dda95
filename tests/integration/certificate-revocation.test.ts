import { execFileSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { revokeCertificateAction } from '@/app/(portal)/admin/certificates/actions';
import { generateLettersAction } from '@/app/(portal)/liaison/[id]/letters/actions';
import { certificateVerificationUrl } from '@/lib/certificates/certificate-urls';
import { portalBaseUrl } from '@/lib/certificates/portal-base-url';
import { AuditEvent, Certificate, Letter, OutboxMessage, database } from '@/lib/db';
import { letterMessageId } from '@/lib/letters/letter-delivery';
import { listLiaisonSchemes } from '@/lib/parcels/list-liaison-schemes';
import { selectRevision } from '@/lib/parcels/select-revision';
import { sendLetterBatch } from '@/lib/letters/send-letter-batch';
import { type LocalSmtpServer, startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { demoParcelsCsv } from './support/liaison-fixtures';
import { createCertifiedScheme } from './support/scheme-factory';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let smtp: LocalSmtpServer;
let people: { designer: Person; checker: Person; liaison: Person; otherLiaison: Person; admin: Person };

const REASON = 'The bridge soffit level at Mill Lane was surveyed 0.3 m too high.';
const letterFiles = () => readdirSync(path.join(path.dirname(db.file), 'letters')).sort();
const pdfText = (file: string) => execFileSync('pdftotext', [file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');

/** A certified scheme (countersigned through the real use cases) with the demo parcels register. */
async function certifiedWithParcels() {
  const certified = await createCertifiedScheme({ designer: people.designer, checker: people.checker });
  signedInAs(people.liaison.sessionUser);
  expect((await callRoute('parcels/[id]/csv', 'POST', { id: certified.scheme.id, body: new Uint8Array(demoParcelsCsv()), headers: { 'x-file-name': 'parcels.csv' } })).status).toBe(201);
  return certified;
}

async function generate(schemeId: string, revisionId: string): Promise<string> {
  signedInAs(people.liaison.sessionUser);
  const result = await generateLettersAction({ schemeId, revisionId });
  if (!result.ok) throw new Error(result.error);
  return result.data.batchId;
}

async function revoke(certificateId: string, password = people.admin.password) {
  signedInAs(people.admin.sessionUser);
  return revokeCertificateAction({ certificateId, reason: REASON, confirmed: true, password });
}

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  smtp = await startLocalSmtpServer(0);
  people = { designer: await createTestUser('designer'), checker: await createTestUser('checker'), liaison: await createTestUser('liaison'), otherLiaison: await createTestUser('liaison'), admin: await createTestUser('admin') };
});
afterAll(async () => {
  signedInAs(null);
  await stopLocalSmtpServer();
  await db.cleanup();
});

describe('revoking a certificate', () => {
  it('refuses a wrong password or a missing confirmation, and changes nothing but the counted attempt and its audit entry', async () => {
    const { certificate } = await certifiedWithParcels();
    const batchId = await generate(certificate.schemeId, certificate.revisionId);
    const before = await tableSnapshot();
    expect(await revoke(certificate.id, 'not-the-admin-password')).toMatchObject({ ok: false, status: 400, issues: [{ path: 'password', message: expect.stringMatching(/not your password/) }] });
    signedInAs(people.admin.sessionUser);
    expect(await revokeCertificateAction({ certificateId: certificate.id, reason: REASON, password: people.admin.password })).toMatchObject({ ok: false, status: 400, issues: [{ path: 'confirmed' }] });
    expect(await revokeCertificateAction({ certificateId: certificate.id, reason: REASON, confirmed: true, password: '' })).toMatchObject({ ok: false, status: 400, issues: [{ path: 'password' }] });
    // The wrong password is counted against the admin's confirmation budget and audited; nothing else is stored.
    expect(await tableSnapshot()).toEqual({ ...before, audit_events: before.audit_events + 1, sign_in_attempts: expect.any(Number) });
    expect(await AuditEvent.count({ where: { action: 'user.revoke-password-failed', entityId: people.admin.user.id } })).toBe(1);
    expect((await certificate.reload()).status).toBe('issued');
    expect((await Letter.findAll({ where: { batchId } })).every((l) => l.status === 'queued')).toBe(true);
  });

  it('holds the revision’s queued letters, sends none of them, and tells the designer, the checker and every liaison officer', async () => {
    const { certificate, scheme } = await certifiedWithParcels();
    const batchId = await generate(scheme.id, certificate.revisionId);
    await sendLetterBatch({ user: people.liaison.sessionUser, batchId, input: { max: 1, retryFailed: false } });
    const letters = await Letter.findAll({ where: { batchId } });
    const sent = letters.filter((l) => l.status === 'sent');
    expect(sent).toHaveLength(1);
    const outboxBefore = await OutboxMessage.count();

    expect(await revoke(certificate.id)).toMatchObject({ ok: true, data: { status: 'revoked', heldLetters: letters.length - 1, notified: 4 } });
    for (const letter of letters) {
      await letter.reload();
      if (letter.id === sent[0].id) expect(letter.status).toBe('sent');
      else expect(letter).toMatchObject({ status: 'held', failureReason: expect.stringContaining(certificate.number) });
    }
    const progress = await sendLetterBatch({ user: people.liaison.sessionUser, batchId, input: { max: 50, retryFailed: true } });
    expect(progress.counts).toMatchObject({ sent: 1, held: letters.length - 1, queued: 0, sending: 0 });
    expect(await OutboxMessage.count({ where: { messageId: letters.map((l) => letterMessageId(l.id)) } })).toBe(1);

    const notices = (await OutboxMessage.findAll()).slice(outboxBefore).filter((m) => m.subject?.includes(`certificate ${certificate.number}`));
    expect(notices.map((m) => m.envelopeTo).sort()).toEqual([people.designer, people.checker, people.liaison, people.otherLiaison].map((p) => p.user.email).sort());
    expect(notices.every((m) => /is revoked$/.test(m.subject ?? ''))).toBe(true);
  });

  it('holds a letter whose batch was already being sent when the certificate was revoked', async () => {
    const { certificate, scheme } = await certifiedWithParcels();
    const batchId = await generate(scheme.id, certificate.revisionId);
    // As if the revocation committed between a run reading the queued letters and claiming them.
    await Certificate.update({ status: 'revoked', revokedAt: new Date().toISOString(), revocationReason: REASON }, { where: { id: certificate.id } });
    const progress = await sendLetterBatch({ user: people.liaison.sessionUser, batchId, input: { max: 50, retryFailed: false } });
    expect(progress.counts.sent).toBe(0);
    expect(progress.counts.held).toBe(progress.total);
    expect(await OutboxMessage.count({ where: { messageId: progress.letters.map((l) => letterMessageId(l.id)) } })).toBe(0);
  });
});

describe('letters and a revoked certificate', () => {
  it('refuses to make letters from the revoked revision, storing nothing', async () => {
    const { certificate, scheme } = await certifiedWithParcels();
    expect(await revoke(certificate.id)).toMatchObject({ ok: true });
    const before = await tableSnapshot();
    const files = letterFiles();
    signedInAs(people.liaison.sessionUser);
    const refused = await generateLettersAction({ schemeId: scheme.id, revisionId: certificate.revisionId });
    expect(refused).toMatchObject({ ok: false, status: 422, error: expect.stringContaining(`certificate ${certificate.number} was revoked`) });
    expect(refused.ok ? '' : refused.error).toContain(REASON);
    expect(await tableSnapshot()).toEqual(before);
    expect(letterFiles()).toEqual(files);
  });

  it('no longer counts the revoked revision as the scheme’s certified one, but still opens it when it is the only one', async () => {
    const { certificate, scheme } = await certifiedWithParcels();
    const listed = async () => (await listLiaisonSchemes(people.liaison.sessionUser)).find((s) => s.id === scheme.id);
    expect((await listed())?.certifiedRevision).toBe(1);
    expect(await revoke(certificate.id)).toMatchObject({ ok: true });
    expect((await listed())?.certifiedRevision).toBeNull();
    expect((await selectRevision({ schemeId: scheme.id }))?.id).toBe(certificate.revisionId);
  });

  it('cites the certificate number and its public verification link in a letter from a certified revision', async () => {
    const { certificate, scheme } = await certifiedWithParcels();
    const batchId = await generate(scheme.id, certificate.revisionId);
    database();
    const letter = (await Letter.findOne({ where: { batchId } }))!;
    const link = certificateVerificationUrl(await portalBaseUrl(), certificate.number);
    expect(link).toMatch(/^http:\/\/localhost:3000\/verify\?number=SMC-\d{4}-\d{4,}$/);
    const text = pdfText(letter.pdfPath!);
    expect(text).toContain(`Certificate ${certificate.number}`);
    expect(text).toContain(link);
    expect(text).not.toContain('PRELIMINARY');
  });
});
