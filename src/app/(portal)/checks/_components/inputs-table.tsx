import { describeCaseField } from '@/lib/case-words/describe-case-field';
import { valueInWords } from '@/lib/case-words/value-words';
import { flattenInputs } from '@/lib/review/input-fields';
import { REVIEW_PARTS, REVIEW_PART_LABELS } from '@/lib/validation/check-schemas';

/** The frozen inputs, part by part, each field in words with its unit (list items by their own names). */
export function InputsTable({ inputs }: { inputs: unknown }) {
  const fields = flattenInputs(inputs).map((f) => ({ ...f, words: describeCaseField(f.path, inputs) }));
  return (
    <div className="space-y-4">
      {REVIEW_PARTS.map((part) => {
        const rows = fields.filter((f) => f.part === part);
        if (rows.length === 0) return null;
        return (
          <table key={part} className="w-full border-collapse text-sm">
            <caption className="mb-1 text-left text-sm font-semibold">{part === 'results' ? 'Calculation settings' : REVIEW_PART_LABELS[part]}</caption>
            <tbody>
              {rows.map((f) => (
                <tr key={f.path} className="border-b border-paper-edge align-top">
                  <th scope="row" className="w-1/2 py-1 pr-3 text-left text-xs font-normal text-ink-soft">{f.words.label}</th>
                  <td className="num break-all py-1 text-xs">{valueInWords(f.value)}{f.value !== null && f.words.unit ? ` ${f.words.unit}` : ''}</td>
                </tr>
              ))}
            </tbody>
          </table>
        );
      })}
    </div>
  );
}
