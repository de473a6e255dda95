import 'server-only';
import { createHash } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { SignInAttempt, database } from '@/lib/db';
import { ThrottledError } from '@/lib/http/app-errors';
import { THROTTLE_RULES, describeWait, startsRestriction, waitMs, withFailure, type ThrottleScope } from './throttle-rules';

export interface AttemptKey {
  scope: ThrottleScope;
  subject: string;
}

export interface Reservation {
  keys: AttemptKey[];
  /** Each key's failures in its window once this attempt is counted. */
  failures: number[];
}

const REFUSALS: Record<ThrottleScope, (wait: string) => string> = {
  'account-client': (wait) => `Too many failed sign-ins for this account from this computer. Try again in ${wait}.`,
  account: (wait) => `This account has had many failed sign-ins. Wait ${wait}, then try again.`,
  client: (wait) => `Too many failed sign-ins from this network. Try again in ${wait}.`,
  countersign: (wait) => `Too many wrong passwords while countersigning or revoking. Try again in ${wait}.`,
};

// Within one process the reservations queue here rather than on SQLite's lock: hundreds of parallel attempts would
// otherwise each hold a libuv thread in the busy wait and starve the transaction that holds the lock (sqlite-driver.ts).
// Between processes, the IMMEDIATE transaction still makes each reservation atomic.
const shared = globalThis as unknown as { sillmarkThrottleQueue?: Promise<unknown> };
function oneAtATime<T>(task: () => Promise<T>): Promise<T> {
  const run = (shared.sillmarkThrottleQueue ?? Promise.resolve()).then(task, task);
  shared.sillmarkThrottleQueue = run.catch(() => undefined);
  return run;
}

function storageKey({ scope, subject }: AttemptKey): string {
  return createHash('sha256').update(`${scope}\u0000${subject}`).digest('hex');
}

/**
 * Counts the attempt as failed *before* the password is checked, in one IMMEDIATE transaction, so parallel guesses
 * queue on SQLite's write lock and no more than the limit ever reach the check. When any scope must wait, the attempt
 * is refused and nothing is stored. A correct password later refunds the count (settleSuccess).
 */
export async function reserveAttempt(keys: AttemptKey[], now: number): Promise<Reservation> {
  const sequelize = database();
  return oneAtATime(() => sequelize.transaction(async (transaction) => {
    const rows = await Promise.all(keys.map((key) => SignInAttempt.findByPk(storageKey(key), { transaction })));
    const waits = keys.map((key, i) => ({ scope: key.scope, ms: waitMs(THROTTLE_RULES[key.scope], rows[i], now) }));
    const longest = waits.reduce((a, b) => (b.ms > a.ms ? b : a));
    if (longest.ms > 0) throw new ThrottledError(REFUSALS[longest.scope](describeWait(longest.ms)));
    const failures: number[] = [];
    for (const [i, key] of keys.entries()) {
      const next = withFailure(THROTTLE_RULES[key.scope], rows[i], now);
      await SignInAttempt.upsert({ key: storageKey(key), scope: key.scope, ...next }, { transaction });
      failures.push(next.failures);
    }
    return { keys, failures };
  }));
}

/** The scopes whose lock or wait this failed attempt started (for the audit trail). */
export function restrictionsStarted(reservation: Reservation): ThrottleScope[] {
  return reservation.keys.filter((key, i) => startsRestriction(THROTTLE_RULES[key.scope], reservation.failures[i])).map((key) => key.scope);
}

/** The password was right: locks of these keys are cleared, and the slowed-down scopes get this attempt back. */
export async function settleSuccess(reservation: Reservation, transaction: Transaction): Promise<void> {
  const locks = reservation.keys.filter((key) => THROTTLE_RULES[key.scope].kind === 'lock').map(storageKey);
  const slowed = reservation.keys.filter((key) => THROTTLE_RULES[key.scope].kind === 'slow-down').map(storageKey);
  if (locks.length) await SignInAttempt.destroy({ where: { key: { [Op.in]: locks } }, transaction });
  if (slowed.length) await SignInAttempt.decrement('failures', { by: 1, where: { key: { [Op.in]: slowed }, failures: { [Op.gt]: 0 } }, transaction });
}
