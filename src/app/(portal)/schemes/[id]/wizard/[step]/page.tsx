import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { requirePageRole } from '@/lib/auth/page-guard';
import { NotFoundError } from '@/lib/http/app-errors';
import { completedSteps } from '@/lib/revisions/draft-inputs';
import { loadWizard } from '@/lib/schemes/load-wizard';
import { EDITABLE_STEPS, type EditableStep } from '@/lib/validation/scheme-schemas';
import { STEP_TITLES, WizardProgress } from '@/components/forms/wizard/wizard-progress';
import { IntegrityAlarm } from '@/components/ui/integrity-alarm';
import { PageHeader } from '@/components/ui/page-header';
import { StatusLabel } from '@/components/ui/status-label';
import { StartDraftButton } from '../../start-draft-button';
import { CarriedCommentsAside } from './carried-comments';
import { WizardStepBody } from './wizard-step-body';

export const metadata: Metadata = { title: 'Scheme wizard' };

function isStep(step: string): step is EditableStep {
  return (EDITABLE_STEPS as readonly string[]).includes(step);
}

export default async function WizardStepPage({ params }: { params: Promise<{ id: string; step: string }> }) {
  const { id, step } = await params;
  if (step === 'results') redirect(`/schemes/${id}/results`);
  if (!isStep(step)) notFound();
  const user = await requirePageRole(['designer'], `/schemes/${id}/wizard/${step}`);
  const loaded = await loadWizard({ schemeId: id, user }).catch((error: unknown) => (error instanceof NotFoundError ? notFound() : Promise.reject(error)));
  const { scheme, revision } = loaded;
  const number = EDITABLE_STEPS.indexOf(step) + 1;
  return (
    <>
      <PageHeader eyebrow={`${scheme.reference} · revision ${revision.number} · step ${number} of ${EDITABLE_STEPS.length + 1}`} title={`${STEP_TITLES[step]}: ${scheme.name}`}>
        <span className="flex flex-wrap items-center gap-2"><StatusLabel status={revision.status} /> {scheme.watercourse} at {scheme.site} · <Link className="text-accent underline" href={`/schemes/${scheme.id}`}>scheme page and history</Link></span>
      </PageHeader>
      <WizardProgress schemeId={scheme.id} current={step} completed={completedSteps(loaded.inputs)} />
      {loaded.integrity ? <IntegrityAlarm className="mb-6" number={revision.number} problems={loaded.integrity.problems} /> : null}
      {loaded.editable && loaded.carried ? (
        <div className="grid gap-8 lg:grid-cols-[minmax(0,2fr)_minmax(16rem,1fr)]">
          <div><WizardStepBody step={step} loaded={loaded} /></div>
          <CarriedCommentsAside carried={loaded.carried} step={step} />
        </div>
      ) : loaded.editable ? (
        <WizardStepBody step={step} loaded={loaded} />
      ) : (
        <div role="note" className="rounded border border-paper-edge bg-white/70 p-5">
          <p className="font-semibold">Revision {revision.number} is {revision.status} and read-only.</p>
          <p className="mt-1 text-sm text-ink-soft">Its inputs are frozen as they were submitted{revision.status === 'returned' ? ', and the checker’s comments go with it into a new draft' : ''}. <Link className="text-accent underline" href={`/revisions/${revision.id}`}>Read the revision</Link>, or start a new draft from it to make changes.</p>
          <div className="mt-4"><StartDraftButton revisionId={revision.id} schemeId={scheme.id} number={revision.number} /></div>
        </div>
      )}
    </>
  );
}
