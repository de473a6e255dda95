import 'server-only';
import type { Revision } from '@/lib/db';
import { frozenCaseFile, inputsSha256, resultsSha256, revisionSha256 } from './revision-hashes';

export interface FrozenIntegrity {
  inputsIntact: boolean;
  resultsIntact: boolean;
  revisionIntact: boolean;
  /** What disagrees, in words; empty when the record matches its own hashes. */
  problems: string[];
}

function storedResults(resultsJson: string | null): unknown {
  if (resultsJson === null) return null;
  try {
    return JSON.parse(resultsJson);
  } catch {
    return undefined;
  }
}

/** True when the revision has left draft through submission, so its record must match the hashes taken then. */
export function isFrozen(revision: Pick<Revision, 'status' | 'submittedAt'>): boolean {
  return revision.status !== 'draft' && (revision.status !== 'withdrawn' || revision.submittedAt !== null);
}

/**
 * The SHA-256 values of a frozen revision recomputed from what is stored now. Null for a draft (nothing is frozen).
 * Every page that shows a frozen revision calls this, so an altered record is never shown as if it were sound.
 */
export function frozenIntegrity(revision: Revision): FrozenIntegrity | null {
  if (!isFrozen(revision)) return null;
  let inputsIntact = false;
  try {
    inputsIntact = revision.inputsSha256 !== null && inputsSha256(frozenCaseFile(revision.inputsJson)) === revision.inputsSha256;
  } catch {
    inputsIntact = false;
  }
  const results = storedResults(revision.resultsJson);
  const resultsIntact = results !== null && results !== undefined && revision.resultsSha256 !== null && resultsSha256(results) === revision.resultsSha256;
  const revisionIntact =
    revision.revisionSha256 !== null &&
    revision.revisionSha256 ===
      revisionSha256({ schemeId: revision.schemeId, number: revision.number, authorId: revision.authorId, engineVersion: revision.engineVersion ?? '', inputsSha256: revision.inputsSha256 ?? '', resultsSha256: revision.resultsSha256 ?? '', submittedAt: revision.submittedAt ?? '' });
  const problems: string[] = [];
  if (!inputsIntact) problems.push('The inputs changed after submission: their SHA-256 no longer matches the one recorded when the revision was frozen.');
  if (!resultsIntact) problems.push('The stored results changed after submission: their SHA-256 no longer matches the one recorded when the revision was frozen.');
  if (!revisionIntact) problems.push('The frozen revision’s own SHA-256 does not match its recorded fields (scheme, number, designer, engine version, submission time and the two hashes).');
  return { inputsIntact, resultsIntact, revisionIntact, problems };
}
