import { describeCaseField, segmentsOf } from './describe-case-field';

export interface PathIssue {
  path: string;
  message: string;
}

const sentence = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** "events[0].discharge" + "must be greater than 0 m³/s" → "Flood event “1 in 100 year”: peak discharge must be greater than 0 m³/s". */
export function caseIssueInWords(issue: PathIssue, caseFile?: unknown): PathIssue {
  if (segmentsOf(issue.path).length === 0) return { path: issue.path, message: sentence(`the case file ${issue.message}`) };
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
