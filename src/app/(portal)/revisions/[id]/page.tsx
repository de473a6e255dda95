import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { requirePageRole } from '@/lib/auth/page-guard';
import { NotFoundError } from '@/lib/http/app-errors';
import { loadRevisionView } from '@/lib/review/load-revision-view';
import { IntegrityAlarm } from '@/components/ui/integrity-alarm';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { StatusIcon } from '@/components/ui/status-icon';
import { InputsTable } from '../../checks/_components/inputs-table';
import { portalTime } from '@/lib/dates/portal-time';
import { ResultsSummary } from '../../checks/_components/results-summary';
import { ReviewThread } from '../../checks/_components/review-thread';
import { SchemeHistory } from '../../checks/_components/scheme-history';
import { StartDraftButton } from '../../schemes/[id]/start-draft-button';
import { SubmitForCheckForm } from './submit-for-check-form';

export const metadata: Metadata = { title: 'Revision' };

async function load(revisionId: string, user: Awaited<ReturnType<typeof requirePageRole>>) {
  try {
    return await loadRevisionView({ revisionId, user });
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    throw error;
  }
}

export default async function RevisionPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageRole(ANY_ROLE, `/revisions/${id}`);
  const view = await load(id, user);
  const { revision, scheme } = view;
  const isDesigner = user.role === 'designer';
  const openDraft = view.siblings.find((s) => s.status === 'draft');
  return (
    <>
      <PageHeader eyebrow={`${scheme.reference} · revision ${revision.number}`} title={scheme.name}>
        <span className="flex flex-wrap items-center gap-3">
          <StatusLabel status={revision.status} />
          <span>{scheme.watercourse} at {scheme.site}</span>
          {isDesigner ? <Link className="text-accent underline" href={`/schemes/${scheme.id}`}>Open the scheme</Link> : null}
        </span>
      </PageHeader>

      {view.integrity ? <IntegrityAlarm className="mb-6" number={revision.number} problems={view.integrity.problems} /> : null}
      <nav aria-label="Revisions of this scheme" className="mb-6 flex flex-wrap gap-2 text-sm">
        {view.siblings.map((s) => (
          <Link key={s.id} href={`/revisions/${s.id}`} aria-current={s.id === revision.id ? 'page' : undefined} className={`rounded border px-2 py-1 ${s.id === revision.id ? 'border-accent bg-accent-wash' : 'border-paper-edge hover:border-accent'}`}>
            <span className="num">rev. {s.number}</span> · {s.status}
          </Link>
        ))}
      </nav>

      <div className="grid gap-8 lg:grid-cols-[2fr_1fr]">
        <section aria-labelledby="h-record" className="space-y-2 text-sm">
          <h2 id="h-record" className="text-lg font-semibold">Record</h2>
          <dl className="grid grid-cols-[12rem_1fr] gap-x-4 gap-y-1">
            <dt className="text-ink-soft">Designer</dt><dd>{revision.author}</dd>
            <dt className="text-ink-soft">Checker</dt><dd>{revision.checker ?? (revision.status === 'submitted' ? 'in the checkers’ queue' : '—')}</dd>
            <dt className="text-ink-soft">Submitted</dt><dd className="num">{portalTime(revision.submittedAt)}</dd>
            <dt className="text-ink-soft">Countersigned</dt><dd className="num">{portalTime(revision.countersignedAt)}</dd>
            <dt className="text-ink-soft">Engine version</dt><dd className="num">{revision.engineVersion ?? '—'}</dd>
            <dt className="text-ink-soft">SHA-256 of the revision</dt><dd className="num break-all text-xs">{revision.revisionSha256 ?? 'not frozen yet'}</dd>
            <dt className="text-ink-soft">SHA-256 of the inputs</dt><dd className="num break-all text-xs">{revision.inputsSha256 ?? '—'}</dd>
            <dt className="text-ink-soft">SHA-256 of the results</dt><dd className="num break-all text-xs">{revision.resultsSha256 ?? '—'}</dd>
          </dl>
          {view.certificate ? (
            <p className="mt-3 rounded border border-paper-edge bg-white/60 p-3">
              Certificate <span className="num font-semibold">{view.certificate.number}</span> <StatusLabel status={view.certificate.status} />{' '}
              <a className="text-accent underline" href={`/api/certificates/${view.certificate.id}/pdf`}>Download the signed PDF</a> ·{' '}
              <Link className="text-accent underline" href={`/verify?number=${view.certificate.number}`}>Verify</Link>
            </p>
          ) : null}
          {revision.status === 'returned' && isDesigner ? (
            <p role="note" className="mt-3 border-l-4 border-verdict-caution bg-paper-deep px-3 py-2">
              <StatusIcon name="returned" className="mr-1" />The checker returned this revision. It stays frozen as it was submitted: revise the scheme in a new draft started from it, which shows the checker’s comments beside the fields they concern.
              <span className="mt-2 block">
                {openDraft ? (
                  <Link className="text-accent underline" href={`/schemes/${scheme.id}/wizard/scheme`}>Continue draft revision {openDraft.number}</Link>
                ) : (
                  <StartDraftButton revisionId={revision.id} schemeId={scheme.id} number={revision.number} />
                )}
              </span>
            </p>
          ) : null}
        </section>
        {view.canSubmit ? <SubmitForCheckForm revisionId={revision.id} checkers={view.checkers} /> : null}
      </div>

      <section aria-labelledby="h-results" className="mt-10">
        <h2 id="h-results" className="mb-3 text-lg font-semibold">Results</h2>
        {view.results ? <ResultsSummary results={view.results} caption={revision.status === 'draft' ? 'Latest draft results' : 'Frozen results'} /> : <p className="text-sm text-ink-soft">Not evaluated yet: the engine evaluates the revision when it is submitted for check.</p>}
      </section>

      <section aria-labelledby="h-reviews" className="mt-10">
        <h2 id="h-reviews" className="mb-3 text-lg font-semibold">Check and comments</h2>
        <ReviewThread reviews={view.reviews} empty="No checker has decided on this revision yet." />
      </section>

      <section aria-labelledby="h-inputs" className="mt-10">
        <h2 id="h-inputs" className="mb-3 text-lg font-semibold">Inputs</h2>
        <InputsTable inputs={view.inputs} />
      </section>

      <section aria-labelledby="h-history" className="mt-10">
        <h2 id="h-history" className="mb-3 text-lg font-semibold">History of the scheme</h2>
        <SchemeHistory entries={view.history} />
      </section>
    </>
  );
}
