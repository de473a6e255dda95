'use client';

import useSWR from 'swr';
import type { ParcelImpactTable } from '@/lib/parcels/compute-parcel-impact';
import { StatusIcon } from '@/components/ui/status-icon';

async function fetchImpact(url: string): Promise<ParcelImpactTable> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(((await response.json().catch(() => ({}))) as { error?: string }).error ?? `The impact table could not be read (${response.status}).`);
  return response.json();
}

/**
 * The parcels the chosen revision affects, each with a box: ticked ones get a letter. Every box starts ticked; the
 * form sends the ticked references (or none, meaning all) with the request to make the letters.
 */
export function ParcelChooser({ schemeId, revisionId, chosen, onChange }: { schemeId: string; revisionId: string; chosen: string[] | undefined; onChange: (references: string[] | undefined) => void }) {
  const { data, error } = useSWR(revisionId ? `/api/parcels/${schemeId}/impact?revision=${encodeURIComponent(revisionId)}` : null, fetchImpact, { revalidateOnFocus: false, revalidateOnReconnect: false });
  if (error) return <p role="alert" className="mb-4 text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{(error as Error).message}</p>;
  if (!data) return <p className="mb-4 text-sm text-ink-soft">Reading which parcels this revision affects…</p>;
  const affected = data.rows.filter((r) => r.category === 'affected').map((r) => r.parcel);
  if (affected.length === 0) return <p className="mb-4 text-sm text-ink-soft">This revision affects no parcel of the register, so there is no one to write to.</p>;
  const ticked = new Set(chosen ?? affected.map((p) => p.reference));
  const toggle = (reference: string, on: boolean) => {
    const next = affected.map((p) => p.reference).filter((r) => (r === reference ? on : ticked.has(r)));
    onChange(next.length === affected.length ? undefined : next);
  };
  return (
    <fieldset className="mb-4">
      <legend className="mb-1 text-sm font-semibold">Parcels to write to</legend>
      <p id="letters-parcels-hint" className="mb-2 text-xs text-ink-soft">The parcels this revision affects. Untick any that should not get a letter now. A parcel without an e-mail address gets a letter to post.</p>
      <ul className="grid gap-1 text-sm sm:grid-cols-2" aria-describedby="letters-parcels-hint">
        {affected.map((p) => (
          <li key={p.reference}>
            <label className="inline-flex items-center gap-2">
              <input type="checkbox" checked={ticked.has(p.reference)} onChange={(e) => toggle(p.reference, e.target.checked)} />
              <span><span className="num font-semibold">{p.reference}</span> {p.ownerName}<span className="text-ink-soft"> · {p.email ? 'by e-mail' : 'by post'}</span></span>
            </label>
          </li>
        ))}
      </ul>
    </fieldset>
  );
}
