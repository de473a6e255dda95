import { describe, expect, it } from 'vitest';
import type { LetterImpact } from '@/lib/letters/letter-impact';
import { DEFAULT_PARAGRAPHS } from '@/lib/letters/letter-template';
import { type LetterDocument, renderLetterPdf } from '@/lib/letters/render-letter-pdf';

// The fonts are parsed once per process and shared by every document (src/lib/pdf/fonts.ts): a document must not
// leave anything in them that changes the next one. An invented Harrowfield holding.
const impact: LetterImpact = {
  parcel: { reference: 'WH-017', distanceFromM: 340, distanceToM: 610, bankSide: 'right', groundLevelM: 34.3, landUse: 'orchard' },
  category: 'affected', impactThresholdM: 0.01, methods: ["Manning's equation"], engineVersion: 'test',
  revision: { id: 'r', number: 1, status: 'countersigned' }, governingEvent: 0, strip: null,
  events: [{ event: '1% AEP', dischargeM3s: 38, affluxAtFrom: 0.31, affluxAtTo: 0.2, maxAfflux: 0.31, maxAffluxAt: 340, withScheme: { inundatedLength: 120, maxDepth: 0.2, maxWaterLevel: 34.5 }, withoutScheme: { inundatedLength: 0, maxDepth: 0, maxWaterLevel: 34.2 }, floodingJudgedBy: 'ground-level', assessed: { from: 340, to: 610 }, category: 'affected' }],
};
const letter = (name: string, extra: string): LetterDocument => ({
  reference: 'WH-017', version: 1, date: '2026-11-30T09:00:00.000Z', letterDate: '2026-11-30', respondBy: '2026-12-28', preliminary: false, organisation: 'Wendle Valley Drainage Board',
  recipient: { name, address: '17 Mill Lane, Harrowfield' }, scheme: { name: 'Harrowfield Mill weir', reference: 'HM' },
  paragraphs: { ...DEFAULT_PARAGRAPHS, introduction: `${DEFAULT_PARAGRAPHS.introduction} ${extra}` }, impact,
});

describe('letter PDFs', () => {
  it('render to the same bytes for the same letter, whatever was rendered in between', async () => {
    const first = await renderLetterPdf(letter('Ada Orchardson', ''));
    await renderLetterPdf(letter('Quentin Zywiec-Ångström', 'Wholly different words: jumping quixotic fjords, 0123456789 — “quoted”.'));
    const again = await renderLetterPdf(letter('Ada Orchardson', ''));
    expect(again.equals(first)).toBe(true);
    expect(first.subarray(0, 5).toString()).toBe('%PDF-');
  });
});
