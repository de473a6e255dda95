import { describe, expect, it } from 'vitest';
import { cautionText, eventParagraph } from '@/lib/letters/letter-content';
import type { LetterImpact } from '@/lib/letters/letter-impact';
import { namedMethods } from '@/lib/letters/letter-methods';
import { letterParagraphsSchema } from '@/lib/validation/letter-schemas';
import { DEFAULT_PARAGRAPHS } from '@/lib/letters/letter-template';
import { fillPlaceholders } from '@/lib/validation/letter-placeholders';

type Event = LetterImpact['events'][number];
const base: Event = {
  event: '1% AEP', dischargeM3s: 38, affluxAtFrom: 0.4234, affluxAtTo: 0.2871, maxAfflux: 0.4234, maxAffluxAt: 160,
  withScheme: { inundatedLength: 560.2, maxDepth: 0.351, maxWaterLevel: 34.4 }, withoutScheme: { inundatedLength: 0, maxDepth: 0, maxWaterLevel: 34.0 },
  floodingJudgedBy: 'ground-level', assessed: { from: 160, to: 720 }, category: 'affected',
};
const impact: LetterImpact = {
  parcel: { reference: 'HM-02', distanceFromM: 160, distanceToM: 720, bankSide: 'left', groundLevelM: 34.05, landUse: 'grazing pasture' },
  category: 'affected', impactThresholdM: 0.01, methods: ["Manning's equation for the friction of the channel", 'the direct step method for the water-surface profile'], engineVersion: '1.2.3',
  revision: { id: 'r', number: 2, status: 'countersigned' }, events: [base], governingEvent: 0, strip: null,
};

describe('what a letter says about the land', () => {
  it('puts the engine’s numbers in plain words, with their units', () => {
    expect(eventParagraph(base, impact)).toBe(
      'In the flood "1% AEP" (a river flow of 38.0 m³/s), the scheme would raise the river level beside your land by up to 0.42 m, greatest at 160 m upstream of the structure. ' +
        'The rise is 0.42 m at the downstream end of your land (160 m) and 0.29 m at its upstream end (720 m). ' +
        'Judged against the lowest ground level of your land (34.05 m above datum): without the scheme none of your river frontage would be under water; with the scheme 560 m would be, up to 0.35 m deep.',
    );
  });

  it('words the other categories, and a parcel assessed only in part', () => {
    expect(eventParagraph({ ...base, category: 'below-threshold', maxAfflux: 0.0042 }, impact)).toMatch(/by at most 0.004 m, less than the 0.01 m we count as an impact/);
    expect(eventParagraph({ ...base, category: 'not-affected', withScheme: base.withoutScheme }, impact)).toMatch(/would not change the river level beside your land\. With and without the scheme the water would stay below/);
    expect(eventParagraph({ ...base, category: 'outside-reach', assessed: null }, impact)).toMatch(/upstream of the stretch of river we calculated/);
    expect(eventParagraph({ ...base, assessed: { from: 160, to: 600 } }, impact)).toMatch(/covers your land only as far as 600 m upstream/);
    expect(eventParagraph({ ...base, withScheme: null, withoutScheme: null, floodingJudgedBy: null }, impact)).toMatch(/no ground or bank level for your land/);
  });

  it('always carries the caution naming the methods', () => {
    expect(cautionText(impact)).toMatch(/^These figures are estimates, calculated by Manning's equation for the friction of the channel, the direct step method/);
    expect(cautionText(impact)).toMatch(/never replace, the judgement of a licensed engineer and the local codes and regulations/);
  });

  it('names the standard step and the weir kind from the case', () => {
    const methods = namedMethods({ reach: { kind: 'surveyed' }, profile: { normalDepthTolerance: 0.01 }, control: { type: 'weir', kind: 'ogee' } } as never);
    expect(methods).toEqual(["Manning's equation for the friction of the channel", 'the standard step method for the water-surface profile', 'the ogee spillway equation for the level at the structure']);
  });
});

describe('the letter template', () => {
  it('refuses a free-text paragraph that quotes a quantity, naming the field', () => {
    const parsed = letterParagraphsSchema.safeParse({ ...DEFAULT_PARAGRAPHS, scheme: 'The water will rise by 0.3 m at the mill.' });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]).toMatchObject({ path: ['scheme'], message: expect.stringMatching(/must not quote levels/) });
    expect(letterParagraphsSchema.safeParse({ ...DEFAULT_PARAGRAPHS, contact: 'Telephone 01632 960 123' }).success).toBe(true);
    expect(letterParagraphsSchema.safeParse(DEFAULT_PARAGRAPHS).success).toBe(true);
  });

  it('fills the placeholders and leaves other braces alone', () => {
    const values = { owner_name: 'Edith', parcel_reference: 'HM-02', scheme_name: 'S', watercourse: 'River Wendle', site: 'X', postal_address: 'Weir Meadow Farm, Harrowfield', letter_date: '1 March 2026', response_deadline: '29 March 2026', officer_name: 'Lena', officer_role: 'Landowner liaison officer', certificate_number: 'C-1', verification_link: 'https://x.test/v' };
    expect(fillPlaceholders('{owner_name} at {parcel_reference} on the {watercourse} {unknown}, by {response_deadline}', values)).toBe('Edith at HM-02 on the River Wendle {unknown}, by 29 March 2026');
  });
});
