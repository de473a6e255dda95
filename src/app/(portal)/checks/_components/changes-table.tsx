import type { FieldChange } from '@/lib/review/revision-changes';
import { REVIEW_PART_LABELS } from '@/lib/validation/check-schemas';
import { shownValue } from './quantities';

const CHANGE_WORDS = { changed: 'changed', added: 'added', removed: 'removed' } as const;

/** Field-by-field changes between two revisions (inputs or key results), each with its part, old and new value. */
export function ChangesTable({ changes, caption, units, empty }: { changes: FieldChange[]; caption: string; units: 'SI' | 'US' | undefined; empty: string }) {
  if (changes.length === 0) return <p className="text-sm text-ink-soft"><span aria-hidden="true">＝ </span>{empty}</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="mb-1 text-left text-xs text-ink-faint">{caption}</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            <th scope="col" className="py-2 pr-3">Part</th>
            <th scope="col" className="py-2 pr-3">Field</th>
            <th scope="col" className="py-2 pr-3 text-right">Before</th>
            <th scope="col" className="py-2 pr-3 text-right">Now</th>
            <th scope="col" className="py-2">Change</th>
          </tr>
        </thead>
        <tbody>
          {changes.map((c) => (
            <tr key={`${c.part}-${c.field}`} className="border-b border-paper-edge align-top">
              <td className="py-1 pr-3 text-xs text-ink-soft">{REVIEW_PART_LABELS[c.part]}</td>
              <td className="py-1 pr-3">{c.field}</td>
              <td className="num break-all py-1 pr-3 text-right text-ink-soft">{shownValue(c.before, c.kind, units)}</td>
              <td className="num break-all py-1 pr-3 text-right font-semibold">{shownValue(c.after, c.kind, units)}</td>
              <td className="py-1 text-xs">{CHANGE_WORDS[c.change]}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
