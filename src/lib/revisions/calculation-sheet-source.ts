import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { type Revision, User } from '@/lib/db';
import { UnprocessableError } from '@/lib/http/app-errors';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CalculationSheetOptions } from '@/lib/pdf/calculation-sheet';
import { findReadableRevision, isEditable } from '@/lib/schemes/scheme-access';
import { findSchemeRevision } from '@/lib/schemes/find-scheme-revision';
import type { CaseInput } from '@/lib/validation/case-schema';
import { parseCase } from '@/lib/validation/parse-case';
import { decodeDraft } from './draft-inputs';
import { evaluateDraft } from './evaluate-draft';
import { findSheetStatus } from './find-sheet-status';
import { frozenCaseFile } from './revision-hashes';

/** A frozen revision's stored inputs and results: what was checked, never a fresh run by a newer engine. */
function frozenEvaluation(revision: Revision): { input: CaseInput; result: CaseResult } | null {
  if (isEditable(revision) || !revision.resultsJson) return null;
  const parsed = parseCase(frozenCaseFile(revision.inputsJson));
  return parsed.ok ? { input: parsed.value, result: JSON.parse(revision.resultsJson) as CaseResult } : null;
}

async function evaluation(revision: Revision, user: SessionUser): Promise<{ input: CaseInput; result: CaseResult }> {
  await findReadableRevision(user, revision.id);
  const frozen = frozenEvaluation(revision);
  if (frozen) return frozen;
  const evaluated = await evaluateDraft({ revisionId: revision.id, user });
  if (evaluated.status !== 'evaluated') throw new UnprocessableError('This revision cannot be evaluated yet, so there is no calculation sheet.', evaluated.issues);
  return evaluated;
}

/** Everything the calculation sheet of one revision shows, for a user allowed to read that revision. */
export async function calculationSheetSource(o: { schemeId: string; number: number | null; user: SessionUser }): Promise<CalculationSheetOptions> {
  const { scheme, revision } = await findSchemeRevision({ schemeId: o.schemeId, number: o.number, user: o.user });
  const { input, result } = await evaluation(revision, o.user);
  const designer = await User.findByPk(scheme.designerId, { attributes: ['name'] });
  return {
    scheme: { reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site },
    revision: { number: revision.number, status: await findSheetStatus(revision) },
    designer: designer?.name ?? 'unknown',
    datum: decodeDraft(revision.inputsJson).wizard?.datum ?? null,
    input,
    result,
    generatedAt: new Date(),
  };
}
