'use client';

import { MANNING_N_SOURCE, TYPICAL_MANNING_N } from './manning-n-typical';

/** A pick-list of typical n values that fills the n field; the field stays the designer's to change. */
export function ManningNPicker({ id, onPick }: { id: string; onPick: (n: number) => void }) {
  return (
    <div className="mt-2">
      <label htmlFor={id} className="text-xs font-semibold text-ink-soft">Or start from a typical value</label>
      <select
        id={id}
        className="mt-1 block w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm"
        defaultValue=""
        aria-describedby={`${id}-source`}
        onChange={(e) => {
          if (e.target.value !== '') onPick(Number(e.target.value));
          e.target.value = '';
        }}
      >
        <option value="">Choose a channel description…</option>
        {TYPICAL_MANNING_N.map((t) => <option key={t.description} value={t.n}>{t.description}: n = {t.n.toFixed(3)}</option>)}
      </select>
      <p id={`${id}-source`} className="mt-1 text-xs text-ink-faint">Source: {MANNING_N_SOURCE}.</p>
    </div>
  );
}
