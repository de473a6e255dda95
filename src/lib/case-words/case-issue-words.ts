import { CASE_VERSION } from '@/lib/validation/case-schema';
import { describeCaseField, segmentsOf } from './describe-case-field';
import { excerpt } from './excerpt';

export interface PathIssue {
  path: string;
  message: string;
}

const sentence = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

const HELP = 'A case file can be downloaded from any scheme’s results sheet to see how one begins.';

function said(value: unknown): string {
  return typeof value === 'string' ? `“${excerpt(value)}”` : typeof value === 'number' ? String(value) : 'something else';
}

/** A file that is not a case file, or not this version, is told so plainly, before any field is named. */
function headerInWords(path: string, caseFile: unknown): string | null {
  const header = caseFile !== null && typeof caseFile === 'object' ? (caseFile as { format?: unknown; version?: unknown }) : {};
  if (path === 'format') return header.format === undefined ? `This is not a Sillmark case file: it does not say that it is one. ${HELP}` : `This is not a Sillmark case file: it says it is ${said(header.format)}. ${HELP}`;
  if (path === 'version') return header.version === undefined ? `The case file does not say which version it is; this Sillmark reads version ${CASE_VERSION} case files.` : `The case file is version ${said(header.version)}; this Sillmark reads version ${CASE_VERSION} case files.`;
  return null;
}

/** "events[0].discharge" + "must be greater than 0 m³/s" → "Flood event “1 in 100 year”: peak discharge must be greater than 0 m³/s". */
export function caseIssueInWords(issue: PathIssue, caseFile?: unknown): PathIssue {
  const header = headerInWords(issue.path, caseFile);
  if (header) return { path: issue.path, message: header };
  if (segmentsOf(issue.path).length === 0) {
    const message = issue.message.startsWith('must be a JSON object') ? `This is not a Sillmark case file: it must be a JSON object. ${HELP}` : sentence(`the case file ${issue.message}`);
    return { path: issue.path, message };
  }
  return { path: issue.path, message: sentence(`${describeCaseField(issue.path, caseFile).label} ${issue.message}`) };
}

// A field path at the start of an engine message: "control.crestLength: …", "events[0].returnPeriod: …", "profile: …".
const LEADING_PATH = /^([A-Za-z][A-Za-z0-9]*(?:\.[A-Za-z0-9]+|\[\d+\])*): /;

/** An engine message or warning, with the field it starts with named in words (the engine itself speaks in paths). */
export function engineTextInWords(text: string, caseFile?: unknown): string {
  const match = LEADING_PATH.exec(text);
  if (!match) return text;
  return sentence(`${describeCaseField(match[1], caseFile).label}: ${text.slice(match[0].length)}`);
}

/** An engine error as an issue: the machine path kept for clients, the message in words. */
export function engineIssueInWords(error: { field: string; message: string }, caseFile?: unknown): PathIssue {
  return { path: error.field, message: engineTextInWords(error.message.startsWith(`${error.field}: `) ? error.message : `${error.field}: ${error.message}`, caseFile) };
}

export function caseIssuesInWords<T extends PathIssue>(issues: readonly T[], caseFile?: unknown): T[] {
  return issues.map((issue) => ({ ...issue, ...caseIssueInWords(issue, caseFile) }));
}
