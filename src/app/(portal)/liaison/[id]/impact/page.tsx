import type { Metadata } from 'next';
import Link from 'next/link';
import { z } from 'zod';
import { revisionStanding } from '@/lib/certificates/revision-standing';
import { idQuery, readQuery } from '@/lib/http/query-params';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { listSchemeRevisions } from '@/lib/parcels/select-revision';
import { CautionNote } from '@/components/ui/caution-note';
import { EmptyState } from '@/components/ui/empty-state';
import { buttonClassName, inputClassName } from '@/components/ui/form-field';
import { UnreadableAddress } from '@/components/ui/unreadable-address';
import { StatusIcon } from '@/components/ui/status-icon';
import { CATEGORY_WORDS } from '../../_components/category-label';
import { StripLegend } from '../../_components/parcel-strip-svg';
import { orNotFound, requireLiaisonPage } from '../../_components/scheme-page-access';
import { ImpactTable } from './impact-table';
import { ReachImpactChart } from './reach-impact-chart';

export const metadata: Metadata = { title: 'Impact on parcels' };

const impactQuery = z.object({ revision: idQuery('the revision').optional() });

export default async function ImpactPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { id } = await params;
  const { user } = await requireLiaisonPage(id, `/liaison/${id}/impact`);
  const read = readQuery(impactQuery, await searchParams);
  if (!read.ok) return <UnreadableAddress issues={read.issues} plainHref={`/liaison/${id}/impact`} plainLabel="Open the impact of the latest revision" />;
  const table = await orNotFound(() => computeParcelImpact({ user, schemeId: id, revisionId: read.data.revision ?? null }));
  const revisions = (await listSchemeRevisions(id)).filter((r) => r.status !== 'withdrawn');
  if (!table.revision) return <EmptyState title="This scheme has no revision to read yet." />;
  const counts = Object.entries(CATEGORY_WORDS).map(([c, words]) => ({ words, n: table.rows.filter((r) => r.category === c).length })).filter((c) => c.n > 0);
  return (
    <>
      <form method="get" className="mb-6 flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor="impact-revision" className="block text-sm font-semibold">Revision</label>
          <select id="impact-revision" name="revision" defaultValue={table.revision.id} className={inputClassName}>
            {revisions.map((r) => <option key={r.id} value={r.id}>Revision {r.number} ({revisionStanding(r)})</option>)}
          </select>
        </div>
        <button type="submit" className={buttonClassName}>Show</button>
        <a className="text-sm text-accent underline" href={`/api/parcels/${id}/export?table=impact&revision=${encodeURIComponent(table.revision.id)}`} download>Export as CSV<span className="sr-only"> (the impact of revision {table.revision.number}, one row per parcel and flood event)</span></a>
      </form>
      {table.revision.preliminary ? (
        <p role="note" className="mb-6 border-l-4 border-verdict-caution bg-paper-deep px-4 py-3 text-sm"><StatusIcon name="caution" className="mr-1" /><strong>Preliminary.</strong> Revision {table.revision.number} is {table.revision.status}, not countersigned: these figures may change, and letters made from it are watermarked PRELIMINARY.</p>
      ) : null}
      <p className="mb-4 text-sm text-ink-soft">
        Computed from revision <span className="num">{table.revision.number}</span>’s {table.revision.resultsStored ? 'stored' : 'freshly evaluated'} with- and without-scheme profiles (engine <span className="num">{table.revision.engineVersion}</span>), parcels register version <span className="num">{table.register?.version ?? '—'}</span>.
        A parcel is affected when the scheme raises the water beside it by <span className="num">{table.impactThresholdM.toFixed(3)} m</span> or more, or puts ground under water that is dry without it.{' '}
        {counts.map((c) => `${c.n} ${c.words.toLowerCase()}`).join(', ')}.
      </p>
      {table.rows.length === 0 ? (
        <EmptyState title="No parcels yet."><Link className="text-accent underline" href={`/liaison/${id}/upload`}>Upload the parcels CSV</Link> to see how each is affected.</EmptyState>
      ) : (
        <>
          <ReachImpactChart sections={table.longSections} parcels={table.rows.map((r) => ({ reference: r.parcel.reference, from: r.parcel.distanceFromM, to: r.parcel.distanceToM, affected: r.category === 'affected' }))} />
          <StripLegend />
          <ImpactTable table={table} />
        </>
      )}
      <CautionNote className="mt-8" />
    </>
  );
}
