'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { EditableStep, WizardStep } from '@/lib/validation/scheme-schemas';
import { formPath, pruned } from '../form-values';
import { stepHref } from './wizard-progress';

export interface SaveFailure {
  error: string;
  /** Problems the form has no field for, listed above the buttons. */
  unplaced: { path: string; label?: string; message: string }[];
}

/**
 * Saves one step through PUT /api/revisions/[id]; the server checks it with the same schema as the form and
 * answers field by field, and each answer is shown at its field. On success the wizard moves to the next step.
 */
export function useStepSave<T extends FieldValues>({ schemeId, revisionId, step, setError, fields }: { schemeId: string; revisionId: string; step: EditableStep; setError: UseFormSetError<T>; fields?: (path: string) => boolean }) {
  const router = useRouter();
  const [failure, setFailure] = useState<SaveFailure | null>(null);
  const save = async (values: T): Promise<boolean> => {
    setFailure(null);
    let response: Response;
    try {
      response = await fetch(`/api/revisions/${revisionId}`, { method: 'PUT', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ step, values: pruned(values) }) });
    } catch {
      setFailure({ error: 'The server could not be reached; nothing was saved. Check the connection and try again.', unplaced: [] });
      return false;
    }
    const body = (await response.json().catch(() => ({}))) as { nextStep?: string; error?: string; issues?: { path: string; label?: string; message: string }[] };
    if (response.ok) {
      router.push(stepHref(schemeId, (body.nextStep ?? 'results') as WizardStep));
      return true;
    }
    const unplaced: SaveFailure['unplaced'] = [];
    for (const issue of body.issues ?? []) {
      const path = formPath(issue.path);
      if (path && (fields ? fields(path) : true)) setError(path as Path<T>, { type: 'server', message: issue.message }, { shouldFocus: true });
      else unplaced.push(issue);
    }
    setFailure({ error: body.error ?? `The server refused the save (HTTP ${response.status}).`, unplaced });
    return false;
  };
  return { save, failure };
}
