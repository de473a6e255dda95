import { afterAll, beforeAll, bench, describe } from 'vitest';
import type { SessionUser } from '@/lib/auth/current-session';
import { Letter } from '@/lib/db';
import { generateLetters } from '@/lib/letters/generate-letters';
import { sendLetterBatch } from '@/lib/letters/send-letter-batch';
import { startLocalSmtpServer, stopLocalSmtpServer } from '@/lib/mail/local-smtp-server';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { importParcelRegister } from '@/lib/parcels/import-parcel-register';
import { MAX_LETTERS_PER_SEND } from '@/lib/validation/letter-schemas';
import { createTestRevision, createTestScheme, inventedHoldingsCsv } from '../integration/support/liaison-fixtures';
import { useTestDatabase } from '../integration/support/test-database';
import { createTestUser } from '../integration/support/user-factory';
import { machineDescription } from './machine';

// A batch of 100 letters: 100 invented holdings (inventedHoldingsCsv), every one affected by a countersigned
// revision of the demo case. Making renders the 100 PDFs on the PDF pool, stores them and records the
// batch; sending mails them, PDF attached, to the local SMTP server on loopback (which stores each in the outbox).

const PARCELS = 100;
const ITERATIONS = 3;
const timing = { iterations: ITERATIONS, time: 0, warmupIterations: 0, warmupTime: 0 };

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let liaison: SessionUser;
let designerId: string;
let checkerId: string;
let toMake: { schemeId: string; revisionId: string };
const toSend: string[] = [];

async function schemeWithHundredAffected() {
  const schemeId = (await createTestScheme(designerId)).id;
  await importParcelRegister({ user: liaison, schemeId, bytes: inventedHoldingsCsv(PARCELS), originalName: 'holdings.csv' });
  const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
  const affected = (await computeParcelImpact({ user: liaison, schemeId })).rows.filter((r) => r.category === 'affected').length;
  if (affected !== PARCELS) throw new Error(`expected ${PARCELS} affected holdings, the demo case affects ${affected}`);
  return { schemeId, revisionId: revision.id };
}

async function makeBatch({ schemeId, revisionId }: { schemeId: string; revisionId: string }): Promise<string> {
  return (await generateLetters({ user: liaison, input: { schemeId, revisionId }, baseUrl: 'http://localhost:3000' })).batchId;
}

beforeAll(async () => {
  console.log(`Machine: ${machineDescription()}`);
  db = await useTestDatabase();
  delete process.env.SMTP_URL;
  await startLocalSmtpServer(0);
  liaison = (await createTestUser('liaison')).sessionUser;
  designerId = (await createTestUser('designer')).user.id;
  checkerId = (await createTestUser('checker')).user.id;
  toMake = await schemeWithHundredAffected();
  // One ready batch per timed send: a batch is sent once, and vitest bench has no per-iteration set-up.
  for (let i = 0; i < ITERATIONS; i++) toSend.push(await makeBatch(await schemeWithHundredAffected()));
}, 600_000);
afterAll(async () => {
  await stopLocalSmtpServer();
  await db.cleanup();
});

describe(`a letter batch of ${PARCELS} parcels`, () => {
  bench(`make: ${PARCELS} letter PDFs rendered and stored, batch recorded`, async () => {
    const batchId = await makeBatch(toMake);
    // Set aside, so the next run may make the revision's letters again (a batch still waiting to be sent blocks it).
    await Letter.update({ status: 'failed', failureReason: 'benchmark' }, { where: { batchId } });
  }, timing);

  bench(`send: ${PARCELS} e-mails with the PDF attached to the local SMTP server on loopback`, async () => {
    const batchId = toSend.shift();
    if (!batchId) throw new Error('no batch left to send');
    for (let call = 0; call < PARCELS / MAX_LETTERS_PER_SEND + 1; call++) {
      const progress = await sendLetterBatch({ user: liaison, batchId, input: { max: MAX_LETTERS_PER_SEND, retryFailed: false } });
      if (progress.counts.queued === 0 && progress.counts.sending === 0) {
        if (progress.counts.sent !== PARCELS) throw new Error(`only ${progress.counts.sent} of ${PARCELS} letters were sent`);
        return;
      }
    }
    throw new Error('the batch did not finish sending');
  }, timing);
});
