import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { simpleParser } from 'mailparser';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Letter, LetterBatch, OutboxMessage, database } from '@/lib/db';
import { letterMessageId } from '@/lib/letters/letter-delivery';
import { listLetterTracking } from '@/lib/letters/list-letter-tracking';
import { sendLetterBatch } from '@/lib/letters/send-letter-batch';
import { type LocalSmtpServer, startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { sendMail } from '@/lib/mail/send-mail';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { generateLettersAction } from '@/app/(portal)/liaison/[id]/letters/actions';
import { logLetterResponseAction } from '@/app/(portal)/liaison/[id]/letters/[letterId]/actions';
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

const sha256 = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const letterFiles = () => readdirSync(path.join(path.dirname(db.file), 'letters')).sort();

async function schemeReady(status: 'countersigned' | 'draft' = 'countersigned') {
  const schemeId = (await createTestScheme(designerId)).id;
  signedInAs(liaison);
  expect((await callRoute('parcels/[id]/csv', 'POST', { id: schemeId, body: new Uint8Array(demoParcelsCsv()), headers: { 'x-file-name': 'parcels.csv' } })).status).toBe(201);
  const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId: status === 'countersigned' ? checkerId : undefined, status });
  const affected = (await computeParcelImpact({ user: liaison, schemeId })).rows.filter((r) => r.category === 'affected');
  return { schemeId, revisionId: revision.id, affected };
}

async function generate(schemeId: string, revisionId: string): Promise<string> {
  const result = await generateLettersAction({ schemeId, revisionId });
  if (!result.ok) throw new Error(result.error);
  return result.data.batchId;
}

/** What the fake SMTP server received for each letter: the messages carrying its Message-ID. */
async function receivedFor(letterId: string) {
  database();
  return OutboxMessage.findAll({ where: { messageId: letterMessageId(letterId) } });
}

async function sendAll(batchId: string, deliver?: Parameters<typeof sendLetterBatch>[0]['deliver']) {
  for (let i = 0; i < 20; i++) {
    const progress = await sendLetterBatch({ user: liaison, batchId, input: { max: 3, retryFailed: false }, deliver });
    if (progress.counts.queued === 0 && progress.counts.sending === 0) return progress;
  }
  throw new Error('the batch never finished');
}

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
});

