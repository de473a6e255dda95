import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as printLetters } from '@/app/api/letters/batches/[id]/print/route';
import { generateLettersAction, markPostedAction, resendLetterAction, withdrawBatchAction } from '@/app/(portal)/liaison/[id]/letters/actions';
import { AuditEvent, Letter, LetterBatch, Parcel, database } from '@/lib/db';
import { sendLetterBatch } from '@/lib/letters/send-letter-batch';
import { type LocalSmtpServer, startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { createTestRevision, createTestScheme, demoParcelsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let smtp: LocalSmtpServer;
let liaison: Awaited<ReturnType<typeof createTestUser>>['sessionUser'];
let designerId: string;
let checkerId: string;

/** The demo register with the e-mail address taken off the given parcels: their letters go by post. */
function csvWithoutEmail(references: string[]): Buffer {
  const lines = demoParcelsCsv().toString('utf8').trimEnd().split('\n');
  return Buffer.from(lines.map((line) => (references.some((r) => line.startsWith(`${r},`)) ? line.replace(/,[^,@]+@[^,]+,/, ',,') : line)).join('\n'));
}

async function schemeReady(postal = 2) {
  const schemeId = (await createTestScheme(designerId)).id;
  signedInAs(liaison);
  const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
  expect((await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(demoParcelsCsv()), headers: { 'x-file-name': 'parcels.csv' } })).status).toBe(201);
  const affected = (await computeParcelImpact({ user: liaison, schemeId })).rows.filter((r) => r.category === 'affected').map((r) => r.parcel.reference);
  const byPost = affected.slice(0, postal);
  if (postal > 0) expect((await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(csvWithoutEmail(byPost)), headers: { 'x-file-name': 'parcels.csv' } })).status).toBe(201);
  return { schemeId, revisionId: revision.id, affected, byPost };
}

async function generate(input: { schemeId: string; revisionId: string; parcelReferences?: string[] }) {
  const result = await generateLettersAction(input);
  if (!result.ok) throw new Error(result.error);
  return result.data;
}

const lettersOf = async (batchId: string) => {
  database();
  const letters = await Letter.findAll({ where: { batchId } });
  const references = new Map((await Parcel.findAll({ where: { id: letters.map((l) => l.parcelId) } })).map((p) => [p.id, p.reference]));
  return letters.map((l) => Object.assign(l, { reference: references.get(l.parcelId)! }));
};

const sendAll = async (batchId: string) => {
  for (let i = 0; i < 20; i++) {
    const p = await sendLetterBatch({ user: liaison, batchId, input: { max: 5, retryFailed: false } });
    if (p.counts.queued === 0 && p.counts.sending === 0) return p;
  }
  throw new Error('the batch never finished');
};

beforeAll(async () => {
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  smtp = await startLocalSmtpServer(0);
  liaison = (await createTestUser('liaison')).sessionUser;
  designerId = (await createTestUser('designer')).user.id;
  checkerId = (await createTestUser('checker')).user.id;
});
afterAll(async () => {
  signedInAs(null);
  await stopLocalSmtpServer();
  await db.cleanup();
  void smtp;
});

describe('a batch made by mistake', () => {
  it('is withdrawn before anything is sent: its letters are kept as withdrawn, and new letters can then be made', async () => {
    const { schemeId, revisionId, affected } = await schemeReady(0);
    const { batchId } = await generate({ schemeId, revisionId });
    const withdrawn = await withdrawBatchAction({ batchId });
    expect(withdrawn).toMatchObject({ ok: true, data: { withdrawn: affected.length } });
    expect((await LetterBatch.findByPk(batchId))?.status).toBe('withdrawn');
    expect(new Set((await lettersOf(batchId)).map((l) => l.status))).toEqual(new Set(['withdrawn']));
    const progress = await sendLetterBatch({ user: liaison, batchId, input: { max: 5, retryFailed: false } });
    expect(progress.counts.sent).toBe(0);
    expect(await AuditEvent.count({ where: { action: 'letters.batch-withdrawn', entityId: batchId } })).toBe(1);
    const again = await generate({ schemeId, revisionId });
    expect((await lettersOf(again.batchId)).every((l) => l.version === 2 && l.status === 'queued')).toBe(true);
  });

  it('cannot be withdrawn once one of its letters has gone, and changes nothing when refused', async () => {
    const { schemeId, revisionId } = await schemeReady(0);
    const { batchId } = await generate({ schemeId, revisionId });
    await sendLetterBatch({ user: liaison, batchId, input: { max: 1, retryFailed: false } });
    const statuses = async () => (await lettersOf(batchId)).map((l) => `${l.id} ${l.status}`).sort();
    const [before, counts] = [await statuses(), await tableSnapshot()];
    const refused = await withdrawBatchAction({ batchId });
    expect(refused).toMatchObject({ ok: false, error: expect.stringMatching(/already gone out/) });
    expect(await statuses()).toEqual(before);
    expect(await tableSnapshot()).toEqual(counts);
    expect((await LetterBatch.findByPk(batchId))?.status).not.toBe('withdrawn');
  });
});

