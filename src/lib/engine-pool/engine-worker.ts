// The entry of each engine worker thread. Bundled to one plain .mjs file by src/cli/build-engine-worker.mjs, because
// neither Next's server bundle nor vitest can hand a TypeScript file to a worker thread.
import type { MessagePort } from 'node:worker_threads';
import { evaluateCase } from '@/lib/hydraulics';
import type { CaseInput } from '@/lib/validation/case-schema';
import { type EngineOutcome, outcomeOfError } from './engine-outcome';

export interface EngineTask {
  caseInput: CaseInput;
  /** Told when the work starts, so that the time limit counts the run and not the wait in the queue. */
  started: MessagePort;
}

export default function evaluateInWorker({ caseInput, started }: EngineTask): EngineOutcome {
  started.postMessage('started');
  started.close();
  try {
    return { ok: true, resultJson: JSON.stringify(evaluateCase(caseInput)) };
  } catch (error) {
    return outcomeOfError(error);
  }
}
