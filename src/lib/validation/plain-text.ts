import { z } from 'zod';
import './zod-without-eval';

// Text a person typed is stored and later printed into letters, certificates, e-mails and CSV files. Control
// characters (NUL, BEL, ESC …) and the invisible marks that reverse the direction of text make what is printed differ
// from what was read on screen, and a line break in a one-line field can start a new header in an e-mail or a new
// record in a file, so they are refused with the field named rather than stripped silently.

/** C0 and C1 controls and DEL, except tab, line feed and carriage return, which multi-line text may hold. */
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
/** Bidirectional embeddings, overrides, isolates and marks (Unicode Standard Annex #9). */
const DIRECTION_MARK = /[\u061C\u200E\u200F\u202A-\u202E\u2066-\u2069]/;
const LINE_BREAK = /[\r\n\u2028\u2029\u0085]/;
const TAB = /\t/;

export const CONTROL_MESSAGE = 'must not contain control characters such as NUL, BEL or ESC';
export const DIRECTION_MESSAGE = 'must not contain hidden marks that reverse the direction of text';
export const LINE_BREAK_MESSAGE = 'must be on one line, without line breaks';

function reasonForText(value: string, singleLine: boolean): string | null {
  if (singleLine && LINE_BREAK.test(value)) return LINE_BREAK_MESSAGE;
  if (CONTROL.test(value) || (singleLine && TAB.test(value))) return CONTROL_MESSAGE;
  if (DIRECTION_MARK.test(value)) return DIRECTION_MESSAGE;
  return null;
}

/** Why the text is refused, with the field's words in brackets, or null when it is plain. */
export function plainTextProblem(value: string, { field, singleLine }: { field: string; singleLine: boolean }): string | null {
  const reason = reasonForText(value, singleLine);
  return reason && `${reason} (${field})`;
}

function plainText(field: string, singleLine: boolean, missing: string) {
  // Checked before the trim, so a line break at either end is refused as well rather than trimmed away.
  return z
    .string({ error: (issue) => (issue.input === undefined || issue.input === null ? missing : 'must be text') })
    .check((ctx) => {
      const problem = plainTextProblem(ctx.value, { field, singleLine });
      if (problem) ctx.issues.push({ code: 'custom', message: problem, input: ctx.value });
    })
    .trim();
}

/** A name, reference, e-mail address or subject: one line of printable text. */
export function singleLineText(field: string, { missing = `is required (${field})` }: { missing?: string } = {}) {
  return plainText(field, true, missing);
}

/** A paragraph, comment or address: line breaks and tabs allowed, other control characters refused. */
export function multiLineText(field: string, { missing = `is required (${field})` }: { missing?: string } = {}) {
  return plainText(field, false, missing);
}
