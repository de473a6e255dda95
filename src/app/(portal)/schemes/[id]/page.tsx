import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { requirePageRole } from '@/lib/auth/page-guard';
import { schemeRevocations } from '@/lib/certificates/revision-revocation';
import { NotFoundError } from '@/lib/http/app-errors';
import { loadScheme } from '@/lib/schemes/load-scheme';
import { STEP_TITLES, stepHref } from '@/components/forms/wizard/wizard-progress';
import { buttonClassName } from '@/components/ui/form-field';
import { PageHeader } from '@/components/ui/page-header';
import { RevocationNotice } from '@/components/ui/revocation-notice';
import { RevisionHistory } from './revision-history';
import { StartDraftButton } from './start-draft-button';

export const metadata: Metadata = { title: 'Scheme' };

export default async function SchemePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requirePageRole(ANY_ROLE, `/schemes/${id}`);
  const loaded = await loadScheme({ schemeId: id, user }).catch((error: unknown) => (error instanceof NotFoundError ? notFound() : Promise.reject(error)));
  const { scheme, openDraft, revisions, isOwner } = loaded;
  const latest = revisions[0];
  const revocations = await schemeRevocations(scheme.id);
  const resume = openDraft?.wizardStep === 'results' || !openDraft?.wizardStep ? null : openDraft.wizardStep;
  return (
    <>
      <PageHeader eyebrow={`Scheme ${scheme.reference}`} title={scheme.name}>
        {scheme.watercourse} at {scheme.site}. Designer {loaded.designer.name}{loaded.designer.organisation ? `, ${loaded.designer.organisation}` : ''}.
        {scheme.description ? <span className="mt-1 block text-sm">{scheme.description}</span> : null}
      </PageHeader>
      <RevocationNotice className="mb-6" revocations={revocations} />
      <div className="mb-8 flex flex-wrap items-center gap-4">
        {isOwner && openDraft ? (
          <Link className={buttonClassName} href={resume ? stepHref(scheme.id, resume as 'scheme') : `/schemes/${scheme.id}/results`}>
            Continue draft revision {openDraft.number}{resume ? `: ${STEP_TITLES[resume as 'scheme']}` : ': results'}
          </Link>
        ) : null}
        {isOwner && !openDraft && latest ? <StartDraftButton revisionId={latest.id} schemeId={scheme.id} number={latest.number} /> : null}
        {latest ? <Link className="text-sm text-accent underline" href={`/schemes/${scheme.id}/results?revision=${latest.number}`}>Results sheet of revision {latest.number}</Link> : null}
        {latest ? <a className="text-sm text-accent underline" href={`/api/schemes/${scheme.id}/case-file?revision=${latest.number}`} download>Download revision {latest.number} as a case file</a> : null}
      </div>
      <RevisionHistory schemeId={scheme.id} revisions={revisions} revokedRevisionIds={revocations.map((r) => r.revisionId)} canStartDraft={isOwner && !openDraft} />
    </>
  );
}
