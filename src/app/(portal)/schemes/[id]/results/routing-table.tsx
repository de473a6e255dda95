'use client';

import { useState } from 'react';
import { DataTable } from '@/components/ui/data-table';

const PAGE = 24;

type Column = { label: string; digits: number };

/** The routing table a page at a time, with the whole table as CSV. Cells come as numbers, already in the column's order. */
export function RoutingTable({ columns, values, csvHref, eventName }: { columns: Column[]; values: number[][]; csvHref: string; eventName: string }) {
  const [page, setPage] = useState(0);
  const pages = Math.max(1, Math.ceil(values.length / PAGE));
  const first = page * PAGE;
  const shown = values.slice(first, first + PAGE);
  return (
    <div>
      <DataTable caption={`Routing table of ${eventName}: rows ${first + 1}–${first + shown.length} of ${values.length}.`} captionStyle="note" columns={columns.map((c) => ({ label: c.label, numeric: true }))}>
        {shown.map((row, i) => (
          <tr key={first + i} className="border-b border-paper-edge">
            {row.map((value, j) => <td key={j} className={`num py-1 text-right ${j < row.length - 1 ? 'pr-3' : ''}`}>{value.toFixed(columns[j].digits)}</td>)}
          </tr>
        ))}
      </DataTable>
      <div className="mt-3 flex flex-wrap items-center gap-4 text-sm">
        <button type="button" className="rounded border border-paper-edge px-3 py-1 disabled:opacity-50" disabled={page === 0} onClick={() => setPage(page - 1)}>← Earlier times</button>
        <span className="num" aria-live="polite">Page {page + 1} of {pages}</span>
        <button type="button" className="rounded border border-paper-edge px-3 py-1 disabled:opacity-50" disabled={page >= pages - 1} onClick={() => setPage(page + 1)}>Later times →</button>
        <a className="text-accent underline" href={csvHref} download>Download the whole routing table (CSV)</a>
      </div>
    </div>
  );
}
