import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { SessionUser } from '@/lib/auth/current-session';
import { ThrottledError, UnprocessableError } from '@/lib/http/app-errors';
import { toHttpResponse } from '@/lib/http/to-http-response';
import { Letter } from '@/lib/db';
import { generateLetters } from '@/lib/letters/generate-letters';
import type { LetterDocument } from '@/lib/letters/render-letter-pdf';
import { importParcelRegister } from '@/lib/parcels/import-parcel-register';
import { letterPdfOffThread, lettersToPostOffThread } from '@/lib/pdf-pool/render-off-thread';
import { createTestRevision, createTestScheme, inventedHoldingsCsv } from './support/liaison-fixtures';
import { callRoute } from './support/scheme-requests';
import { signedInAs } from './support/session-double';
import { tableSnapshot } from './support/table-snapshot';
import { useTestDatabase } from './support/test-database';
import { createTestUser } from './support/user-factory';

// One PDF worker and room for one waiting job, so that a third job at once finds the queue full; a 3 s limit per job.
vi.hoisted(() => {
  process.env.PDF_THREADS = '1';
  process.env.PDF_QUEUE_LIMIT = '1';
  process.env.PDF_TIME_LIMIT_MS = '3000';
});

// A batch of 30 letters to post. Each renders well inside the limit; the print pack of fifty copies of each (one PDF of
// 1500 letters) takes the worker ten seconds or more, far past it.
const HOLDINGS = 30;
const COPIES = 50;
const PRINTED_AT = '2026-12-01T10:00:00.000Z';

let db: Awaited<ReturnType<typeof useTestDatabase>>;
let batchId: string;
let documents: LetterDocument[];
beforeAll(async () => {
  db = await useTestDatabase();
  const liaison: SessionUser = (await createTestUser('liaison')).sessionUser;
  const designerId = (await createTestUser('designer')).user.id;
  const checkerId = (await createTestUser('checker')).user.id;
  const schemeId = (await createTestScheme(designerId)).id;
  await importParcelRegister({ user: liaison, schemeId, bytes: inventedHoldingsCsv(HOLDINGS, { withEmail: false }), originalName: 'holdings.csv' });
  const revision = await createTestRevision({ schemeId, authorId: designerId, checkerId, status: 'countersigned' });
  batchId = (await generateLetters({ user: liaison, input: { schemeId, revisionId: revision.id }, baseUrl: 'http://localhost:3000' })).batchId;
  documents = (await Letter.findAll({ where: { batchId } })).map((l) => JSON.parse(l.documentJson ?? 'null') as LetterDocument);
  signedInAs(liaison);
});
afterAll(async () => {
  signedInAs(null);
  await db.cleanup();
});

const hugePack = () => lettersToPostOffThread(Array.from({ length: COPIES }, () => documents).flat(), PRINTED_AT);
const refusal = (pending: Promise<unknown>) => pending.then(() => null, (error: unknown) => error);

describe('a busy PDF pool', () => {
  it('refuses a third job while one runs and one waits (503, Retry-After), and stops each of those past the time limit (422)', async () => {
    const [first, second, third] = await Promise.all([refusal(hugePack()), refusal(hugePack()), refusal(hugePack())]);
    expect(third).toBeInstanceOf(ThrottledError);
    const busy = toHttpResponse(third);
    expect(busy.status).toBe(503);
    expect(busy.headers.get('retry-after')).toBe('5');
    expect((await busy.json()).error).toBe('The server is busy making other documents: try again in a few seconds.');
    for (const stopped of [first, second]) {
      expect(stopped).toBeInstanceOf(UnprocessableError);
      expect((stopped as UnprocessableError).status).toBe(422);
      expect((stopped as Error).message).toBe("Making the letters to post took longer than 3 s, so it was stopped. Try again later; if it happens again, tell the portal's administrator.");
    }
  });

  it('answers a print request and a certificate check 503 with Retry-After while the pool is full, and records nothing', async () => {
    const before = await tableSnapshot();
    const running = [refusal(hugePack()), refusal(hugePack())];
    const upload = new FormData();
    upload.append('file', new Blob([new TextEncoder().encode('%PDF-1.3\nan uploaded certificate\n')], { type: 'application/pdf' }), 'certificate.pdf');
    // The signature of an uploaded certificate is checked on the PDF pool too, so it waits its turn there.
    for (const response of [await callRoute('letters/batches/[id]/print', 'GET', { id: batchId }), await callRoute('certificates/verification', 'POST', { body: upload })]) {
      expect(response.status).toBe(503);
      expect(response.headers.get('retry-after')).toBe('5');
      expect((await response.json()).error).toMatch(/busy making other documents/);
    }
    for (const stopped of await Promise.all(running)) expect(stopped).toBeInstanceOf(UnprocessableError);
    expect(await tableSnapshot()).toEqual(before);
  });

  it('makes the next PDF as usual once the stopped jobs have gone: the pool replaces the stopped workers', async () => {
    const pdf = await letterPdfOffThread(documents[0]);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
  });
});
