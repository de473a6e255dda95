import 'server-only';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { ENGINE_VERSION } from '@/lib/hydraulics/version';
import type { Revision } from '@/lib/db';
import { evaluateCaseOffThread } from '@/lib/engine-pool/engine-pool';
import { ThrottledError } from '@/lib/http/app-errors';
import { frozenIntegrity } from '@/lib/revisions/frozen-integrity';
import { frozenCaseFile, resultsSha256 } from '@/lib/revisions/revision-hashes';
import { caseIssuesInWords, engineTextInWords } from '@/lib/case-words/case-issue-words';
import { parseCase } from '@/lib/validation/parse-case';
import { type FieldChange, resultChanges } from './revision-changes';

export interface FrozenRevisionCheck {
  inputsIntact: boolean;
  resultsIntact: boolean;
  revisionIntact: boolean;
  rerun: { engineVersion: string; resultsSha256: string | null; matches: boolean; error: string | null; results: CaseResult | null };
  /** Key results that differ between the stored results and the re-run, field by field. */
  differences: FieldChange[];
  /** Why countersigning is blocked, in words; empty when it may go ahead. */
  blockers: string[];
}

async function rerun(inputs: unknown): Promise<FrozenRevisionCheck['rerun']> {
  const parsed = parseCase(inputs);
  if (!parsed.ok) return { engineVersion: ENGINE_VERSION, resultsSha256: null, matches: false, error: `The frozen inputs no longer read as a case file: ${caseIssuesInWords(parsed.issues, inputs).map((i) => i.message).join('; ')}`, results: null };
  try {
    const results = await evaluateCaseOffThread(parsed.value);
    return { engineVersion: ENGINE_VERSION, resultsSha256: resultsSha256(results), matches: false, error: null, results };
  } catch (error) {
    if (error instanceof ThrottledError) throw error;
    return { engineVersion: ENGINE_VERSION, resultsSha256: null, matches: false, error: `The engine could not evaluate the frozen inputs: ${error instanceof Error ? engineTextInWords(error.message, inputs) : String(error)}`, results: null };
  }
}

/**
 * The checker's independent re-run: the frozen inputs evaluated again on the server by the engine, and the hashes of
 * the stored inputs, results and revision recomputed. Any difference blocks countersigning and is explained.
 */
export async function checkFrozenRevision(revision: Revision): Promise<FrozenRevisionCheck> {
  const inputs = frozenCaseFile(revision.inputsJson);
  const stored = revision.resultsJson ? (JSON.parse(revision.resultsJson) as CaseResult) : null;
  const { inputsIntact, resultsIntact, revisionIntact, problems } = frozenIntegrity(revision) ?? { inputsIntact: false, resultsIntact: false, revisionIntact: false, problems: ['This revision is a draft: nothing has been frozen to check.'] };
  const again = await rerun(inputs);
  again.matches = again.resultsSha256 !== null && again.resultsSha256 === revision.resultsSha256;
  const differences = stored && again.results ? resultChanges(stored, again.results) : [];
  const blockers = [...problems];
  if (again.error) blockers.push(again.error);
  else if (!again.matches) {
    const engine = revision.engineVersion !== ENGINE_VERSION ? ` The revision was computed by engine ${revision.engineVersion}; the server now runs ${ENGINE_VERSION}.` : '';
    blockers.push(`The independent re-run does not reproduce the stored results (${differences.length} key result(s) differ).${engine}`);
  }
  return { inputsIntact, resultsIntact, revisionIntact, rerun: again, differences, blockers };
}
