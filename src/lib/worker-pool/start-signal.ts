// The worker's side of a bounded pool's time limit (bounded-pool.ts), kept apart so that a worker bundle takes in
// nothing of the pool itself.
import type { MessagePort } from 'node:worker_threads';

/** Every task carries the port its worker tells when it starts the work. */
export interface StartSignal {
  started: MessagePort;
}

/** Called by the worker first: from here the job's time limit counts, not from when it joined the queue. */
export function startedWork({ started }: StartSignal): void {
  started.postMessage('started');
  started.close();
}
