// The entry of each engine worker thread. Bundled to one plain .mjs file by src/cli/build-engine-worker.mjs, because
// neither Next's server bundle nor vitest can hand a TypeScript file to a worker thread.
import { move, transferableSymbol, valueSymbol } from 'piscina';
import { evaluateCase, structureRating } from '@/lib/hydraulics';
import type { CaseInput } from '@/lib/validation/case-schema';
import { type StartSignal, startedWork } from '@/lib/worker-pool/start-signal';
import { type EngineOutcome, outcomeOfError } from './engine-outcome';

export interface EngineTask extends StartSignal {
  caseInput: CaseInput;
  /** What to work out: the whole case (the default), or only the structure's rating across the events. */
  job?: 'case' | 'rating';
}

const utf8 = new TextEncoder();

/** The outcome with its bytes' buffer in piscina's transfer list: a nested buffer is otherwise cloned. */
function movedBytes(resultJson: Uint8Array): EngineOutcome {
  const outcome: EngineOutcome = { ok: true, resultJson };
  return move({ [transferableSymbol]: [resultJson.buffer], [valueSymbol]: outcome }) as unknown as EngineOutcome;
}

export default function evaluateInWorker(task: EngineTask): EngineOutcome {
  startedWork(task);
  const { caseInput, job = 'case' } = task;
  try {
    return movedBytes(utf8.encode(JSON.stringify(job === 'rating' ? structureRating(caseInput) : evaluateCase(caseInput))));
  } catch (error) {
    return outcomeOfError(error);
  }
}
