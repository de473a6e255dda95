import type { ChainCheck } from '@/lib/audit/verify-audit-chain';
import { StatusIcon } from '@/components/ui/status-icon';
import { portalTime } from '@/lib/dates/portal-time';

/** The result of recomputing every hash of the trail as the page was drawn: a calm note, or the alarm naming the break. */
export function AuditChainStatus({ check, alarm }: { check: ChainCheck; alarm: string | null }) {
  if (check.intact) {
    return (
      <p role="status" className="mb-6 border-l-4 border-verdict-pass bg-paper-deep px-4 py-3 text-sm text-ink-soft">
        <StatusIcon name="pass" className="mr-1" />
        <strong className="font-semibold text-ink">The chain is intact.</strong> All <span className="num">{check.events}</span> events were checked just now: each one’s hash matches its contents and the event before it.
      </p>
    );
  }
  const { number, at, problem } = check.firstBreak;
  return (
    <div role="alert" className="mb-6 rounded border-2 border-verdict-fail bg-white p-4 text-sm">
      <p className="text-base font-semibold text-verdict-fail">
        <StatusIcon name="fail" className="mr-1" />{alarm ?? `The chain breaks at event ${number}.`}
      </p>
      <p className="mt-1">
        Event {number}, recorded {portalTime(at)}: {problem}. Events from {number} onwards cannot be relied on as recorded. Keep a copy of the database file as it is now and
        compare it with the latest backup before anything else changes.
      </p>
    </div>
  );
}
