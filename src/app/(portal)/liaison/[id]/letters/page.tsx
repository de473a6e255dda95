import type { Metadata } from 'next';
import { listLetterTracking } from '@/lib/letters/list-letter-tracking';
import { listSchemeRevisions } from '@/lib/parcels/select-revision';
import { CautionNote } from '@/components/ui/caution-note';
import { orNotFound, requireLiaisonPage } from '../../_components/scheme-page-access';
import { BatchSender } from './batch-sender';
import { GenerateForm } from './generate-form';
import { TrackingTable } from './tracking-table';

export const metadata: Metadata = { title: 'Letters' };

export default async function LettersPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { user, access } = await requireLiaisonPage(id, `/liaison/${id}/letters`);
  const tracking = await orNotFound(() => listLetterTracking({ user, schemeId: id }));
  const revisions = (await listSchemeRevisions(id)).filter((r) => r.status !== 'withdrawn');
  const manage = access === 'manage';
  return (
    <>
      {manage ? <GenerateForm schemeId={id} revisions={revisions} /> : null}
      <section aria-labelledby="batches-heading" className="mt-10">
        <h2 id="batches-heading" className="mb-3 text-lg font-semibold">Batches</h2>
        {tracking.batches.length === 0 ? <p className="text-sm text-ink-soft">No letters have been made yet.</p> : (
          <div className="space-y-6">
            {tracking.batches.map((b, i) => <BatchSender key={b.id} batchId={b.id} manage={manage} initiallyOpen={i === 0 || b.status !== 'complete'} />)}
          </div>
        )}
      </section>
      <section aria-labelledby="tracking-heading" className="mt-10">
        <div className="mb-3 flex flex-wrap items-baseline justify-between gap-3">
          <h2 id="tracking-heading" className="text-lg font-semibold">Letters by parcel</h2>
          <a className="text-sm text-accent underline" href={`/api/parcels/${id}/export?table=tracking`} download>Export as CSV<span className="sr-only"> (letters, status, sent, deadline and responses)</span></a>
        </div>
        <TrackingTable schemeId={id} parcels={tracking.parcels} />
      </section>
      <CautionNote className="mt-8" />
    </>
  );
}
