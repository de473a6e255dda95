import 'server-only';
import os from 'node:os';
import path from 'node:path';
import { ThrottledError, UnprocessableError } from '@/lib/http/app-errors';
import { boundedPool, positiveInteger } from '@/lib/worker-pool/bounded-pool';
import { PDF_JOB_ACTS, type PdfJob, type PdfJobResult, type PdfTask } from './pdf-jobs';

// Rendering a PDF with pdfkit (fonts subset, pages laid out, compressed), signing one and checking an uploaded one's
// signature are CPU-bound and synchronous: on the request thread a certificate or a batch of letters would hold every
// other request. So they run on worker threads of their own, the same shape as the engine's pool
// (src/lib/worker-pool/bounded-pool.ts): one per core but one (at least one), a bounded queue, a time limit per job
// and a lower scheduling priority (nice).

const THREADS = positiveInteger(process.env.PDF_THREADS) ?? Math.max(1, os.availableParallelism() - 1);
/** Counted from the moment a worker starts the job, not from when it joined the queue. */
export const PDF_TIME_LIMIT_MS = positiveInteger(process.env.PDF_TIME_LIMIT_MS) ?? 120_000;
// A letter batch renders its letters one at a time, so a few waiting jobs per core cover many people at once.
const QUEUE_LIMIT = positiveInteger(process.env.PDF_QUEUE_LIMIT) ?? os.availableParallelism() * 8;
const RETRY_AFTER_SECONDS = 5;

/** Built by src/cli/build-pdf-worker.mjs; the same rule for where it lives is there. */
function workerFile(): string {
  return process.env.SILLMARK_PDF_WORKER || path.join(/* turbopackIgnore: true */ process.cwd(), process.env.NEXT_DIST_DIR ?? '.next', 'pdf-worker.mjs');
}

const runOnPdfPool = boundedPool<PdfTask, unknown>({ name: 'pdfPool', workerFile, threads: THREADS, queueLimit: QUEUE_LIMIT, timeLimitMs: PDF_TIME_LIMIT_MS });

const busy = () => new ThrottledError('The server is busy making other documents: try again in a few seconds.', RETRY_AFTER_SECONDS, 503);

/**
 * Runs one job on a PDF worker thread; `transferList` names the buffers the job moves there (the caller loses them).
 * Throws 503 with Retry-After when the queue is full, and 422 when the job runs past the time limit or out of memory;
 * a fault in the work itself comes back as the worker's error.
 */
export async function runPdfJob<J extends PdfJob>(job: J, transferList: ArrayBuffer[] = []): Promise<PdfJobResult<J['kind']>> {
  const act = PDF_JOB_ACTS[job.kind];
  return (await runOnPdfPool(
    { job },
    {
      transferList,
      refusals: {
        busy,
        tooSlow: () => new UnprocessableError(`${act} took longer than ${Math.round(PDF_TIME_LIMIT_MS / 1000)} s, so it was stopped. Try again later; if it happens again, tell the portal's administrator.`),
        outOfMemory: () => new UnprocessableError(`${act} needed more memory than the server allows, so it was stopped. Tell the portal's administrator.`),
      },
    },
  )) as PdfJobResult<J['kind']>;
}
