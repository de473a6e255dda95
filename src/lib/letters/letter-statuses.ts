import type { LetterStatus } from '@/lib/db/models/letter';

// What each letter state means for the casework; pure, so the pages, the use cases and the tests share it.

export const LETTER_STATUSES: readonly LetterStatus[] = ['queued', 'sending', 'sent', 'failed', 'acknowledged', 'held', 'to-post', 'posted', 'withdrawn'];

/** States in which the letter has reached (or is reaching) the landowner: a batch holding one can no longer be withdrawn. */
export const GONE_OUT: readonly LetterStatus[] = ['sending', 'sent', 'acknowledged', 'posted'];

/** States in which the landowner has the letter and a response can be logged. */
export const ANSWERABLE: readonly LetterStatus[] = ['sent', 'acknowledged', 'posted', 'failed'];

export function emptyLetterCounts(): Record<LetterStatus, number> {
  return Object.fromEntries(LETTER_STATUSES.map((s) => [s, 0])) as Record<LetterStatus, number>;
}
