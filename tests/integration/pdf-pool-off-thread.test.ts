import { readFileSync } from 'node:fs';
import path from 'node:path';
import { type IntervalHistogram, monitorEventLoopDelay } from 'node:perf_hooks';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionUser } from '@/lib/auth/current-session';
import { draftCertificate } from '@/lib/certificates/certificate-draft';
import { issueCertificate } from '@/lib/certificates/issue-certificate';
import { signCertificate } from '@/lib/certificates/sign-certificate';
import { removeCertificateFile } from '@/lib/certificates/certificate-files';
import { readSnapshot } from '@/lib/db/read-snapshot';
import { Letter, type Revision, type Scheme, type User, database } from '@/lib/db';
import { generateLetters } from '@/lib/letters/generate-letters';
import { type LetterDocument, renderLetterPdf, renderLettersForPrint } from '@/lib/letters/render-letter-pdf';
import { importParcelRegister } from '@/lib/parcels/import-parcel-register';
import { letterPdfOffThread, lettersToPostOffThread } from '@/lib/pdf-pool/render-off-thread';
import { signingIdentity } from '@/lib/signing/signing-identity';
import { createTestRevision, createTestScheme, inventedHoldingsCsv } from './support/liaison-fixtures';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// Certificates and letters are rendered on the PDF pool's worker threads; the request thread only reads and writes
// the database and the files. Measured by the request thread's own event-loop delay: a PDF rendered on this thread
// holds the loop for about as long as the render takes (checked here too, so that the measure can fail).
// One letter takes about as long as the loop's ordinary pauses (collection of garbage, the database's callbacks), so
// the yardstick is the print pack of a whole batch: every letter in one PDF.

const HOLDINGS = 24;
const PRINTED_AT = '2026-12-01T10:00:00.000Z';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let liaison: SessionUser;
let people: { scheme: Scheme; revision: Revision; designer: User; checker: User };
let earlierBatch: { document: LetterDocument; stored: Buffer }[];

async function issueCertificateRolledBack(): Promise<void> {
  const baseUrl = 'http://localhost:3000';
  const signed = await signCertificate(await readSnapshot((transaction) => draftCertificate(people, { issuedAt: new Date().toISOString(), baseUrl, transaction })));
  const transaction = await database().transaction();
  let written: string | null = null;
  try {
    await issueCertificate({ parties: people, signed, baseUrl, transaction, onFileWritten: (file) => (written = file) });
  } finally {
    await transaction.rollback();
    if (written) await removeCertificateFile(written);
  }
}

const makeBatch = () => generateLetters({ user: liaison, input: { schemeId: people.scheme.id, revisionId: people.revision.id }, baseUrl: 'http://localhost:3000' });

async function batchLetters(batchId: string): Promise<{ document: LetterDocument; stored: Buffer }[]> {
  const letters = await Letter.findAll({ where: { batchId } });
  return letters.map((l) => ({ document: JSON.parse(l.documentJson ?? 'null') as LetterDocument, stored: readFileSync(path.resolve(path.dirname(db.file), l.pdfPath ?? '')) }));
}

beforeAll(async () => {
  db = await useTestDatabase();
  liaison = (await createTestUser('liaison')).sessionUser;
  const designer = (await createTestUser('designer')).user;
  const checker = (await createTestUser('checker')).user;
  const scheme = await createTestScheme(designer.id);
  await importParcelRegister({ user: liaison, schemeId: scheme.id, bytes: inventedHoldingsCsv(HOLDINGS), originalName: 'holdings.csv' });
  const revision = await createTestRevision({ schemeId: scheme.id, authorId: designer.id, checkerId: checker.id, status: 'countersigned' });
  people = { scheme, revision, designer, checker };
  // Once through every path first: the signing identity is made (on the pool too), a worker starts and parses its
  // fonts, and this thread compiles the code around the renders. The batch is then set aside, so another may be made.
  await issueCertificateRolledBack();
  const { batchId } = await makeBatch();
  earlierBatch = await batchLetters(batchId);
  await Letter.update({ status: 'failed', failureReason: 'set aside by the test' }, { where: { batchId } });
  await renderLetterPdf(earlierBatch[0].document);
});
afterAll(async () => db.cleanup());

const nextTimers = () => new Promise((resolve) => setTimeout(resolve, 5));

/** Runs `work` with the event-loop delay monitored: the longest the loop was held, and how long `work` took, in ms. */
async function whileMonitored<T>(work: () => Promise<T>): Promise<{ value: T; longestBlockMs: number; elapsedMs: number }> {
  const histogram: IntervalHistogram = monitorEventLoopDelay({ resolution: 1 });
  histogram.enable();
  // The monitor measures from its first tick and samples at each later one: let it tick before and after the work.
  await nextTimers();
  const started = performance.now();
  try {
    const value = await work();
    const elapsedMs = performance.now() - started;
    await nextTimers();
    return { value, longestBlockMs: histogram.max / 1e6, elapsedMs };
  } finally {
    histogram.disable();
  }
}

describe('PDFs are made off the request thread', () => {
  it('keeps the event loop free while a certificate, a batch of letters and a print pack are made: never held for a tenth of the pack here', async () => {
    const documents = earlierBatch.map((l) => l.document);
    const here = await whileMonitored(() => renderLettersForPrint(documents, PRINTED_AT));
    const onPool = await whileMonitored(() => Promise.all([makeBatch(), issueCertificateRolledBack(), lettersToPostOffThread(documents, PRINTED_AT)]));
    console.log(`print pack of ${HOLDINGS} letters on the request thread: ${here.elapsedMs.toFixed(0)} ms, loop held ${here.longestBlockMs.toFixed(0)} ms at most; on the pool with a batch and a certificate: ${onPool.elapsedMs.toFixed(0)} ms, loop held ${onPool.longestBlockMs.toFixed(1)} ms at most`);

    // The measure sees a render on this thread: the loop is held for most of it.
    expect(here.longestBlockMs).toBeGreaterThan(0.5 * here.elapsedMs);
    // With all of that made on the pool meanwhile, the loop was never held for a tenth of that one PDF's render.
    expect(onPool.longestBlockMs).toBeLessThan(0.1 * here.elapsedMs);
    // The pool did the work while the loop stayed free: the same pack alone takes about as long there as here.
    expect(onPool.elapsedMs).toBeGreaterThan(0.5 * here.elapsedMs);
    const [made, , pack] = onPool.value;
    expect(made.letters).toBe(HOLDINGS);
    expect(pack.equals(here.value)).toBe(true);
  });

  it('gives the bytes the renderer gives on the request thread: the stored letters are those their documents render to here', async () => {
    expect(earlierBatch).toHaveLength(HOLDINGS);
    for (const { document, stored } of earlierBatch.slice(0, 4)) {
      const here = await renderLetterPdf(document);
      expect(stored.equals(here)).toBe(true);
      expect((await letterPdfOffThread(document)).equals(here)).toBe(true);
    }
  });
});
