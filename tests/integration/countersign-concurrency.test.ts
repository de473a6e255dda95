import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { readCertificateFile } from '@/lib/certificates/certificate-files';
import { readUploadedCertificate } from '@/lib/certificates/read-uploaded-certificate';
import { AuditEvent, Certificate, OutboundMessage, Review, Revision, Scheme } from '@/lib/db';
import { ConflictError } from '@/lib/http/app-errors';
import { stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { countersignRevision } from '@/lib/review/countersign-revision';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { createScheme } from '@/lib/schemes/create-scheme';
import { newSchemeSchema } from '@/lib/validation/scheme-schemas';
import { auditChainBreaks, certificateStorage } from './support/consistency-checks';
import { createTestScheme } from './support/scheme-factory';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// Countersigning makes its certificate outside the write lock and records it in one short transaction that checks
// every rule again. A test-only gate holds each certificate's render (which runs on the PDF pool as usual) until the
// test opens it, so "while a certificate is being made" is a state the test controls, not a duration it guesses.

const renders = vi.hoisted(() => {
  const HANG_GUARD_MS = 30_000;
  let open: () => void = () => undefined;
  let gate = Promise.resolve();
  const waiting: { count: number; resolve: () => void }[] = [];
  const state = {
    started: 0,
    close: () => (gate = new Promise<void>((resolve) => (open = resolve))),
    open: () => open(),
    passGate: () => gate,
    /** Resolves once `count` renders have started; fails if they do not (one held the write lock, and the other waits). */
    startedAtLeast: (count: number) =>
      new Promise<void>((resolve, reject) => {
        if (state.started >= count) return resolve();
        // Only a guard against a hang, so that the failure says what it means; nothing here is timed.
        const guard = setTimeout(() => reject(new Error(`only ${state.started} of ${count} certificates were ever being made at once`)), HANG_GUARD_MS);
        waiting.push({ count, resolve: () => (clearTimeout(guard), resolve()) });
      }),
    noteStart: () => {
      state.started += 1;
      for (const w of waiting.filter((x) => state.started >= x.count)) w.resolve();
    },
  };
  return state;
});

vi.mock('@/lib/pdf-pool/render-off-thread', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/lib/pdf-pool/render-off-thread')>();
  return {
    ...actual,
    signedCertificateOffThread: async (...args: Parameters<typeof actual.signedCertificateOffThread>) => {
      const made = actual.signedCertificateOffThread(...args);
      renders.noteStart();
      await renders.passGate();
      return made;
    },
  };
});

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Person;
let first: Person;
let second: Person;
const baseUrl = 'http://localhost:3000';

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  designer = await createTestUser('designer');
  first = await createTestUser('checker');
  second = await createTestUser('checker');
});
afterAll(async () => {
  renders.open();
  await stopLocalSmtpServer();
  await db.cleanup();
});
beforeEach(() => {
  renders.started = 0;
  renders.close();
});

async function submitted(checker: Person | null) {
  const { scheme, revision } = await createTestScheme(designer.user.id);
  await submitForCheck({ revisionId: revision.id, checkerId: checker?.user.id ?? null, designer: designer.sessionUser, baseUrl });
  return { scheme, revision };
}

const countersign = (revisionId: string, checker: Person) => countersignRevision({ input: { revisionId, password: checker.password, confirmed: true }, checker: checker.sessionUser, baseUrl });

async function expectStoredConsistently() {
  const storage = await certificateStorage();
  expect(await auditChainBreaks()).toEqual([]);
  expect(storage.orphanFiles).toEqual([]);
  expect(storage.rowsWithoutFile).toEqual([]);
  expect(storage.rowsWithWrongFile).toEqual([]);
}

describe('two countersignatures at the same moment', () => {
  it('of the same queued revision by two checkers: exactly one certificate, and one clear refusal that records nothing', async () => {
    const { revision } = await submitted(null);
    const mailBefore = await OutboundMessage.count();
    const attempts = [countersign(revision.id, first), countersign(revision.id, second)].map((p) => p.then((value) => ({ value }), (error: unknown) => ({ error })));
    // Both certificates are being made at once: both checkers passed every check before either was recorded.
    await renders.startedAtLeast(2);
    renders.open();
    const outcomes = await Promise.all(attempts);

    const issued = outcomes.flatMap((o) => ('value' in o ? [o.value] : []));
    const refused = outcomes.flatMap((o) => ('error' in o ? [o.error] : []));
    expect(issued).toHaveLength(1);
    expect(refused).toHaveLength(1);
    expect(refused[0]).toBeInstanceOf(ConflictError);
    expect((refused[0] as ConflictError).status).toBe(409);
    expect((refused[0] as Error).message).toBe('Revision 1 has just been countersigned by another checker, so this countersignature was not recorded.');

    const winner = (await Revision.findByPk(revision.id))!;
    expect(winner.status).toBe('countersigned');
    expect(await Certificate.count({ where: { revisionId: revision.id } })).toBe(1);
    expect(await AuditEvent.count({ where: { entityId: revision.id, action: 'revision.countersigned' } })).toBe(1);
    // The refused checker's review was never started: its transaction recorded nothing.
    expect(await Review.findAll({ where: { revisionId: revision.id } })).toMatchObject([{ checkerId: winner.checkerId, decision: 'countersigned' }]);
    expect(await OutboundMessage.count()).toBe(mailBefore + 1);
    await expectStoredConsistently();
  });

  it('of two revisions: the one whose number was taken meanwhile is made again under the next number', async () => {
    const one = await submitted(first);
    const other = await submitted(second);
    const both = Promise.all([countersign(one.revision.id, first), countersign(other.revision.id, second)]);
    await renders.startedAtLeast(2);
    renders.open();
    const [a, b] = await both;

    // Both drew the same next number; the second to record found it taken, and its certificate was made once more.
    expect(renders.started).toBe(3);
    expect(new Set([a.certificateNumber, b.certificateNumber]).size).toBe(2);
    for (const { certificateId, certificateNumber } of [a, b]) {
      const stored = await readCertificateFile((await Certificate.findByPk(certificateId))!.pdfPath);
      const reading = readUploadedCertificate(stored);
      expect(reading.claimedNumber).toBe(certificateNumber);
      expect(reading.signature.valid).toBe(true);
    }
    await expectStoredConsistently();
  });
});

describe('the write lock while a certificate is being made', () => {
  it('is not held: another designer creates a scheme (its own write transaction) and it commits before the certificate is stored', async () => {
    const { revision } = await submitted(first);
    let countersigned = false;
    const pending = countersign(revision.id, first).then((result) => ((countersigned = true), result));
    await renders.startedAtLeast(1);

    const otherDesigner = await createTestUser('designer');
    const input = newSchemeSchema.parse({ units: 'SI', name: 'Coldbeck sluice renewal (test)', watercourse: 'Coldbeck', site: 'Coldbeck Lane footbridge', datum: 'Ordnance Datum Newlyn' });
    const created = await createScheme({ input, designer: otherDesigner.sessionUser });
    expect(await Scheme.findByPk(created.schemeId)).not.toBeNull();
    expect(await AuditEvent.count({ where: { entityId: created.schemeId, action: 'scheme.created' } })).toBe(1);
    // The certificate is still being made (its render is held at the gate), so its countersignature is not yet recorded.
    expect(countersigned).toBe(false);
    expect((await Revision.findByPk(revision.id))?.status).toBe('submitted');

    renders.open();
    const result = await pending;
    expect(result).toMatchObject({ revisionId: revision.id, status: 'countersigned' });
    await expectStoredConsistently();
  });
});
