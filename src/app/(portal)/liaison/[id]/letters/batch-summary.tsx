import type { BatchProgress } from '@/lib/letters/batch-progress';
import { LocalTime } from '@/components/ui/local-time';

/** The batch's heading: when it was made, from which revision, and whether its figures are preliminary. */
export function BatchSummary({ data }: { data: BatchProgress }) {
  return (
    <h3 className="font-semibold">
      Made <LocalTime iso={data.createdAt} /> from revision <span className="num">{data.revisionNumber}</span>
      {data.preliminary ? <span className="ml-2 text-xs font-semibold text-verdict-caution">PRELIMINARY</span> : null}
      {data.status === 'withdrawn' ? <span className="ml-2 text-xs font-semibold text-ink-soft">WITHDRAWN</span> : null}
    </h3>
  );
}
