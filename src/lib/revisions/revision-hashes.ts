import 'server-only';
import { createHash } from 'node:crypto';
import canonicalize from 'canonicalize';
import { caseFileOf, decodeDraft } from './draft-inputs';

/** The fields of a submitted revision that its whole-revision hash covers. */
export interface FrozenRevisionFields {
  schemeId: string;
  number: number;
  authorId: string;
  engineVersion: string;
  inputsSha256: string;
  resultsSha256: string;
  submittedAt: string;
}

/**
 * RFC 8785 canonical JSON (the `canonicalize` package). The value first goes through a JSON round trip, so an
 * object in memory and the JSON text stored for it (undefined dropped, non-finite numbers as null) hash alike.
 */
export function canonicalJson(value: unknown): string {
  const text = canonicalize(JSON.parse(JSON.stringify(value ?? null)));
  if (text === undefined) throw new Error('This value has no canonical JSON form.');
  return text;
}

export function sha256Hex(data: string | Uint8Array): string {
  return createHash('sha256').update(data).digest('hex');
}

export function inputsSha256(inputs: unknown): string {
  return sha256Hex(canonicalJson(inputs));
}

export function resultsSha256(results: unknown): string {
  return sha256Hex(canonicalJson(results));
}

/** One hash for the frozen revision as a whole: which scheme, which revision, whose, by which engine, of what. */
export function revisionSha256(fields: FrozenRevisionFields): string {
  const { schemeId, number, authorId, engineVersion, inputsSha256: inputs, resultsSha256: results, submittedAt } = fields;
  return sha256Hex(canonicalJson({ schemeId, number, authorId, engineVersion, inputsSha256: inputs, resultsSha256: results, submittedAt }));
}

/** The case file a revision's inputs_json holds, without the wizard's notes: what is evaluated, hashed and certified. */
export function frozenCaseFile(inputsJson: string): Record<string, unknown> {
  return caseFileOf(decodeDraft(inputsJson)) as Record<string, unknown>;
}
