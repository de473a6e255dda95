'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { REVIEW_PARTS, REVIEW_PART_LABELS, type ReviewCommentInput, reviewCommentSchema } from '@/lib/validation/check-schemas';
import { FormField, buttonClassName, inputClassName } from '@/components/ui/form-field';
import { StatusIcon } from '@/components/ui/status-icon';
import { addReviewCommentAction } from './actions';

export function CommentForm({ revisionId }: { revisionId: string }) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<ReviewCommentInput>({ resolver: zodResolver(reviewCommentSchema), defaultValues: { revisionId, part: 'results', body: '' } });

  const onSubmit = handleSubmit(async (values) => {
    const result = await addReviewCommentAction(values);
    if (result.ok) {
      reset({ revisionId, part: values.part, body: '' });
      setMessage({ ok: true, text: `Comment on ${REVIEW_PART_LABELS[values.part].toLowerCase()} added.` });
      return router.refresh();
    }
    for (const issue of result.issues) if (issue.path === 'part' || issue.path === 'body') setError(issue.path, { message: issue.message });
    setMessage({ ok: false, text: result.error });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="h-comment">
      <h3 id="h-comment" className="mb-2 font-semibold">Add a comment</h3>
      {message ? <p role={message.ok ? 'status' : 'alert'} className="mb-2 text-sm"><StatusIcon name={message.ok ? 'pass' : 'fail'} className="mr-1" />{message.text}</p> : null}
      <FormField id="comment-part" label="Part of the revision" error={formState.errors.part?.message}>
        <select id="comment-part" className={inputClassName} aria-invalid={!!formState.errors.part} {...register('part')}>
          {REVIEW_PARTS.map((p) => <option key={p} value={p}>{REVIEW_PART_LABELS[p]}</option>)}
        </select>
      </FormField>
      <FormField id="comment-body" label="Comment" error={formState.errors.body?.message}>
        <textarea id="comment-body" rows={3} className={inputClassName} aria-invalid={!!formState.errors.body} aria-describedby={formState.errors.body ? 'comment-body-error' : undefined} {...register('body')} />
      </FormField>
      <button type="submit" className={buttonClassName} disabled={formState.isSubmitting}>Add comment</button>
    </form>
  );
}
