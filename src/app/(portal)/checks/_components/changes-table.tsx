import type { FieldChange } from '@/lib/review/revision-changes';
import { REVIEW_PART_LABELS } from '@/lib/validation/check-schemas';
import { shownValue } from './quantities';
import { DataTable } from '@/components/ui/data-table';

const CHANGE_WORDS = { changed: 'changed', added: 'added', removed: 'removed' } as const;

/** Field-by-field changes between two revisions (inputs or key results), each with its part, old and new value. */
export function ChangesTable({ changes, caption, units, empty }: { changes: FieldChange[]; caption: string; units: 'SI' | 'US' | undefined; empty: string }) {
  if (changes.length === 0) return <p className="text-sm text-ink-soft"><span aria-hidden="true">＝ </span>{empty}</p>;
  return (
    <DataTable caption={caption} captionStyle="note" columns={[{ label: 'Part' }, { label: 'Field' }, { label: 'Before', numeric: true }, { label: 'Now', numeric: true }, { label: 'Change' }]}>
      {changes.map((c) => (
        <tr key={`${c.part}-${c.field}`} className="border-b border-paper-edge align-top">
          <td className="py-1 pr-3 text-xs text-ink-soft">{REVIEW_PART_LABELS[c.part]}</td>
          <td className="py-1 pr-3">{c.label}</td>
          <td className="num break-all py-1 pr-3 text-right text-ink-soft">{shownValue(c.before, c.kind, units)}</td>
          <td className="num break-all py-1 pr-3 text-right font-semibold">{shownValue(c.after, c.kind, units)}</td>
          <td className="py-1 text-xs">{CHANGE_WORDS[c.change]}</td>
        </tr>
      ))}
    </DataTable>
  );
}
