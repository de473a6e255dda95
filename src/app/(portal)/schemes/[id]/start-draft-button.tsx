'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { buttonClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { startDraftAction } from './actions';

/** "Start a new draft from this revision": copies its inputs into the next revision number and opens the wizard. */
export function StartDraftButton({ revisionId, schemeId, number }: { revisionId: string; schemeId: string; number: number }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  return (
    <span className="inline-flex flex-wrap items-center gap-3">
      <button
        type="button"
        className={buttonClassName}
        disabled={pending}
        onClick={() => startTransition(async () => {
          const result = await startDraftAction({ revisionId });
          if (!result.ok) return setError(result.error);
          router.push(`/schemes/${schemeId}/wizard/scheme`);
          router.refresh();
        })}
      >
        {pending ? 'Starting…' : `Start a new draft from revision ${number}`}
      </button>
      {error ? <span role="alert" className="text-sm text-verdict-fail"><StatusIcon name="fail" className="mr-1" />{error}</span> : null}
    </span>
  );
}
