import type { Metadata } from 'next';
import { SchemeStepForm } from '@/components/forms/wizard/scheme-step-form';
import { WizardProgress } from '@/components/forms/wizard/wizard-progress';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageRole } from '@/lib/auth/page-guard';
import { createSchemeAction } from './actions';

export const metadata: Metadata = { title: 'New scheme' };

export default async function NewSchemePage() {
  await requirePageRole(['designer'], '/schemes/new');
  return (
    <>
      <PageHeader eyebrow="New scheme · step 1 of 7" title="The scheme">
        Name the scheme and its site, and choose the units every number will be entered in. The scheme and its first draft revision are made when you continue.
      </PageHeader>
      <WizardProgress schemeId={null} current="scheme" completed={[]} />
      <SchemeStepForm defaults={{ units: 'SI' }} unitsLocked={false} target={{ create: createSchemeAction }} />
    </>
  );
}
