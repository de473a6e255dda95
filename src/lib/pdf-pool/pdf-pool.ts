import 'server-only';
import os from 'node:os';
import path from 'node:path';
import { MessageChannel } from 'node:worker_threads';
import Piscina from 'piscina';
import { ThrottledError, UnprocessableError } from '@/lib/http/app-errors';
import { PDF_JOB_WORDS, type PdfJob, type PdfJobKind, type PdfJobResult, type PdfTask } from './pdf-jobs';

// Rendering a PDF with pdfkit (fonts subset, pages laid out, compressed) and signing one are CPU-bound and synchronous:
// on the request thread a certificate or a batch of letters would hold every other request. So they run on worker
// threads of their own, the same shape as the engine's pool (src/lib/engine-pool/engine-pool.ts): one per core but
// one (at least one), a bounded queue, a time limit per job and a lower scheduling priority (nice).

const positiveInteger = (text: string | undefined) => (text && /^\d+$/.test(text) && Number(text) > 0 ? Number(text) : undefined);

const THREADS = positiveInteger(process.env.PDF_THREADS) ?? Math.max(1, os.availableParallelism() - 1);
/** Counted from the moment a worker starts the job, not from when it joined the queue. */
export const PDF_TIME_LIMIT_MS = positiveInteger(process.env.PDF_TIME_LIMIT_MS) ?? 120_000;
// A letter batch renders its letters one at a time, so a few waiting jobs per core cover many people at once.
const QUEUE_LIMIT = positiveInteger(process.env.PDF_QUEUE_LIMIT) ?? os.availableParallelism() * 8;
const RETRY_AFTER_SECONDS = 5;
const WORKER_NICE_INCREMENT = 10;

/** Built by src/cli/build-pdf-worker.mjs; the same rule for where it lives is there. */
function workerFile(): string {
  return process.env.SILLMARK_PDF_WORKER || path.join(/* turbopackIgnore: true */ process.cwd(), process.env.NEXT_DIST_DIR ?? '.next', 'pdf-worker.mjs');
}

interface PdfPool {
  piscina: Piscina<PdfTask, unknown>;
  /** Jobs running or waiting. Counted here: piscina's own maxQueue does not count tasks that carry an AbortSignal. */
  jobs: number;
}

const POOL_KEY = Symbol.for('sillmark.pdfPool');
type PoolHolder = { [POOL_KEY]?: PdfPool };

// Next may load this module once per route bundle; one pool per process keeps the thread count at THREADS.
function pdfPool(): PdfPool {
  const holder = globalThis as PoolHolder;
  holder[POOL_KEY] ??= {
    piscina: new Piscina<PdfTask, unknown>({ filename: workerFile(), minThreads: 1, maxThreads: THREADS, idleTimeout: 60_000, niceIncrement: WORKER_NICE_INCREMENT, resourceLimits: { maxOldGenerationSizeMb: 512 } }),
    jobs: 0,
  };
  return holder[POOL_KEY];
}

const tooSlow = (kind: PdfJobKind) => new UnprocessableError(`Making ${PDF_JOB_WORDS[kind]} took longer than ${Math.round(PDF_TIME_LIMIT_MS / 1000)} s, so it was stopped. Try again later; if it happens again, tell the portal's administrator.`);
const tooLarge = (kind: PdfJobKind) => new UnprocessableError(`Making ${PDF_JOB_WORDS[kind]} needed more memory than the server allows, so it was stopped. Tell the portal's administrator.`);

/**
 * Runs one job on a PDF worker thread. Throws 503 with Retry-After when the queue is full, and 422 when the job runs
 * past the time limit or out of memory; a fault in rendering itself comes back as the worker's error.
 */
export async function runPdfJob<J extends PdfJob>(job: J): Promise<PdfJobResult<J['kind']>> {
  const pool = pdfPool();
  if (pool.jobs >= THREADS + QUEUE_LIMIT) throw new ThrottledError('The server is busy making other documents: try again in a few seconds.', RETRY_AFTER_SECONDS, 503);
  pool.jobs += 1;
  const { port1, port2 } = new MessageChannel();
  const deadline = new AbortController();
  let timer: NodeJS.Timeout | undefined;
  port1.once('message', () => (timer = setTimeout(() => deadline.abort(), PDF_TIME_LIMIT_MS)));
  try {
    return (await pool.piscina.run({ job, started: port2 }, { transferList: [port2], signal: deadline.signal })) as PdfJobResult<J['kind']>;
  } catch (error) {
    if (deadline.signal.aborted) throw tooSlow(job.kind);
    if (error instanceof Error && 'code' in error && error.code === 'ERR_WORKER_OUT_OF_MEMORY') throw tooLarge(job.kind);
    throw error;
  } finally {
    pool.jobs -= 1;
    clearTimeout(timer);
    port1.close();
  }
}
