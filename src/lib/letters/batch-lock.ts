import 'server-only';
import { ConflictError } from '@/lib/http/app-errors';

// Sillmark runs as one server process over one SQLite file, so an in-process lock is enough to let one request at a
// time send a batch. Then any letter found "sending" by the lock holder was left so by an interrupted earlier run.
const holder = globalThis as unknown as { sillmarkBatchLocks?: Set<string> };

export async function withBatchLock<T>(batchId: string, run: () => Promise<T>): Promise<T> {
  holder.sillmarkBatchLocks ??= new Set();
  const locks = holder.sillmarkBatchLocks;
  if (locks.has(batchId)) throw new ConflictError('This batch is being sent from another window or tab; its progress shows here as it goes.');
  locks.add(batchId);
  try {
    return await run();
  } finally {
    locks.delete(batchId);
  }
}
