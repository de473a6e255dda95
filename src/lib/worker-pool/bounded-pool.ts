import 'server-only';
import { MessageChannel, type TransferListItem } from 'node:worker_threads';
import Piscina from 'piscina';
import type { StartSignal } from './start-signal';

// What the engine pool and the PDF pool share: a piscina pool per process with a cap on the jobs running or waiting,
// a time limit per job counted from the moment a worker starts it (not from when it joined the queue), and the
// pool's failures turned into each pool's own errors. Each pool keeps its own settings and words.

export interface BoundedPoolSettings {
  /** One pool per process under this name: Next may load a pool's module once per route bundle. */
  name: string;
  workerFile: () => string;
  threads: number;
  /** Jobs that may wait beyond the `threads` running; one more is refused with `busy`. */
  queueLimit: number;
  timeLimitMs: number;
}

/** Each pool's own errors for the ways a job can fail around its work. */
export interface JobRefusals {
  busy: () => Error;
  tooSlow: () => Error;
  outOfMemory: () => Error;
  /** When the caller's own signal stopped the job. */
  cancelled?: () => Error;
}

export interface JobOptions {
  transferList?: TransferListItem[];
  cancelled?: AbortSignal;
  refusals: JobRefusals;
}

const WORKER_NICE_INCREMENT = 10;

interface PoolState {
  piscina: Piscina;
  /** Jobs running or waiting. Counted here: piscina's own maxQueue does not count tasks that carry an AbortSignal. */
  jobs: number;
}

function poolState(settings: BoundedPoolSettings): PoolState {
  const holder = globalThis as { [key: symbol]: PoolState | undefined };
  const key = Symbol.for(`sillmark.${settings.name}`);
  holder[key] ??= {
    piscina: new Piscina({ filename: settings.workerFile(), minThreads: 1, maxThreads: settings.threads, idleTimeout: 60_000, niceIncrement: WORKER_NICE_INCREMENT, resourceLimits: { maxOldGenerationSizeMb: 512 } }),
    jobs: 0,
  };
  return holder[key];
}

const outOfMemory = (error: unknown) => error instanceof Error && 'code' in error && error.code === 'ERR_WORKER_OUT_OF_MEMORY';

/** A function that runs one task on the pool, which is made on first use. */
export function boundedPool<Task extends StartSignal, Result>(settings: BoundedPoolSettings) {
  return async function runJob(task: Omit<Task, 'started'>, { transferList = [], cancelled, refusals }: JobOptions): Promise<Result> {
    const pool = poolState(settings);
    if (pool.jobs >= settings.threads + settings.queueLimit) throw refusals.busy();
    pool.jobs += 1;
    const { port1, port2 } = new MessageChannel();
    const deadline = new AbortController();
    let timer: NodeJS.Timeout | undefined;
    port1.once('message', () => (timer = setTimeout(() => deadline.abort(), settings.timeLimitMs)));
    try {
      // A caller that has gone away (cancelled) needs no answer: its job leaves the queue or stops.
      const signal = cancelled ? AbortSignal.any([deadline.signal, cancelled]) : deadline.signal;
      return (await pool.piscina.run({ ...task, started: port2 }, { transferList: [port2, ...transferList], signal })) as Result;
    } catch (error) {
      if (deadline.signal.aborted) throw refusals.tooSlow();
      if (cancelled?.aborted && refusals.cancelled) throw refusals.cancelled();
      if (outOfMemory(error)) throw refusals.outOfMemory();
      throw error;
    } finally {
      pool.jobs -= 1;
      clearTimeout(timer);
      port1.close();
    }
  };
}

/** A positive whole number from the environment, or undefined for the pool's default. */
export const positiveInteger = (text: string | undefined) => (text && /^\d+$/.test(text) && Number(text) > 0 ? Number(text) : undefined);
