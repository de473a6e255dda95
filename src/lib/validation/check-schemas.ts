import { z } from 'zod';
import { multiLineText } from './plain-text';

// One schema per check form (submit, comment, return, countersign): the form's resolver and the server action share it.

const revisionId = z.string().trim().min(1, 'The revision is missing from the request.').max(64, 'A revision id has at most 64 characters.');

export const submitForCheckSchema = z.object({
  revisionId,
  /** Empty: the revision goes to the checkers' queue and the first checker who takes it up checks it. */
  checkerId: z.string().trim().max(64, 'Choose a checker from the list.').default(''),
});
export type SubmitForCheckInput = z.infer<typeof submitForCheckSchema>;

export const REVIEW_PARTS = ['scheme', 'channel', 'flows', 'structure', 'limits', 'results'] as const;
export type ReviewPartName = (typeof REVIEW_PARTS)[number];
export const REVIEW_PART_LABELS: Record<ReviewPartName, string> = {
  scheme: 'Scheme and site',
  channel: 'Channel (reach, sections, roughness)',
  flows: 'Design flows',
  structure: 'Structure (weir or control)',
  limits: 'Flood-level limits',
  results: 'Results',
};

export const reviewCommentSchema = z.object({
  revisionId,
  part: z.enum(REVIEW_PARTS, { message: 'Choose the part of the revision the comment is about.' }),
  body: multiLineText('the comment').min(3, 'Write the comment (at least 3 characters).').max(4000, 'A comment has at most 4000 characters.'),
});
export type ReviewCommentInput = z.infer<typeof reviewCommentSchema>;

export const returnRevisionSchema = z.object({
  revisionId,
  summary: multiLineText('what the designer should change').min(10, 'Say what the designer should change before resubmitting (at least 10 characters).').max(4000, 'The summary has at most 4000 characters.'),
});
export type ReturnRevisionInput = z.infer<typeof returnRevisionSchema>;

export const countersignSchema = z.object({
  revisionId,
  password: z.string().min(1, 'Enter your password: countersigning needs it again.').max(200, 'A password has at most 200 characters.'),
  confirmed: z.literal(true, { message: 'Tick the statement to confirm that you have checked this revision.' }),
});
export type CountersignInput = z.infer<typeof countersignSchema>;
