import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision, database } from '@/lib/db';
import { evaluateCaseOffThread } from '@/lib/engine-pool/engine-pool';
import { UnprocessableError } from '@/lib/http/app-errors';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { caseIssuesInWords, engineIssueInWords } from '@/lib/case-words/case-issue-words';
import { EngineError } from '@/lib/hydraulics/errors';
import { ENGINE_VERSION } from '@/lib/hydraulics/version';
import { findReadableRevision, isEditable } from '@/lib/schemes/scheme-access';
import type { CaseInput } from '@/lib/validation/case-schema';
import { parseCase } from '@/lib/validation/parse-case';
import { type DraftInputs, caseFileOf, decodeDraft } from './draft-inputs';
import { type StepIssue, withSteps } from './step-of-field';

export type DraftEvaluation =
  | { status: 'incomplete'; draft: DraftInputs; issues: StepIssue[] }
  | { status: 'unsolvable'; draft: DraftInputs; error: string; issues: StepIssue[] }
  | { status: 'evaluated'; draft: DraftInputs; input: CaseInput; result: CaseResult };

/** Checks the draft as a whole case and runs the engine, or reads the stored result when the inputs have not changed. */
export async function evaluateDraft({ revisionId, user }: { revisionId: string; user: SessionUser }): Promise<DraftEvaluation & { revisionNumber: number; schemeId: string }> {
  const sequelize = database();
  const { scheme, revision } = await findReadableRevision(user, revisionId);
  const where = { revisionNumber: revision.number, schemeId: scheme.id };
  const draft = decodeDraft(revision.inputsJson);
  const parsed = parseCase(caseFileOf(draft));
  if (!parsed.ok) return { ...where, status: 'incomplete', draft, issues: withSteps(caseIssuesInWords(parsed.issues, draft)) };
  if (revision.resultsJson && revision.engineVersion === ENGINE_VERSION) {
    return { ...where, status: 'evaluated', draft, input: parsed.value, result: JSON.parse(revision.resultsJson) as CaseResult };
  }
  let result: CaseResult;
  try {
    result = await evaluateCaseOffThread(parsed.value);
  } catch (error) {
    // Too large or too slow for the engine: the same answer as no solution, with what to reduce.
    if (error instanceof UnprocessableError) return { ...where, status: 'unsolvable', draft, error: error.message, issues: withSteps(error.issues) };
    if (!(error instanceof EngineError)) throw error;
    const issue = engineIssueInWords(error, draft);
    return { ...where, status: 'unsolvable', draft, error: issue.message, issues: withSteps([issue]) };
  }
  // Only the designer's open draft keeps its result; anyone else sees a fresh run of the same inputs.
  if (user.role === 'designer' && scheme.designerId === user.id && isEditable(revision)) {
    await sequelize.transaction(async (transaction) => {
      // Two renders of the same page may evaluate at once; the first to commit keeps its result, the other stores nothing.
      const current = await Revision.findByPk(revision.id, { transaction });
      if (!current || current.resultsJson !== null || current.inputsJson !== revision.inputsJson) return;
      await current.update({ resultsJson: JSON.stringify(result), engineVersion: result.engineVersion, updatedAt: new Date().toISOString() }, { transaction });
      await recordAuditEvent({ actorId: user.id, action: 'revision.evaluated', entityType: 'revision', entityId: revision.id, schemeId: scheme.id, details: { number: revision.number, verdict: result.verdict, engineVersion: result.engineVersion } }, transaction);
    });
  }
  return { ...where, status: 'evaluated', draft, input: parsed.value, result };
}
