'use client';

import { Fragment, useState } from 'react';
import type { ProfilePoint } from '@/lib/hydraulics/profiles/profile-point';

const PAGE = 20;

type Column = { key: keyof ProfilePoint; label: string; digits: number };

type Props = {
  rows: ProfilePoint[];
  columns: readonly Column[];
  /** Afflux at each row (with-scheme level − without-scheme level), so the level without the scheme stands beside it. */
  afflux: readonly number[];
  lengthUnit: string;
  csvHref: string;
  eventName: string;
};

/** The with-scheme profile point by point, a page at a time, with the level without the scheme and the afflux beside it; the whole table as CSV. */
export function StepTable({ rows, columns, afflux, lengthUnit: u, csvHref, eventName }: Props) {
  const [page, setPage] = useState(0);
  const pages = Math.max(1, Math.ceil(rows.length / PAGE));
  const shown = rows.slice(page * PAGE, page * PAGE + PAGE);
  return (
    <div>
      <div role="region" aria-label={`Step table of ${eventName}`} tabIndex={0} className="scroll-cue relative overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <caption className="mb-2 text-left text-sm text-ink-soft">Step table of {eventName} with the scheme: rows {page * PAGE + 1}–{page * PAGE + shown.length} of {rows.length}.</caption>
          <thead>
            <tr className="border-b border-paper-edge text-ink-soft">
              {columns.map((c) => (
                <Fragment key={c.key}>
                  <th scope="col" className="px-2 py-1 text-right font-semibold">{c.key === 'waterLevel' ? `Water level with the scheme (${u})` : c.label}</th>
                  {c.key === 'waterLevel' ? <><th scope="col" className="px-2 py-1 text-right font-semibold">Water level without the scheme ({u})</th><th scope="col" className="px-2 py-1 text-right font-semibold">Afflux ({u})</th></> : null}
                </Fragment>
              ))}
            </tr>
          </thead>
          <tbody>
            {shown.map((r, i) => {
              const rise = afflux[page * PAGE + i];
              return (
                <tr key={page * PAGE + i} className="border-b border-paper-edge">
                  {columns.map((c) => (
                    <Fragment key={c.key}>
                      <td className="num px-2 py-1 text-right">{r[c.key].toFixed(c.digits)}</td>
                      {c.key === 'waterLevel' ? <><td className="num px-2 py-1 text-right">{rise === undefined ? '—' : (r.waterLevel - rise).toFixed(c.digits)}</td><td className="num px-2 py-1 text-right">{rise === undefined ? '—' : rise.toFixed(c.digits)}</td></> : null}
                    </Fragment>
                  ))}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <div className="mt-3 flex flex-wrap items-center gap-4 text-sm">
        <button type="button" className="rounded border border-paper-edge px-3 py-1 disabled:opacity-50" disabled={page === 0} onClick={() => setPage(page - 1)}>← Previous rows</button>
        <span className="num" aria-live="polite">Page {page + 1} of {pages}</span>
        <button type="button" className="rounded border border-paper-edge px-3 py-1 disabled:opacity-50" disabled={page >= pages - 1} onClick={() => setPage(page + 1)}>Next rows →</button>
        <a className="text-accent underline" href={csvHref} download>Download the whole step table (CSV)</a>
      </div>
    </div>
  );
}
