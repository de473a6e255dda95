import { flattenInputs } from '@/lib/review/input-fields';
import { REVIEW_PARTS, REVIEW_PART_LABELS } from '@/lib/validation/check-schemas';
import { unitsOf } from './quantities';

/** The frozen inputs, part by part, as the case file names each field. */
export function InputsTable({ inputs }: { inputs: unknown }) {
  const fields = flattenInputs(inputs);
  const units = (inputs as { units?: 'SI' | 'US' }).units;
  const u = unitsOf(units);
  return (
    <div className="space-y-4">
      <p className="text-xs text-ink-faint">Lengths and levels in {u.length}, discharges in {u.discharge}, slopes in {u.length}/{u.length}; field names as in the case file.</p>
      {REVIEW_PARTS.map((part) => {
        const rows = fields.filter((f) => f.part === part);
        if (rows.length === 0) return null;
        return (
          <table key={part} className="w-full border-collapse text-sm">
            <caption className="mb-1 text-left text-sm font-semibold">{part === 'results' ? 'Calculation settings' : REVIEW_PART_LABELS[part]}</caption>
            <tbody>
              {rows.map((f) => (
                <tr key={f.path} className="border-b border-paper-edge align-top">
                  <th scope="row" className="num w-1/2 py-1 pr-3 text-left text-xs font-normal text-ink-soft">{f.path}</th>
                  <td className="num break-all py-1 text-xs">{f.value === null ? '—' : String(f.value)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        );
      })}
    </div>
  );
}
