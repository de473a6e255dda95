import type { Metadata } from 'next';
import { z } from 'zod';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { requirePageRole } from '@/lib/auth/page-guard';
import { revisionRevocation } from '@/lib/certificates/revision-revocation';
import { NotFoundError } from '@/lib/http/app-errors';
import { indexQuery, numberFromOneQuery, readQuery } from '@/lib/http/query-params';
import { completedSteps, unitWords } from '@/lib/revisions/draft-inputs';
import { evaluateDraft } from '@/lib/revisions/evaluate-draft';
import { frozenIntegrity } from '@/lib/revisions/frozen-integrity';
import { ratingForSheet } from '@/lib/revisions/rating-for-sheet';
import { featuredEventIndex } from '@/lib/revisions/results-sheet';
import { listAvailableCheckers } from '@/lib/review/list-available-checkers';
import { findSchemeRevision } from '@/lib/schemes/find-scheme-revision';
import { isEditable } from '@/lib/schemes/scheme-access';
import { WizardProgress } from '@/components/forms/wizard/wizard-progress';
import { CautionNote } from '@/components/ui/caution-note';
import { IntegrityAlarm } from '@/components/ui/integrity-alarm';
import { PageHeader } from '@/components/ui/page-header';
import { RevocationNotice } from '@/components/ui/revocation-notice';
import { StatusLabel } from '@/components/ui/status-label';
import { UnreadableAddress } from '@/components/ui/unreadable-address';
import { SubmitForCheckForm } from '../../../revisions/[id]/submit-for-check-form';
import { IncompleteNotice } from './incomplete-notice';
import { ResultsSheet } from './results-sheet';

export const metadata: Metadata = { title: 'Results sheet' };

const resultsQuery = z.object({ revision: numberFromOneQuery('the revision number').optional(), event: indexQuery('the event, counted from 0').optional() });

export default async function ResultsPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { id } = await params;
  const user = await requirePageRole(ANY_ROLE, `/schemes/${id}/results`);
  const read = readQuery(resultsQuery, await searchParams);
  if (!read.ok) return <UnreadableAddress issues={read.issues} plainHref={`/schemes/${id}/results`} plainLabel="Open the results sheet of the latest revision" />;
  const query = read.data;
  const number = query.revision ?? null;
  const { scheme, revision } = await findSchemeRevision({ schemeId: id, number, user }).catch((error: unknown) => (error instanceof NotFoundError ? notFound() : Promise.reject(error)));
  const evaluation = await evaluateDraft({ revisionId: revision.id, user });
  const editable = user.role === 'designer' && scheme.designerId === user.id && isEditable(revision);
  const draft = evaluation.draft;
  const revocation = await revisionRevocation(revision);
  const integrity = frozenIntegrity(revision);
  return (
    <>
      <PageHeader eyebrow={`Results sheet · ${scheme.reference} · revision ${revision.number}`} title={scheme.name}>
        <span className="flex flex-wrap items-center gap-2"><StatusLabel status={revision.status} />{revocation ? <StatusLabel status="revoked" /> : null} {scheme.watercourse} at {scheme.site} · <Link className="text-accent underline" href={`/schemes/${scheme.id}`}>scheme page and history</Link></span>
      </PageHeader>
      {editable ? <WizardProgress schemeId={scheme.id} current="results" completed={completedSteps(draft)} /> : null}
      <RevocationNotice className="mb-6" revocations={revocation ? [revocation] : []} />
      {integrity ? <IntegrityAlarm className="mb-6" number={revision.number} problems={integrity.problems} /> : null}
      <CautionNote className="mb-8" />
      {evaluation.status === 'incomplete' ? <IncompleteNotice schemeId={scheme.id} title="The draft is not complete yet, so there are no results." issues={evaluation.issues} editable={editable} /> : null}
      {evaluation.status === 'unsolvable' ? <IncompleteNotice schemeId={scheme.id} title="The engine found no physical answer for these inputs." issues={evaluation.issues} editable={editable} /> : null}
      {evaluation.status === 'evaluated' ? (
        <ResultsSheet
          scheme={{ id: scheme.id, reference: scheme.reference }}
          revision={{ id: revision.id, number: revision.number }}
          input={evaluation.input}
          result={evaluation.result}
          eventIndex={query.event !== undefined && query.event < evaluation.result.events.length ? query.event : featuredEventIndex(evaluation.result, draft.wizard?.governing)}
          governing={draft.wizard?.governing ?? 'all'}
          datum={draft.wizard?.datum ?? null}
          units={unitWords(evaluation.input.units)}
          rating={await ratingForSheet(evaluation.input)}
          editable={editable}
        />
      ) : null}
      {editable && evaluation.status === 'evaluated' ? (
        <SubmitForCheckForm className="mt-10" revisionId={revision.id} checkers={await listAvailableCheckers(revision.authorId)} submittedHref={`/revisions/${revision.id}`} />
      ) : null}
    </>
  );
}
