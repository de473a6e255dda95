import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Certificate, Revision, database } from '@/lib/db';
import { stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { auditChainBreaks, certificateStorage } from './support/consistency-checks';
import type { CountersignStop, FaultJob } from './support/fault-job';
import { runInChildProcess } from './support/fault-runner';
import { createCertifiedScheme, createDraftRevision, createTestScheme, demoCase } from './support/scheme-factory';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// The server is a separate process killed with SIGKILL at a chosen point of countersigning; this process then
// checks what SQLite and the data directory hold, and retries in a fresh process, as a restarted server would.

type Person = Awaited<ReturnType<typeof createTestUser>>;
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let designer: Person;
let checker: Person;

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  designer = await createTestUser('designer');
  checker = await createTestUser('checker');
});
afterAll(async () => {
  await stopLocalSmtpServer();
  await db.cleanup();
});

async function submittedRevision(schemeId?: string) {
  const revision = schemeId
    ? await createDraftRevision({ schemeId, authorId: designer.user.id, number: 2, inputs: demoCase() })
    : (await createTestScheme(designer.user.id)).revision;
  await submitForCheck({ revisionId: revision.id, checkerId: checker.user.id, designer: designer.sessionUser, baseUrl: 'http://localhost:3000' });
  return revision;
}

const countersign = (revisionId: string, stopAt?: CountersignStop) => runInChildProcess({ use: 'countersign', revisionId, checker: checker.sessionUser, password: checker.password, stopAt } satisfies FaultJob, db.file);

async function eventsFor(entityId: string, action: string) {
  database();
  return AuditEvent.count({ where: { entityId, action } });
}

async function expectConsistent() {
  const storage = await certificateStorage();
  expect(await auditChainBreaks()).toEqual([]);
  expect(storage.rowsWithoutFile).toEqual([]);
  expect(storage.rowsWithWrongFile).toEqual([]);
  return storage;
}

describe('the server killed inside the countersigning transaction', () => {
  it.each<CountersignStop>(['revision-updated', 'certificate-stored'])('at "%s" records nothing, and a retry issues exactly one certificate', async (stopAt) => {
    const revision = await submittedRevision();
    const before = await tableSnapshot();

    const killed = await countersign(revision.id, stopAt);
    expect(killed.stoppedAt, killed.output).toBe(stopAt);
    expect(killed.signal).toBe('SIGKILL');

    expect(await tableSnapshot()).toEqual(before);
    expect((await Revision.findByPk(revision.id))?.status).toBe('submitted');
    const afterKill = await expectConsistent();
    // The killed run may leave its signed PDF behind, but never a row for it.
    expect(afterKill.orphanFiles.length).toBe(stopAt === 'certificate-stored' ? 1 : 0);

    const retry = await countersign(revision.id);
    expect(retry.error, retry.output).toBeNull();
    expect(retry.result).toMatchObject({ revisionId: revision.id, status: 'countersigned' });
    const afterRetry = await expectConsistent();
    expect(afterRetry.rows.filter((c) => c.revisionId === revision.id).length).toBe(1);
    expect(afterRetry.orphanFiles).toEqual([]);
    expect(await eventsFor(revision.id, 'revision.countersigned')).toBe(1);

    const again = await countersign(revision.id);
    expect(again.error?.status).toBe(409);
    expect(await Certificate.count({ where: { revisionId: revision.id } })).toBe(1);
  });

  it('before the earlier certificate is superseded leaves it issued; the retry supersedes it once', async () => {
    const first = await createCertifiedScheme({ designer, checker });
    const revision = await submittedRevision(first.scheme.id);

    const killed = await countersign(revision.id, 'certificate-stored');
    expect(killed.stoppedAt, killed.output).toBe('certificate-stored');
    expect((await Certificate.findByPk(first.certificate.id))?.status).toBe('issued');
    await expectConsistent();

    const retry = await countersign(revision.id);
    expect(retry.error, retry.output).toBeNull();
    const certificates = await Certificate.findAll({ where: { schemeId: first.scheme.id } });
    expect(certificates.filter((c) => c.status === 'issued').map((c) => c.revisionId)).toEqual([revision.id]);
    expect((await Certificate.findByPk(first.certificate.id))?.supersededById).toBe(certificates.find((c) => c.revisionId === revision.id)?.id);
    expect(await eventsFor(first.certificate.id, 'certificate.superseded')).toBe(1);
    expect((await expectConsistent()).orphanFiles).toEqual([]);
  });
});

describe('the server killed just after the countersignature committed', () => {
  it('keeps the countersignature and its signed certificate, and a retry refuses instead of issuing a second', async () => {
    const revision = await submittedRevision();

    const killed = await countersign(revision.id, 'committed');
    expect(killed.stoppedAt, killed.output).toBe('committed');
    expect((await Revision.findByPk(revision.id))?.status).toBe('countersigned');
    const storage = await expectConsistent();
    expect(storage.rows.filter((c) => c.revisionId === revision.id && c.status === 'issued').length).toBe(1);
    expect(await eventsFor(revision.id, 'revision.countersigned')).toBe(1);

    const before = await tableSnapshot();
    const retry = await countersign(revision.id);
    expect(retry.error?.status).toBe(409);
    expect(await tableSnapshot()).toEqual(before);
    expect(await Certificate.count({ where: { revisionId: revision.id } })).toBe(1);
  });
});
