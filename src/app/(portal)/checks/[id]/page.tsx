import type { Metadata } from 'next';
import Link from 'next/link';
import { forbidden, notFound } from 'next/navigation';
import { requirePageRole } from '@/lib/auth/page-guard';
import { ForbiddenError, NotFoundError } from '@/lib/http/app-errors';
import { loadCheckView } from '@/lib/review/load-check-view';
import { ratingForSheet } from '@/lib/revisions/rating-for-sheet';
import { featuredEventIndex } from '@/lib/revisions/results-sheet';
import { IntegrityAlarm } from '@/components/ui/integrity-alarm';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { ChangesTable } from '../_components/changes-table';
import { DesignerResults } from '../_components/designer-results';
import { InputsTable } from '../_components/inputs-table';
import { portalTime } from '@/lib/dates/portal-time';
import { RerunComparison } from '../_components/rerun-comparison';
import { ResultsSummary } from '../_components/results-summary';
import { ReviewThread } from '../_components/review-thread';
import { CommentForm } from './comment-form';
import { CountersignForm } from './countersign-form';
import { ReturnForm } from './return-form';

export const metadata: Metadata = { title: 'Check a revision' };

async function load(revisionId: string, checker: Awaited<ReturnType<typeof requirePageRole>>) {
  try {
    return await loadCheckView({ revisionId, checker });
  } catch (error) {
    if (error instanceof NotFoundError) notFound();
    if (error instanceof ForbiddenError) forbidden();
    throw error;
  }
}

function chosenEvent(query: string | undefined, count: number, featured: number): number {
  return query && /^\d+$/.test(query) && Number(query) < count ? Number(query) : featured;
}

export default async function CheckPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ event?: string }> }) {
  const { id } = await params;
  const query = await searchParams;
  const checker = await requirePageRole(['checker'], `/checks/${id}`);
  const view = await load(id, checker);
  const { revision, scheme, check } = view;
  const units = view.results?.units;
  const canDecide = revision.status === 'submitted' && !revision.assignedToOther;
  const eventIndex = view.results ? chosenEvent(query.event, view.results.events.length, featuredEventIndex(view.results, view.governing)) : 0;
  return (
    <>
      <PageHeader eyebrow={`Check · ${scheme.reference} · revision ${revision.number}`} title={scheme.name}>
        <span className="flex flex-wrap items-center gap-3">
          <StatusLabel status={revision.status} />
          <span>{scheme.watercourse} at {scheme.site} · designed by {revision.author} · submitted <span className="num">{portalTime(revision.submittedAt)}</span></span>
          <Link className="text-accent underline" href={`/revisions/${revision.id}`}>Revision record and history</Link>
        </span>
      </PageHeader>
      {view.integrity ? <IntegrityAlarm className="mb-6" number={revision.number} problems={view.integrity.problems} /> : null}
      {revision.assignedToOther ? <p role="note" className="mb-6 border-l-4 border-verdict-caution bg-paper-deep px-4 py-3 text-sm">This revision is assigned to {revision.checker}; you can read it but not decide on it.</p> : null}

      <section aria-labelledby="h-rerun" className="mb-10">
        <h2 id="h-rerun" className="mb-3 text-lg font-semibold">Independent re-run</h2>
        {check && view.results ? <RerunComparison stored={view.results} check={check} /> : <p className="text-sm text-ink-soft">This revision is {revision.status}; the re-run is made while it waits for check.</p>}
      </section>

      <section aria-labelledby="h-changes" className="mb-10">
        <h2 id="h-changes" className="mb-1 text-lg font-semibold">What changed since the last reviewed revision</h2>
        {view.previous ? (
          <div className="space-y-4">
            <p className="text-sm text-ink-soft">Compared with <Link className="text-accent underline" href={`/revisions/${view.previous.id}`}>revision {view.previous.number}</Link>, field by field.</p>
            <ChangesTable changes={view.previous.inputs} caption={`Inputs changed since revision ${view.previous.number}`} units={units} empty="No input changed." />
            <ChangesTable changes={view.previous.results} caption={`Key results changed since revision ${view.previous.number}`} units={units} empty="No key result changed." />
            <h3 className="font-semibold">Comments on revision {view.previous.number}</h3>
            <ReviewThread reviews={view.previous.reviews} empty="No comments were made." />
          </div>
        ) : (
          <p className="text-sm text-ink-soft">No earlier revision of this scheme has been reviewed: this is the first check.</p>
        )}
      </section>

      <section aria-labelledby="h-results" className="mb-10">
        <h2 id="h-results" className="mb-1 text-lg font-semibold">Stored results</h2>
        <p className="mb-1 text-sm text-ink-soft">What the designer saw on the results sheet when submitting.</p>
        <p className="num mb-3 break-all text-xs text-ink-faint">SHA-256 {revision.resultsSha256}</p>
        {view.results ? <ResultsSummary results={view.results} caption="Stored at submission" /> : <p className="text-sm">No results are stored.</p>}
        {view.results && view.caseInput && view.results.events.length > 0 ? (
          <div className="mt-6">
            <DesignerResults
              input={view.caseInput}
              results={view.results}
              eventIndex={eventIndex}
              datum={view.datum}
              href={`/checks/${revision.id}`}
              stepTableCsvHref={`/api/schemes/${scheme.id}/step-table?revision=${revision.number}&event=${eventIndex}`}
              rating={await ratingForSheet(view.caseInput)}
            />
          </div>
        ) : null}
      </section>

      <section aria-labelledby="h-inputs" className="mb-10">
        <h2 id="h-inputs" className="mb-3 text-lg font-semibold">Frozen inputs</h2>
        <p className="num mb-3 break-all text-xs text-ink-faint">SHA-256 {revision.inputsSha256}</p>
        <InputsTable inputs={view.inputs} />
      </section>

      <section aria-labelledby="h-review" className="mt-10">
        <h2 id="h-review" className="mb-3 text-lg font-semibold">Review</h2>
        <div className="grid gap-8 lg:grid-cols-2">
          <div className="space-y-4">
            <ReviewThread reviews={view.reviews} empty="No comments yet." />
            {canDecide ? <CommentForm revisionId={revision.id} /> : null}
          </div>
          {canDecide ? (
            <div className="space-y-6">
              <ReturnForm revisionId={revision.id} />
              <CountersignForm revisionId={revision.id} blocked={!check || check.blockers.length > 0} />
            </div>
          ) : null}
        </div>
      </section>
    </>
  );
}