describe('choosing parcels, and letters to post', () => {
  it('writes only to the parcels chosen, and refuses a parcel the revision does not affect, naming it', async () => {
    const { schemeId, revisionId, affected } = await schemeReady(0);
    const refused = await generateLettersAction({ schemeId, revisionId, parcelReferences: [affected[0], 'HM-99'] });
    expect(refused).toMatchObject({ ok: false, issues: [{ path: 'parcelReferences', message: expect.stringContaining('HM-99') }] });
    expect(await LetterBatch.count({ where: { schemeId } })).toBe(0);
    const made = await generate({ schemeId, revisionId, parcelReferences: affected.slice(1, 3) });
    expect((await lettersOf(made.batchId)).map((l) => l.reference).sort()).toEqual(affected.slice(1, 3).sort());
  });

  it('lists a parcel without e-mail as a letter to post, prints those in one PDF with the address on separate lines, and marks them posted', async () => {
    const { schemeId, revisionId, affected, byPost } = await schemeReady(2);
    const made = await generate({ schemeId, revisionId });
    expect(made).toMatchObject({ letters: affected.length, toPost: 2 });
    const progress = await sendAll(made.batchId);
    expect(progress.counts).toMatchObject({ sent: affected.length - 2, 'to-post': 2, failed: 0 });

    const response = await printLetters(new Request(`http://localhost/api/letters/batches/${made.batchId}/print`), { params: Promise.resolve({ id: made.batchId }) });
    expect(response.status).toBe(200);
    const file = path.join(mkdtempSync(path.join(tmpdir(), 'sillmark-print-')), 'to-post.pdf');
    writeFileSync(file, Buffer.from(await response.arrayBuffer()));
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
    const parcels = await Parcel.findAll({ where: { schemeId, reference: byPost } });
    for (const parcel of parcels) {
      const lines = text.split('\n').map((l) => l.trim());
      const at = lines.indexOf(parcel.ownerName);
      expect(at, parcel.ownerName).toBeGreaterThanOrEqual(0);
      // Each part of the one-line register address on a line of its own, in order, under the name.
      const parts = parcel.postalAddress.split(',').map((p) => p.trim());
      expect(lines.slice(at + 1, at + 1 + parts.length)).toEqual(parts);
    }
    expect(text.match(/Please respond by:/g)).toHaveLength(2);

    const [letter] = (await lettersOf(made.batchId)).filter((l) => l.status === 'to-post');
    const early = await markPostedAction({ letterId: letter.id, postedOn: '2020-01-01' });
    expect(early).toMatchObject({ ok: false, issues: [{ path: 'postedOn', message: expect.stringMatching(/on or after/) }] });
    const today = new Date().toISOString().slice(0, 10);
    expect(await markPostedAction({ letterId: letter.id, postedOn: today })).toMatchObject({ ok: true });
    expect(await letter.reload()).toMatchObject({ status: 'posted', postedOn: today });
    expect(await markPostedAction({ letterId: letter.id, postedOn: today })).toMatchObject({ ok: false, error: expect.stringMatching(/posted already/) });
  });

  it('sends one failed letter again when asked', async () => {
    const { schemeId, revisionId } = await schemeReady(0);
    const { batchId } = await generate({ schemeId, revisionId });
    const [refused] = await lettersOf(batchId);
    const address = refused.recipientEmail;
    await refused.update({ recipientEmail: 'former.owner@weirmeadow.invalid' });
    await sendAll(batchId);
    expect((await refused.reload()).status).toBe('failed');
    await refused.update({ recipientEmail: address });
    expect(await resendLetterAction({ letterId: refused.id })).toMatchObject({ ok: true, data: { batchId } });
    expect((await refused.reload()).status).toBe('queued');
    await sendAll(batchId);
    expect((await refused.reload()).status).toBe('sent');
    expect(await resendLetterAction({ letterId: refused.id })).toMatchObject({ ok: false, error: expect.stringMatching(/Only a letter that failed/) });
  });
});
