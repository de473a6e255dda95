import Link from 'next/link';
import type { CarriedComments } from '@/lib/review/list-carried-comments';
import { REVIEW_PART_LABELS } from '@/lib/validation/check-schemas';
import type { EditableStep } from '@/lib/validation/scheme-schemas';

/** The checker's comments on the returned revision this draft answers, those about this step first. */
export function CarriedCommentsAside({ carried, step }: { carried: CarriedComments; step: EditableStep }) {
  const here = carried.comments.filter((c) => c.part === step);
  const elsewhere = carried.comments.filter((c) => c.part !== step);
  const { number, id } = carried.fromRevision;
  return (
    <aside aria-labelledby="h-carried" className="self-start rounded border border-verdict-caution bg-paper-deep p-4 text-sm">
      <h2 id="h-carried" className="font-semibold">The checker’s comments on revision {number}</h2>
      <p className="mt-1 text-ink-soft">This draft answers them. <Link className="text-accent underline" href={`/revisions/${id}`}>Read revision {number}</Link>.</p>
      {carried.summaries.map((s) => (
        <p key={`${s.checker}-${s.summary}`} className="mt-3 whitespace-pre-wrap"><span className="font-semibold">{s.checker}:</span> {s.summary}</p>
      ))}
      <h3 className="mt-4 font-semibold">About this step</h3>
      {here.length ? (
        <ul className="mt-2 space-y-2">
          {here.map((c) => <li key={c.id} className="border-l-2 border-accent pl-3"><p className="whitespace-pre-wrap">{c.body}</p><p className="text-xs text-ink-soft">{c.author}</p></li>)}
        </ul>
      ) : (
        <p className="mt-1 text-ink-soft">No comment about this step.</p>
      )}
      {elsewhere.length ? (
        <>
          <h3 className="mt-4 font-semibold">About other parts</h3>
          <ul className="mt-2 space-y-2">
            {elsewhere.map((c) => <li key={c.id} className="border-l-2 border-paper-edge pl-3"><p className="text-xs text-ink-soft">{REVIEW_PART_LABELS[c.part]}</p><p className="whitespace-pre-wrap">{c.body}</p></li>)}
          </ul>
        </>
      ) : null}
    </aside>
  );
}
