import { PARCEL_COLUMNS, type ParcelColumn } from '@/lib/parcels/parcel-columns';
import type { ParcelsCsvPreview } from '@/lib/parcels/preview-parcels-csv';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { StatusIcon } from '@/components/ui/status-icon';

const COLUMNS = Object.keys(PARCEL_COLUMNS) as ParcelColumn[];

/** The file's rows as read, each cell with a problem marked in words as well as colour. */
export function PreviewTable({ preview }: { preview: ParcelsCsvPreview }) {
  const bad = new Set(preview.issues.map((i) => `${i.line}:${i.column ?? ''}`));
  const badLine = new Set(preview.issues.map((i) => i.line));
  return (
    <ScrollRegion label="Preview of the parcels CSV">
      <table className="w-full border-collapse text-xs">
        <caption className="sr-only">Preview of the parcels CSV</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            <th scope="col" className="py-1 pr-2">Line</th>
            {COLUMNS.map((c) => <th key={c} scope="col" className="num py-1 pr-2 font-normal">{c}</th>)}
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((row) => (
            <tr key={row.line} className={`border-b border-paper-edge align-top ${badLine.has(row.line) ? 'bg-paper-deep' : ''}`}>
              <th scope="row" className="num py-1 pr-2 text-left">{row.line}{badLine.has(row.line) ? <span className="text-verdict-fail"> <StatusIcon name="fail" /><span className="sr-only"> has problems</span></span> : null}</th>
              {COLUMNS.map((c) => (
                <td key={c} className={`py-1 pr-2 ${bad.has(`${row.line}:${c}`) ? 'font-semibold text-verdict-fail underline decoration-dotted' : ''}`}>
                  {row.values[c] || <span className="text-ink-faint">—</span>}
                  {bad.has(`${row.line}:${c}`) ? <span className="sr-only"> (problem)</span> : null}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {preview.truncated ? <p className="mt-1 text-xs text-ink-soft">Only the first rows are shown; all <span className="num">{preview.rowCount}</span> were checked.</p> : null}
    </ScrollRegion>
  );
}
