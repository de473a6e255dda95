import type { RevisionReview } from '@/lib/review/list-review-comments';
import { REVIEW_PART_LABELS } from '@/lib/validation/check-schemas';
import { StatusLabel } from '@/components/ui/status-label';
import { portalTime } from '@/lib/dates/portal-time';

/** Each review of a revision: its checker, decision, summary and comments by part. */
export function ReviewThread({ reviews, empty }: { reviews: RevisionReview[]; empty: string }) {
  if (reviews.length === 0) return <p className="text-sm text-ink-soft">{empty}</p>;
  return (
    <ol className="space-y-4">
      {reviews.map((r) => (
        <li key={r.id} className="rounded border border-paper-edge bg-white/60 p-4">
          <p className="flex flex-wrap items-center gap-2 text-sm">
            <span className="font-semibold">{r.checker}</span>
            {r.decision ? <StatusLabel status={r.decision} /> : <StatusLabel status="in check" />}
            {r.decidedAt ? <span className="num text-xs text-ink-faint">{portalTime(r.decidedAt)}</span> : null}
          </p>
          {r.summary ? <p className="mt-2 whitespace-pre-wrap text-sm">{r.summary}</p> : null}
          {r.comments.length ? (
            <ul className="mt-3 space-y-2">
              {r.comments.map((c) => (
                <li key={c.id} className="border-l-2 border-accent pl-3 text-sm">
                  <p className="text-xs text-ink-soft">{REVIEW_PART_LABELS[c.part]} · <span className="num">{portalTime(c.createdAt)}</span></p>
                  <p className="whitespace-pre-wrap">{c.body}</p>
                </li>
              ))}
            </ul>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
