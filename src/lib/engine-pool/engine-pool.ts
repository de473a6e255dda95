import 'server-only';
import os from 'node:os';
import path from 'node:path';
import { AppError, ThrottledError } from '@/lib/http/app-errors';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { StructureRating } from '@/lib/hydraulics/structure-rating';
import { ENGINE_VERSION } from '@/lib/hydraulics/version';
import type { CaseInput } from '@/lib/validation/case-schema';
import { boundedPool, positiveInteger } from '@/lib/worker-pool/bounded-pool';
import { engineErrorOf, type EngineOutcome } from './engine-outcome';
import type { EngineTask } from './engine-worker';
import { caseTooLarge, caseTooSlow } from './too-large';

// The engine is CPU-bound and synchronous: on the request thread one large case would hold every other request.
// So it runs on worker threads (src/lib/worker-pool/bounded-pool.ts), by default one per core but one (at least one),
// with a bounded queue and a time limit per job, at a lower scheduling priority (nice). One core is left to the
// request thread, so that with the engine saturated quick requests need not win the CPU back from the workers: on two
// cores the Harrowfield check takes some 15 ms of engine time, while the portal answers an evaluation at a few tens a
// second, so one worker keeps up.

const THREADS = positiveInteger(process.env.ENGINE_THREADS) ?? Math.max(1, os.availableParallelism() - 1);
/** Counted from the moment a worker starts the job, not from when it joined the queue. */
export const ENGINE_TIME_LIMIT_MS = positiveInteger(process.env.ENGINE_TIME_LIMIT_MS) ?? 30_000;
// 32 cases waiting per core, as when every core had a worker: fewer workers must not turn more callers away.
const QUEUE_LIMIT = positiveInteger(process.env.ENGINE_QUEUE_LIMIT) ?? os.availableParallelism() * 32;
const RETRY_AFTER_SECONDS = 5;
const utf8 = new TextDecoder();

/** Built by src/cli/build-engine-worker.mjs; the same rule for where it lives is there. */
function workerFile(): string {
  return process.env.SILLMARK_ENGINE_WORKER || path.join(/* turbopackIgnore: true */ process.cwd(), process.env.NEXT_DIST_DIR ?? '.next', 'engine-worker.mjs');
}

const runEngineJob = boundedPool<EngineTask, EngineOutcome>({ name: 'enginePool', workerFile, threads: THREADS, queueLimit: QUEUE_LIMIT, timeLimitMs: ENGINE_TIME_LIMIT_MS });

function runOffThread(caseInput: CaseInput, cancelled?: AbortSignal, job: EngineTask['job'] = 'case'): Promise<EngineOutcome> {
  return runEngineJob(
    { caseInput, job },
    {
      cancelled,
      refusals: {
        busy: () => new ThrottledError('The engine is busy with other cases: try again in a few seconds.', RETRY_AFTER_SECONDS),
        tooSlow: () => caseTooSlow(caseInput, ENGINE_TIME_LIMIT_MS),
        outOfMemory: () => caseTooLarge(caseInput),
        cancelled: () => new AppError('The request was cancelled before the case was evaluated.', 400),
      },
    },
  );
}

/**
 * The engine's result for a parsed case, as UTF-8 JSON bytes, computed on a worker thread. Throws the engine's own errors
 * (InvalidInputError, NoPhysicalSolutionError), a 422 when the case is too large or too slow, and a 429 when busy.
 */
export async function evaluateCaseJsonOffThread(caseInput: CaseInput, cancelled?: AbortSignal): Promise<Uint8Array> {
  const outcome = await runOffThread(caseInput, cancelled);
  if (outcome.ok) return outcome.resultJson;
  if (outcome.kind === 'too-deep') throw caseTooLarge(caseInput);
  throw engineErrorOf(outcome);
}

/** As evaluateCase, but on a worker thread: the request thread stays free for other requests. */
export async function evaluateCaseOffThread(caseInput: CaseInput): Promise<CaseResult> {
  const result = JSON.parse(utf8.decode(await evaluateCaseJsonOffThread(caseInput))) as CaseResult;
  // Results are frozen with the server's engine version, so a worker bundled from older sources must not supply them.
  if (result.engineVersion !== ENGINE_VERSION) throw new Error(`The engine worker runs ${result.engineVersion}, the server ${ENGINE_VERSION}: rebuild it (npm run build).`);
  return result;
}

/** The structure's head and upstream level across the range of the case's events, on a worker thread. */
export async function structureRatingOffThread(caseInput: CaseInput): Promise<StructureRating> {
  const outcome = await runOffThread(caseInput, undefined, 'rating');
  if (outcome.ok) return JSON.parse(utf8.decode(outcome.resultJson)) as StructureRating;
  if (outcome.kind === 'too-deep') throw caseTooLarge(caseInput);
  throw engineErrorOf(outcome);
}
