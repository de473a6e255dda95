import Link from 'next/link';
import type { StepIssue } from '@/lib/revisions/step-of-field';
import { STEP_TITLES, stepHref } from '@/components/forms/wizard/wizard-progress';
import { StatusIcon } from '@/components/ui/status-icon';

/** Why there are no results yet, each problem linked to the step where it is put right. */
export function IncompleteNotice({ schemeId, title, issues, editable }: { schemeId: string; title: string; issues: StepIssue[]; editable: boolean }) {
  return (
    <section role="alert" className="rounded border border-verdict-caution bg-white/70 p-5">
      <h2 className="font-semibold text-verdict-caution"><StatusIcon name="caution" className="mr-1" />{title}</h2>
      <ul className="mt-2 space-y-1 text-sm">
        {issues.map((i) => (
          <li key={`${i.path}-${i.message}`}>
            {editable ? <Link className="text-accent underline" href={stepHref(schemeId, i.step)}>{STEP_TITLES[i.step]}</Link> : STEP_TITLES[i.step]}: {i.message}
          </li>
        ))}
      </ul>
    </section>
  );
}
