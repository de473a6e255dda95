import 'server-only';
import { Op } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import { Review, Revision, User, database } from '@/lib/db';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { frozenIntegrity } from '@/lib/revisions/frozen-integrity';
import { decodeDraft } from '@/lib/revisions/draft-inputs';
import { frozenCaseFile } from '@/lib/revisions/revision-hashes';
import { parseCase } from '@/lib/validation/parse-case';
import { checkFrozenRevision } from './check-frozen-revision';
import { findVisibleRevision } from './find-visible-revision';
import { listReviewComments } from './list-review-comments';
import { inputChanges, resultChanges } from './revision-changes';
import { OwnWorkError } from './revision-for-check';

// Float noise below a micrometre is not a change a checker needs to read about.
const RESULT_TOLERANCE = 1e-6;

/** The latest earlier revision of the scheme that a checker decided on (returned or countersigned). */
async function lastReviewedBefore(revision: Revision): Promise<Revision | null> {
  const earlier = await Revision.findAll({ where: { schemeId: revision.schemeId, number: { [Op.lt]: revision.number } }, order: [['number', 'DESC']] });
  const decided = new Set((await Review.findAll({ where: { revisionId: earlier.map((r) => r.id), decision: { [Op.ne]: null } }, attributes: ['revisionId'] })).map((r) => r.revisionId));
  return earlier.find((r) => decided.has(r.id)) ?? null;
}

function caseInputOf(inputs: unknown) {
  const parsed = parseCase(inputs);
  return parsed.ok ? parsed.value : null;
}

/** The checker's review page: inputs and stored results beside the independent re-run, and what changed since the last review. */
export async function loadCheckView({ revisionId, checker }: { revisionId: string; checker: SessionUser }) {
  database();
  const { revision, scheme } = await findVisibleRevision(checker, revisionId);
  if (revision.authorId === checker.id || scheme.designerId === checker.id) throw new OwnWorkError();
  const inputs = frozenCaseFile(revision.inputsJson);
  const results = revision.resultsJson ? (JSON.parse(revision.resultsJson) as CaseResult) : null;
  const previous = await lastReviewedBefore(revision);
  const previousResults = previous?.resultsJson ? (JSON.parse(previous.resultsJson) as CaseResult) : null;
  const author = await User.findByPk(revision.authorId, { attributes: ['name'] });
  const assigned = revision.checkerId ? await User.findByPk(revision.checkerId, { attributes: ['name'] }) : null;
  return {
    revision: { id: revision.id, number: revision.number, status: revision.status, submittedAt: revision.submittedAt, engineVersion: revision.engineVersion, revisionSha256: revision.revisionSha256, inputsSha256: revision.inputsSha256, resultsSha256: revision.resultsSha256, author: author?.name ?? 'unknown', checker: assigned?.name ?? null, assignedToOther: !!revision.checkerId && revision.checkerId !== checker.id },
    scheme: { id: scheme.id, reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site },
    inputs,
    /** The inputs as the engine read them (defaults filled in), for the charts and step table; null if they no longer parse. */
    caseInput: caseInputOf(inputs),
    datum: decodeDraft(revision.inputsJson).wizard?.datum ?? null,
    governing: decodeDraft(revision.inputsJson).wizard?.governing,
    results,
    check: revision.status === 'submitted' ? await checkFrozenRevision(revision) : null,
    integrity: frozenIntegrity(revision),
    previous: previous
      ? {
          id: previous.id,
          number: previous.number,
          inputs: inputChanges(frozenCaseFile(previous.inputsJson), inputs),
          results: previousResults && results ? resultChanges(previousResults, results, RESULT_TOLERANCE) : [],
          reviews: await listReviewComments(previous.id, { includeOpen: false }),
        }
      : null,
    reviews: await listReviewComments(revision.id, { includeOpen: true }),
  };
}
export type CheckView = Awaited<ReturnType<typeof loadCheckView>>;
