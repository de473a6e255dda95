import Link from 'next/link';
import type { EditableStep, WizardStep } from '@/lib/validation/scheme-schemas';
import { StatusIcon } from '@/components/ui/status-icon';

export const STEP_TITLES: Record<WizardStep, string> = {
  scheme: 'Scheme',
  channel: 'Channel',
  flows: 'Design flows',
  structure: 'Structure',
  reservoir: 'Reservoir and inflow',
  limits: 'Thresholds and limits',
  results: 'Results',
};

export function stepHref(schemeId: string, step: WizardStep): string {
  return step === 'results' ? `/schemes/${schemeId}/results` : `/schemes/${schemeId}/wizard/${step}`;
}

/** The steps, each a link; done steps carry a tick and the word "saved", the current one is marked for screen readers. */
export function WizardProgress({ schemeId, current, completed }: { schemeId: string | null; current: WizardStep; completed: EditableStep[] }) {
  const steps = Object.keys(STEP_TITLES) as WizardStep[];
  return (
    <nav aria-label="Wizard steps" className="mb-8 print:hidden">
      <ol className="flex flex-wrap gap-x-1 gap-y-2 text-sm">
        {steps.map((step, i) => {
          const done = step !== 'results' && completed.includes(step);
          const here = step === current;
          const pill = `rounded-full border px-3 py-1 ${here ? 'border-accent bg-accent text-white' : done ? 'border-verdict-pass text-verdict-pass' : 'border-paper-edge text-ink-soft'}`;
          const content = (
            <>
              <span className="num">{i + 1}</span> {STEP_TITLES[step]}
              {done && !here ? <StatusIcon name="pass" className="ml-1" /> : null}
              {done ? <span className="sr-only"> (saved)</span> : null}
            </>
          );
          return (
            <li key={step} className="flex items-center">
              {schemeId ? (
                <Link href={stepHref(schemeId, step)} aria-current={here ? 'step' : undefined} className={`${pill} hover:underline`}>
                  {content}
                </Link>
              ) : (
                <span aria-current={here ? 'step' : undefined} className={pill}>{content}</span>
              )}
              {i < steps.length - 1 ? <span aria-hidden="true" className="mx-1 text-ink-faint">›</span> : null}
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
