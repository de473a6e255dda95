import { describe, expect, it } from 'vitest';
import { isRealIsoDate } from '@/lib/validation/iso-date';
import { multiLineText, plainTextProblem, singleLineText } from '@/lib/validation/plain-text';

describe('the plain-text rule', () => {
  it('refuses every C0 and C1 control character except tab and line breaks in multi-line text', () => {
    for (let code = 0; code <= 0x9f; code++) {
      if (code >= 0x20 && code < 0x7f) continue;
      const text = `Mill${String.fromCharCode(code)}Lane`;
      const allowedInParagraph = code === 0x09 || code === 0x0a || code === 0x0d;
      expect(plainTextProblem(text, { field: 'x', singleLine: false }) === null, `U+${code.toString(16)} in a paragraph`).toBe(allowedInParagraph);
      expect(plainTextProblem(text, { field: 'x', singleLine: true }), `U+${code.toString(16)} on one line`).not.toBeNull();
    }
  });

  it('refuses the marks that reverse the direction of text, and keeps ordinary accents and symbols', () => {
    for (const mark of ['\u202A', '\u202B', '\u202C', '\u202D', '\u202E', '\u2066', '\u2067', '\u2068', '\u2069', '\u200E', '\u200F', '\u061C']) {
      expect(singleLineText('the site').safeParse(`Weir${mark}side`).success, `U+${mark.charCodeAt(0).toString(16)}`).toBe(false);
    }
    expect(singleLineText('the site').safeParse('Pont-y-Cŵm, Ørsted’s “mill” — 1% AEP ≤ 35 m³/s').success).toBe(true);
  });

  it('names the field and the reason', () => {
    expect(singleLineText('the parcel reference').safeParse('HM-07\nHM-08').error?.issues[0]?.message).toBe('must be on one line, without line breaks (the parcel reference)');
    expect(multiLineText('the comment').safeParse('ok\u0007').error?.issues[0]?.message).toBe('must not contain control characters such as NUL, BEL or ESC (the comment)');
  });
});

describe('ISO dates', () => {
  it('accepts days that exist and refuses those that do not', () => {
    for (const day of ['2024-02-29', '2026-02-28', '2026-12-31', '2000-02-29']) expect(isRealIsoDate(day), day).toBe(true);
    for (const day of ['2026-02-29', '2026-02-30', '2026-13-45', '2026-00-10', '2026-04-31', '1900-02-29', '2026-1-5', '20260105', '2026-01-05T00:00']) expect(isRealIsoDate(day), day).toBe(false);
  });
});
