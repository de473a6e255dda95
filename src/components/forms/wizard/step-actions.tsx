import Link from 'next/link';
import { buttonClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import type { SaveFailure } from './use-step-save';

/** The foot of every step: what the server refused, "Back", and "Save and continue". */
export function StepActions({ failure, backHref, submitting, label = 'Save and continue' }: { failure: SaveFailure | null; backHref?: string; submitting: boolean; label?: string }) {
  return (
    <div className="mt-8 border-t border-paper-edge pt-4">
      {failure ? (
        <div role="alert" className="mb-4 text-sm text-verdict-fail">
          <p><StatusIcon name="fail" className="mr-1" />{failure.error}</p>
          {failure.unplaced.length > 0 ? (
            <ul className="ml-5 list-disc">{failure.unplaced.map((i) => <li key={`${i.path}-${i.message}`}>{i.label ? `${i.label}: ` : ''}{i.message}</li>)}</ul>
          ) : null}
        </div>
      ) : null}
      <div className="flex flex-wrap items-center gap-4">
        {backHref ? <Link href={backHref} className="text-sm text-accent underline">← Back</Link> : null}
        <button type="submit" className={buttonClassName} disabled={submitting}>{submitting ? 'Saving…' : label}</button>
        <span className="text-xs text-ink-faint">Each step is saved to the draft on the server; you can leave and come back.</span>
      </div>
    </div>
  );
}
