import 'server-only';
import type { CaseResult } from '@/lib/hydraulics/case-result';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { ENGINE_VERSION } from '@/lib/hydraulics/version';
import type { Revision } from '@/lib/db';
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

function rerun(inputs: unknown): FrozenRevisionCheck['rerun'] {
  const parsed = parseCase(inputs);
  if (!parsed.ok) return { engineVersion: ENGINE_VERSION, resultsSha256: null, matches: false, error: `The frozen inputs no longer read as a case file: ${caseIssuesInWords(parsed.issues, inputs).map((i) => i.message).join('; ')}`, results: null };
  try {
    const results = evaluateCase(parsed.value);
    return { engineVersion: ENGINE_VERSION, resultsSha256: resultsSha256(results), matches: false, error: null, results };
  } catch (error) {
    return { engineVersion: ENGINE_VERSION, resultsSha256: null, matches: false, error: `The engine could not evaluate the frozen inputs: ${error instanceof Error ? engineTextInWords(error.message, inputs) : String(error)}`, results: null };
  }
}

/**
 * The checker's independent re-run: the frozen inputs evaluated again on the server by the engine, and the hashes of
 * the stored inputs, results and revision recomputed. Any difference blocks countersigning and is explained.
 */
export function checkFrozenRevision(revision: Revision): FrozenRevisionCheck {
  const inputs = frozenCaseFile(revision.inputsJson);
  const stored = revision.resultsJson ? (JSON.parse(revision.resultsJson) as CaseResult) : null;
  const { inputsIntact, resultsIntact, revisionIntact, problems } = frozenIntegrity(revision) ?? { inputsIntact: false, resultsIntact: false, revisionIntact: false, problems: ['This revision is a draft: nothing has been frozen to check.'] };
  const again = rerun(inputs);
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
