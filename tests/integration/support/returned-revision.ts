import { addReviewComment } from '@/lib/review/add-review-comment';
import { returnRevision } from '@/lib/review/return-revision';
import { submitForCheck } from '@/lib/revisions/submit-for-check';
import { database } from '@/lib/db';
import { createTestScheme } from './scheme-factory';
import type { createTestUser } from './user-factory';

type TestPerson = Awaited<ReturnType<typeof createTestUser>>;

export const STRUCTURE_COMMENT = 'The 10 m crest gives little margin at the 1% AEP flood; justify it or lengthen the crest.';
export const RETURN_SUMMARY = 'Justify the crest length, or lengthen the crest.';

/** A scheme whose first revision went through submission and was returned by the checker, through the real use cases. */
export async function createReturnedScheme(people: { designer: TestPerson; checker: TestPerson }) {
  const { scheme, revision } = await createTestScheme(people.designer.user.id);
  await submitForCheck({ revisionId: revision.id, checkerId: people.checker.user.id, designer: people.designer.sessionUser, baseUrl: 'http://localhost:3000' });
  await addReviewComment({ input: { revisionId: revision.id, part: 'structure', body: STRUCTURE_COMMENT }, checker: people.checker.sessionUser });
  await returnRevision({ input: { revisionId: revision.id, summary: RETURN_SUMMARY }, checker: people.checker.sessionUser, baseUrl: 'http://localhost:3000' });
  return { scheme, revision };
}

/** The stored row exactly as SQLite holds it, to prove a refusal changed nothing. */
export async function revisionRow(id: string): Promise<Record<string, unknown>> {
  const [rows] = (await database().query('SELECT * FROM revisions WHERE id = ?', { replacements: [id] })) as [Record<string, unknown>[], unknown];
  return rows[0];
}
