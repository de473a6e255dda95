import type { Metadata } from 'next';
import Link from 'next/link';
import type { ReactNode } from 'react';
import { schemeRevocations } from '@/lib/certificates/revision-revocation';
import { revisionStanding } from '@/lib/certificates/revision-standing';
import { listLetterTracking } from '@/lib/letters/list-letter-tracking';
import { computeParcelImpact } from '@/lib/parcels/compute-parcel-impact';
import { loadParcelRegister } from '@/lib/parcels/load-parcel-register';
import { CautionNote } from '@/components/ui/caution-note';
import { CATEGORY_WORDS } from '../_components/category-label';
import { requireLiaisonPage } from '../_components/scheme-page-access';

export const metadata: Metadata = { title: 'Landowner liaison' };

function Card({ title, children, href, linkText }: { title: string; children: ReactNode; href: string; linkText: string }) {
  return (
    <section aria-labelledby={`card-${title}`} className="rounded border border-paper-edge bg-white/60 p-5">
      <h2 id={`card-${title}`} className="text-lg font-semibold">{title}</h2>
      <div className="mt-2 text-sm text-ink-soft">{children}</div>
      <Link href={href} className="mt-3 inline-block text-sm font-semibold text-accent hover:underline">{linkText}</Link>
    </section>
  );
}

export default async function SchemeLiaisonOverview({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const { user, access } = await requireLiaisonPage(id, `/liaison/${id}`);
  const register = await loadParcelRegister({ user, schemeId: id });
  const impact = register.register ? await computeParcelImpact({ user, schemeId: id }) : null;
  const tracking = await listLetterTracking({ user, schemeId: id });
  const letters = tracking.parcels.flatMap((p) => p.letters);
  const revoked = new Set((await schemeRevocations(id)).map((r) => r.revisionId));
  const counts = impact ? Object.entries(CATEGORY_WORDS).map(([category, words]) => ({ words, n: impact.rows.filter((r) => r.category === category).length })).filter((c) => c.n > 0) : [];
  return (
    <>
      <div className="grid gap-6 md:grid-cols-3">
        <Card title="Parcels register" href={register.register ? `/liaison/${id}/register` : `/liaison/${id}/upload`} linkText={register.register ? 'Open the register' : access === 'manage' ? 'Upload the parcels CSV' : 'Open the register'}>
          {register.register ? <p>Version <span className="num">{register.register.version}</span> with <span className="num">{register.parcels.length}</span> parcels.</p> : <p>No register yet.</p>}
        </Card>
        <Card title="Impact on parcels" href={`/liaison/${id}/impact`} linkText="See the impact table">
          {!impact?.revision ? <p>No revision to read yet.</p> : (
            <>
              <p>From revision <span className="num">{impact.revision.number}</span> ({revisionStanding({ status: impact.revision.status, revoked: revoked.has(impact.revision.id) })}){revoked.has(impact.revision.id) ? ', so no letter can be made from it' : impact.revision.preliminary ? ', so any letter is PRELIMINARY' : ''}.</p>
              <ul className="mt-1">{counts.map((c) => <li key={c.words}><span className="num">{c.n}</span> {c.words.toLowerCase()}</li>)}</ul>
            </>
          )}
        </Card>
        <Card title="Letters" href={`/liaison/${id}/letters`} linkText="Letters and responses">
          {letters.length === 0 ? <p>No letters yet.</p> : <p><span className="num">{letters.filter((l) => l.status === 'sent' || l.status === 'acknowledged').length}</span> sent, <span className="num">{letters.filter((l) => l.status === 'queued').length}</span> queued, <span className="num">{letters.filter((l) => l.status === 'failed').length}</span> failed, <span className="num">{letters.filter((l) => l.status === 'held').length}</span> held, <span className="num">{letters.filter((l) => l.status === 'acknowledged').length}</span> answered.</p>}
        </Card>
      </div>
      <CautionNote className="mt-8" />
    </>
  );
}