describe('letters from a countersigned revision', () => {
  it('makes one PDF letter per affected parcel, with the engine’s numbers, the caution and no watermark', async () => {
    const { schemeId, revisionId, affected } = await scheme();
    const batchId = await generate(schemeId, revisionId);
    database();
    const letters = await Letter.findAll({ where: { batchId } });
    expect(letters).toHaveLength(affected.length);
    expect(letters.every((l) => l.status === 'queued' && !l.preliminary && l.version === 1)).toBe(true);
    const first = letters.find((l) => JSON.parse(l.impactJson).parcel.reference === 'HM-02')!;
    const pdf = readFileSync(first.pdfPath!);
    expect(sha256(pdf)).toBe(first.pdfSha256);
    const text = execFileSync('pdftotext', ['-layout', first.pdfPath!, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    const oneInHundred = affected.find((r) => r.parcel.reference === 'HM-02')!.events[1];
    expect(text).toContain('Edith Lowther');
    expect(text).toContain(`by up to ${oneInHundred.maxAfflux.toFixed(2)} m`);
    expect(text).toMatch(/estimates, calculated by Manning's equation/);
    expect(text).toMatch(/never replace, the judgement of a licensed engineer/);
    expect(text).not.toContain('PRELIMINARY');
  });

  it('sends them with progress: the fake SMTP server gets one message per affected parcel with that letter’s PDF attached', async () => {
    const { schemeId, revisionId, affected } = await scheme();
    const batchId = await generate(schemeId, revisionId);
    signedInAs(liaison);
    const firstChunk = await callRoute('letters/batches/[id]/send', 'POST', { id: batchId, json: { max: 2 } });
    expect(firstChunk.status).toBe(200);
    expect((await firstChunk.json()).counts).toMatchObject({ sent: 2, queued: affected.length - 2 });
    const progress = await sendAll(batchId);
    expect(progress.counts.sent).toBe(affected.length);
    expect((await LetterBatch.findByPk(batchId))?.status).toBe('complete');
    for (const letter of await Letter.findAll({ where: { batchId } })) {
      const received = await receivedFor(letter.id);
      expect(received).toHaveLength(1);
      const mail = await simpleParser(readFileSync(received[0].rawPath));
      expect(received[0].envelopeTo).toBe(letter.recipientEmail);
      expect(mail.attachments).toHaveLength(1);
      expect(mail.attachments[0].contentType).toBe('application/pdf');
      expect(sha256(mail.attachments[0].content)).toBe(letter.pdfSha256);
      expect(letter).toMatchObject({ status: 'sent', messageId: letterMessageId(letter.id) });
    }
  });

  it('never sends a letter twice when a send is interrupted and resumed', async () => {
    const { schemeId, revisionId, affected } = await scheme();
    const batchId = await generate(schemeId, revisionId);
    const letters = await Letter.findAll({ where: { batchId }, order: [['createdAt', 'ASC'], ['id', 'ASC']] });
    // A run that died after the server accepted one letter and before it was recorded, and another that died before sending:
    await Letter.update({ status: 'sending' }, { where: { id: [letters[0].id, letters[1].id] } });
    await sendMail({ to: letters[0].recipientEmail!, subject: 'accepted before the crash', text: 'x', messageId: letterMessageId(letters[0].id) });
    // …and in this run the connection drops after the server has taken the third letter: the client never hears "accepted".
    let calls = 0;
    const losesOneReply = async (message: Parameters<typeof sendMail>[0]) => {
      const sent = await sendMail(message);
      if (++calls === 1) throw new Error('Connection closed unexpectedly');
      return sent;
    };
    const resumed = await sendLetterBatch({ user: liaison, batchId, input: { max: 2, retryFailed: false }, deliver: losesOneReply });
    expect(resumed.counts.sending).toBe(0);
    await sendAll(batchId);
    await sendAll(batchId);
    for (const letter of await Letter.findAll({ where: { batchId } })) {
      expect(letter.status, letter.id).toBe('sent');
      expect(await receivedFor(letter.id)).toHaveLength(1);
    }
    expect(await OutboxMessage.count({ where: { messageId: letters.map((l) => letterMessageId(l.id)) } })).toBe(affected.length);
  });

  it('records a refused recipient and a parcel without e-mail as failed with the reason, and logs a landowner’s response', async () => {
    const { schemeId, revisionId } = await scheme();
    const batchId = await generate(schemeId, revisionId);
    const [refused, byPost, ...rest] = await Letter.findAll({ where: { batchId } });
    await refused.update({ recipientEmail: 'former.owner@weirmeadow.invalid' });
    await byPost.update({ recipientEmail: null });
    await sendAll(batchId);
    expect(await refused.reload()).toMatchObject({ status: 'failed', failureReason: expect.stringMatching(/does not exist/) });
    expect(await byPost.reload()).toMatchObject({ status: 'failed', failureReason: expect.stringMatching(/No e-mail address.*post it/) });
    expect(await receivedFor(byPost.id)).toHaveLength(0);
    signedInAs(liaison);
    // A response cannot predate its letter, which was sent just now.
    const logged = await logLetterResponseAction({ letterId: rest[0].id, receivedOn: new Date().toISOString().slice(0, 10), responseType: 'question', channel: 'telephone', summary: 'Telephoned: worried about the gateway at the lower end.' });
    expect(logged).toMatchObject({ ok: true });
    expect((await rest[0].reload()).status).toBe('acknowledged');
    const tracking = await listLetterTracking({ user: liaison, schemeId });
    const tracked = tracking.parcels.flatMap((p) => p.letters).find((l) => l.id === rest[0].id);
    expect(tracked).toMatchObject({ status: 'acknowledged', responses: 1, version: 1, revisionNumber: 1 });
  });

  it('refuses to make new letters while some are still queued, or when no parcel is affected, storing nothing', async () => {
    const { schemeId, revisionId } = await scheme();
    await generate(schemeId, revisionId);
    const before = await tableSnapshot();
    const files = letterFiles();
    expect(await generateLettersAction({ schemeId, revisionId })).toMatchObject({ ok: false, status: 409 });
    const bare = await createTestScheme(designerId);
    const bareRevision = await createTestRevision({ schemeId: bare.id, authorId: designerId, checkerId, status: 'countersigned' });
    const far = 'parcel_reference,owner_name,postal_address,email,distance_from_m,distance_to_m,bank_side\nFAR-1,Far Owner,Far Away,far@owner.test,7000,7100,left\n';
    expect((await callRoute('parcels/[id]/csv', 'POST', { id: bare.id, body: far })).status).toBe(201);
    const withRegister = await tableSnapshot();
    expect(await generateLettersAction({ schemeId: bare.id, revisionId: bareRevision.id })).toMatchObject({ ok: false, status: 422, error: expect.stringMatching(/No parcel is affected/) });
    expect(await tableSnapshot()).toEqual(withRegister);
    expect(letterFiles()).toEqual(files);
  });

  it('makes the next version of each letter once the first batch is sent', async () => {
    const { schemeId, revisionId } = await scheme();
    await sendAll(await generate(schemeId, revisionId));
    const second = await generate(schemeId, revisionId);
    expect((await Letter.findAll({ where: { batchId: second } })).every((l) => l.version === 2)).toBe(true);
  });
});

describe('letters from a draft', () => {
  it('are watermarked PRELIMINARY, and say so in the e-mail subject', async () => {
    const { schemeId, revisionId } = await scheme('draft');
    const batchId = await generate(schemeId, revisionId);
    const letter = (await Letter.findOne({ where: { batchId } }))!;
    expect(letter.preliminary).toBe(true);
    const text = execFileSync('pdftotext', [letter.pdfPath!, '-'], { encoding: 'utf8' });
    expect(text).toContain('PRELIMINARY');
    await sendLetterBatch({ user: liaison, batchId, input: { max: 1, retryFailed: false } });
    const [received] = await receivedFor(letter.id);
    expect(received.subject).toMatch(/^PRELIMINARY: /);
  });
});

const scheme = schemeReady;
