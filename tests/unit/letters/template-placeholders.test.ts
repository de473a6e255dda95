import { describe, expect, it } from 'vitest';
import { DEFAULT_PARAGRAPHS } from '@/lib/letters/letter-template';
import { PLACEHOLDER_NAMES, unknownPlaceholders } from '@/lib/validation/letter-placeholders';
import { letterParagraphsSchema, saveLetterTemplateSchema } from '@/lib/validation/letter-schemas';

const template = (changes: Partial<typeof DEFAULT_PARAGRAPHS>) => ({ schemeId: 's1', responseDays: 28, ...DEFAULT_PARAGRAPHS, ...changes });

describe('placeholders in a letter template', () => {
  it('accepts every placeholder the letter fills in, and the standard wording', () => {
    const all = PLACEHOLDER_NAMES.map((n) => `{${n}}`).join(' ');
    expect(unknownPlaceholders(all)).toEqual([]);
    expect(saveLetterTemplateSchema.safeParse(template({ introduction: `Dear reader, ${all}.` })).success).toBe(true);
    expect(letterParagraphsSchema.safeParse(DEFAULT_PARAGRAPHS).success).toBe(true);
  });

  it('refuses a misspelt or unknown placeholder, naming it and the paragraph', () => {
    const parsed = saveLetterTemplateSchema.safeParse(template({ introduction: 'Dear {owner_nme}, on {date} we wrote about {parcel_reference}.' }));
    expect(parsed.success).toBe(false);
    const issue = parsed.error!.issues.find((i) => i.path[0] === 'introduction')!;
    expect(issue.message).toContain('“{owner_nme}”');
    expect(issue.message).toContain('“{date}”');
    expect(issue.message).not.toContain('“{parcel_reference}”');
    expect(issue.message).toContain('{response_deadline}');
  });

  it('refuses a placeholder with a brace missing, in the sign-off and the contact details too', () => {
    expect(unknownPlaceholders('Yours, {officer_name')).toEqual(['{officer_name']);
    expect(unknownPlaceholders('Yours, officer_name}')).toEqual(['officer_name}']);
    expect(unknownPlaceholders('Call {Officer_Name}')).toEqual(['{Officer_Name}']);
    const parsed = saveLetterTemplateSchema.safeParse(template({ signOff: '{officer_nam}', contact: 'Ring {phone}' }));
    expect(parsed.error?.issues.map((i) => i.path[0]).sort()).toEqual(['contact', 'signOff']);
  });

  it('keeps the days to respond within a week and three months, whole days only', () => {
    for (const [days, ok] of [[28, true], [7, true], [90, true], [6, false], [91, false], [14.5, false]] as const) {
      expect(saveLetterTemplateSchema.safeParse({ ...template({}), responseDays: days }).success, String(days)).toBe(ok);
    }
  });
});
