import 'server-only';
import type { Transaction } from 'sequelize';
import { Revision, database } from '@/lib/db';
import type { ReviewPartName } from '@/lib/validation/check-schemas';
import { listReviewComments } from './list-review-comments';

export interface CarriedComments {
  fromRevision: { id: string; number: number };
  /** The returning checkers' summaries, oldest first. */
  summaries: { checker: string; summary: string }[];
  comments: { id: string; part: ReviewPartName; body: string; author: string }[];
}

/**
 * The checker's comments on the revision a draft was started from, when that revision was returned: the draft
 * answers them, so the wizard shows each beside the step it concerns. Read from the frozen revision, never copied.
 */
export async function listCarriedComments(draft: Pick<Revision, 'basedOnRevisionId'>, transaction?: Transaction): Promise<CarriedComments | null> {
  database();
  if (!draft.basedOnRevisionId) return null;
  const source = await Revision.findByPk(draft.basedOnRevisionId, { transaction });
  if (!source || source.status !== 'returned') return null;
  const returned = (await listReviewComments(source.id, { includeOpen: false })).filter((r) => r.decision === 'returned');
  if (returned.length === 0) return null;
  return {
    fromRevision: { id: source.id, number: source.number },
    summaries: returned.filter((r) => r.summary).map((r) => ({ checker: r.checker, summary: r.summary as string })),
    comments: returned.flatMap((r) => r.comments.map((c) => ({ id: c.id, part: c.part, body: c.body, author: c.author }))),
  };
}
