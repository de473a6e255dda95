import type { z } from 'zod';
import { CASE_FORMAT, CASE_VERSION, type CaseInput, caseSchema } from './case-schema';
import { safeParseUntrusted } from './safe-parse-untrusted';

/** One problem with a case file: the dotted path of the field (e.g. `events[0].discharge`) and what is wrong. */
export interface CaseIssue {
  path: string;
  message: string;
}

export type ParsedCase = { ok: true; value: CaseInput } | { ok: false; issues: CaseIssue[] };

/** `['reach', 'sections', 2, 'points']` → `reach.sections[2].points`; the empty path is `case`. */
export function fieldPath(path: readonly PropertyKey[]): string {
  if (path.length === 0) return 'case';
  return path.reduce<string>((text, key) => {
    if (typeof key === 'number') return `${text}[${key}]`;
    const name = String(key);
    return text === '' ? name : `${text}.${name}`;
  }, '');
}

function isRecord(raw: unknown): raw is Record<string, unknown> {
  return raw !== null && typeof raw === 'object' && !Array.isArray(raw);
}

/** What a header field holds, briefly: a nested or huge value is not echoed back (nor JSON.stringify'd to a stack overflow). */
function found(value: unknown): string {
  if (value === null || typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
  return Array.isArray(value) ? 'a list' : 'an object';
}

/** A different file or a different version is told apart first, so its owner gets one clear message, not a list. */
function headerIssues(raw: unknown): CaseIssue[] {
  if (!isRecord(raw)) return [{ path: 'case', message: 'must be a JSON object: a Sillmark case starts with { "format": "sillmark-case", "version": 1, … }' }];
  if (raw.format === undefined) return [{ path: 'format', message: `is required: a Sillmark case file says "format": "${CASE_FORMAT}"` }];
  if (raw.format !== CASE_FORMAT) return [{ path: 'format', message: `must be "${CASE_FORMAT}" (found ${found(raw.format)}): this is not a Sillmark case file` }];
  if (raw.version === undefined) return [{ path: 'version', message: `is required (this Sillmark reads version ${CASE_VERSION})` }];
  if (raw.version !== CASE_VERSION) {
    return [{ path: 'version', message: `${found(raw.version)} is not supported: this Sillmark reads version ${CASE_VERSION} case files` }];
  }
  return [];
}

function issuesOf(error: z.ZodError): CaseIssue[] {
  const seen = new Set<string>();
  const issues: CaseIssue[] = [];
  for (const issue of error.issues) {
    const entry = { path: fieldPath(issue.path), message: issue.message };
    const key = `${entry.path}\u0000${entry.message}`;
    if (!seen.has(key)) issues.push(entry);
    seen.add(key);
  }
  return issues;
}

/** Checks a decoded case file against the schema. */
export function parseCase(raw: unknown): ParsedCase {
  const header = headerIssues(raw);
  if (header.length > 0) return { ok: false, issues: header };
  const result = safeParseUntrusted(caseSchema, raw);
  return result.success ? { ok: true, value: result.data } : { ok: false, issues: issuesOf(result.error) };
}

/** Decodes the JSON text of a case file, then checks it. */
export function parseCaseText(text: string): ParsedCase {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (error) {
    // V8 quotes the start of the text it could not read: keep that short.
    const detail = error instanceof Error ? error.message.slice(0, 120) : 'unreadable';
    return { ok: false, issues: [{ path: 'case', message: `is not valid JSON (${detail})` }] };
  }
  return parseCase(raw);
}
