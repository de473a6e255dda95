import { existsSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Letter, LetterBatch, OutboxMessage, database } from '@/lib/db';
import { importParcelRegister } from '@/lib/parcels/import-parcel-register';
import { sweepUnreferencedFiles } from '@/lib/storage/sweep-unreferenced-files';
import { auditChainBreaks, messagesPerLetter, orphanLetterFiles } from './support/consistency-checks';
import type { FaultJob } from './support/fault-job';
import { runInChildProcess } from './support/fault-runner';
import { createTestRevision, createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// The server is a separate process killed with SIGKILL in the middle of making or sending a batch of letters; this
// process then checks the database and retries in a fresh process, as a restarted server would. Each process runs
// its own local SMTP server on loopback, which stores every message it accepts in the shared outbox.

type Liaison = Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let db: Awaited<ReturnType<typeof useTestDatabase>>;
let liaison: Liaison;
let designerId: string;
let checkerId: string;

beforeAll(async () => {
  db = await useTestDatabase();
  liaison = (await createTestUser('liaison')).sessionUser;
  designerId = (await createTestUser('designer')).user.id;
  checkerId = (await createTestUser('checker')).user.id;
});
afterAll(async () => db.cleanup());

async function countersignedSchemeWithParcels() {
  const schemeId = (await createTestScheme(designerId)).id;
  await importParcelRegister({ user: liaison, schemeId, bytes: demoParcelsCsv(), originalName: 'parcels.csv' });
  const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
  return { schemeId, revisionId: revision.id };
}

const generate = (schemeId: string, revisionId: string, stopAt?: 'batch-recorded') => runInChildProcess({ use: 'generate-letters', user: liaison, schemeId, revisionId, stopAt } satisfies FaultJob, db.file);
const send = (batchId: string, stopAt?: { point: 'before-delivery' | 'after-delivery'; letter: number }) => runInChildProcess({ use: 'send-batch', user: liaison, batchId, max: 20, stopAt } satisfies FaultJob, db.file);

async function batchReadyToSend(): Promise<{ batchId: string; letters: Letter[] }> {
  const { schemeId, revisionId } = await countersignedSchemeWithParcels();
  const made = await generate(schemeId, revisionId);
  const batchId = (made.result as { batchId: string } | null)?.batchId;
  if (!batchId) throw new Error(`generating failed: ${made.output}`);
  const letters = await Letter.findAll({ where: { batchId }, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
  expect(letters.length).toBeGreaterThanOrEqual(3);
  return { batchId, letters };
}

const statuses = async (batchId: string) => (await Letter.findAll({ where: { batchId }, order: [['createdAt', 'ASC'], ['id', 'ASC']] })).map((l) => l.status);

async function expectEachLetterSentOnce(batchId: string) {
  expect(new Set(await statuses(batchId))).toEqual(new Set(['sent']));
  expect(new Set((await messagesPerLetter(batchId)).values())).toEqual(new Set([1]));
  expect((await LetterBatch.findByPk(batchId))?.status).toBe('complete');
  expect(await auditChainBreaks()).toEqual([]);
}

describe('the server killed while making a batch of letters', () => {
  it('after the PDFs are written but before the batch commits records nothing; the retry makes one batch of first versions', async () => {
    const { schemeId, revisionId } = await countersignedSchemeWithParcels();
    const before = await tableSnapshot();

    const killed = await generate(schemeId, revisionId, 'batch-recorded');
    expect(killed.stoppedAt, killed.output).toBe('batch-recorded');
    expect(await tableSnapshot()).toEqual(before);
    expect(await auditChainBreaks()).toEqual([]);
    // Its PDFs stay behind unrecorded: never served, since every download goes through a letter row.
    const leftovers = await orphanLetterFiles();
    expect(leftovers.length).toBeGreaterThan(0);

    const retry = await generate(schemeId, revisionId);
    expect(retry.error, retry.output).toBeNull();
    const batches = await LetterBatch.findAll({ where: { revisionId } });
    expect(batches.length).toBe(1);
    const letters = await Letter.findAll({ where: { batchId: batches[0].id } });
    expect(letters.length).toBe((retry.result as { letters: number }).letters);
    expect(letters.map((l) => l.version)).toEqual(letters.map(() => 1));
    expect(letters.every((l) => !leftovers.includes(l.pdfPath ?? ''))).toBe(true);
    expect(await AuditEvent.count({ where: { action: 'letters.generated', entityId: batches[0].id } })).toBe(1);
    expect(await auditChainBreaks()).toEqual([]);

    // At the next start the killed run's PDFs (landowners' names and addresses) are removed; the recorded ones stay.
    const swept = await sweepUnreferencedFiles({ graceMs: 0 });
    expect(swept.letters.sort()).toEqual(leftovers.map((f) => f.split('/').pop()).sort());
    expect(await orphanLetterFiles()).toEqual([]);
    expect(letters.every((l) => existsSync(l.pdfPath ?? ''))).toBe(true);
  });
});

describe('the server killed while sending a batch', () => {
  it('with a letter claimed but not yet handed to the mail server: the retry sends it, and every letter exactly once', async () => {
    const { batchId, letters } = await batchReadyToSend();

    const killed = await send(batchId, { point: 'before-delivery', letter: 3 });
    expect(killed.stoppedAt, killed.output).toBe('before-delivery 3');
    expect((await statuses(batchId)).slice(0, 3)).toEqual(['sent', 'sent', 'sending']);
    expect([...(await messagesPerLetter(batchId)).values()].slice(0, 3)).toEqual([1, 1, 0]);
    expect(await auditChainBreaks()).toEqual([]);

    const retry = await send(batchId);
    expect(retry.error, retry.output).toBeNull();
    await expectEachLetterSentOnce(batchId);
    const third = letters[2].id;
    expect((await AuditEvent.findAll({ where: { entityId: third }, order: [['id', 'ASC']] })).map((e) => e.action)).toEqual(['letter.requeued', 'letter.sent']);
  });

  it('after the mail server accepted a letter but before its outcome was recorded: the retry marks it sent without sending it again', async () => {
    const { batchId, letters } = await batchReadyToSend();

    const killed = await send(batchId, { point: 'after-delivery', letter: 3 });
    expect(killed.stoppedAt, killed.output).toBe('after-delivery 3');
    expect((await statuses(batchId)).slice(0, 3)).toEqual(['sent', 'sent', 'sending']);
    expect([...(await messagesPerLetter(batchId)).values()].slice(0, 3)).toEqual([1, 1, 1]);

    const retry = await send(batchId);
    expect(retry.error, retry.output).toBeNull();
    await expectEachLetterSentOnce(batchId);
    const recovered = await AuditEvent.findAll({ where: { entityId: letters[2].id } });
    expect(recovered.map((e) => [e.action, JSON.parse(e.detailsJson)])).toEqual([['letter.sent', { recovered: true }]]);

    const outbox = await OutboxMessage.count();
    const again = await send(batchId);
    expect(again.error, again.output).toBeNull();
    expect(await OutboxMessage.count()).toBe(outbox);
  });
});
