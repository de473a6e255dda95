import type { Metadata } from 'next';
import { forbidden } from 'next/navigation';
import { PARCEL_COLUMNS } from '@/lib/parcels/parcel-columns';
import { UPLOAD_LIMIT_BYTES, describeBytes } from '@/lib/uploads/upload-limits';
import { requireLiaisonPage } from '../../_components/scheme-page-access';
import { UploadForm } from './upload-form';

export const metadata: Metadata = { title: 'Upload parcels CSV' };

export default async function UploadPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { access } = await requireLiaisonPage(id, `/liaison/${id}/upload`);
  if (access !== 'manage') forbidden();
  return (
    <div className="grid gap-10 lg:grid-cols-[minmax(0,3fr)_minmax(14rem,1fr)]">
      <UploadForm schemeId={id} limitBytes={UPLOAD_LIMIT_BYTES['parcels-csv']} />
      <aside className="min-w-0 text-sm text-ink-soft">
        <h2 className="mb-2 text-base font-semibold text-ink">The parcels CSV</h2>
        <p>A header line, then one line per parcel, UTF-8, at most {describeBytes(UPLOAD_LIMIT_BYTES['parcels-csv'])}. Columns in any order:</p>
        <ul className="mt-2 list-disc pl-5">
          {Object.keys(PARCEL_COLUMNS).map((c) => <li key={c} className="num break-all">{c}{['email', 'ground_level_m', 'land_use'].includes(c) ? <span className="font-sans text-ink-faint"> (may be empty)</span> : null}</li>)}
        </ul>
        <p className="mt-2">Distances in metres upstream from the structure; ground level in metres above the survey datum; bank side left, right or both (looking downstream). Every upload becomes a new version of the register; earlier versions are kept.</p>
      </aside>
    </div>
  );
}
