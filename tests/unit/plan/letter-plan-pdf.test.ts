import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { LetterImpact } from '@/lib/letters/letter-impact';
import { DEFAULT_PARAGRAPHS } from '@/lib/letters/letter-template';
import { type LetterDocument, renderLetterPdf } from '@/lib/letters/render-letter-pdf';
import { LETTER_PLAN_SIZE } from '@/lib/plan/letter-plan-page';
import { parsePlanGeoJson } from '@/lib/plan/outlines-geojson';
import { layOutPlan } from '@/lib/plan/plan-drawing';

// The plan in a letter: the demo plan cropped round one parcel, drawn by pdfkit from the layout the browser draws.

const parsed = parsePlanGeoJson(readFileSync(path.resolve('db', 'seeds', 'parcels', 'harrowfield-plan.geojson'), 'utf8'));
if (!parsed.ok) throw new Error('the demo plan does not parse');
const drawing = layOutPlan({ geometry: parsed.plan, categories: new Map([['hm-02', 'affected']]), otherwise: 'other-land', inundated: [{ from: 200, to: 600 }], extent: { from: 0, to: 1500 }, ...LETTER_PLAN_SIZE, focus: 'HM-02' });
const impact: LetterImpact = {
  parcel: { reference: 'HM-02', distanceFromM: 160, distanceToM: 720, bankSide: 'left', groundLevelM: 34.05, landUse: 'grazing pasture' },
  category: 'affected', impactThresholdM: 0.01, methods: ["Manning's equation"], engineVersion: 'test',
  revision: { id: 'r', number: 1, status: 'countersigned' }, governingEvent: 0, strip: null,
  events: [{ event: '1% AEP', dischargeM3s: 38, affluxAtFrom: 0.3, affluxAtTo: 0.1, maxAfflux: 0.3, maxAffluxAt: 160, withScheme: { inundatedLength: 90, maxDepth: 0.1, maxWaterLevel: 34.2 }, withoutScheme: { inundatedLength: 0, maxDepth: 0, maxWaterLevel: 33.9 }, floodingJudgedBy: 'ground-level', assessed: { from: 160, to: 720 }, category: 'affected' }],
};
const letter: LetterDocument = {
  reference: 'SM-0001/HM-02/R1-L1', version: 1, date: '2026-11-30T09:00:00.000Z', letterDate: '2026-11-30', respondBy: '2026-12-28', preliminary: false, organisation: 'Wendle Valley Drainage Board',
  recipient: { name: 'Edith Lowther', address: 'Weir Meadow Farm, Harrowfield' }, scheme: { name: 'Harrowfield Mill weir renewal', reference: 'SM-0001' },
  paragraphs: DEFAULT_PARAGRAPHS, impact, plan: { drawing, coordinateSystem: 'Harrowfield site grid (invented, metres)', event: '1% AEP' },
};

describe('the plan in a letter', () => {
  it('crops round the parcel: its neighbours are other land, and parcels far off the page are left out', () => {
    expect(drawing.parcels.find((p) => p.reference === 'HM-02')?.category).toBe('affected');
    expect(drawing.parcels.filter((p) => p.reference !== 'HM-02').every((p) => p.category === 'other-land')).toBe(true);
    expect(drawing.parcels.map((p) => p.reference)).not.toContain('HM-09');
  });

  it('is drawn into the letter PDF with its heading and key, the same bytes each time', async () => {
    const pdf = await renderLetterPdf(letter);
    expect((await renderLetterPdf(letter)).equals(pdf)).toBe(true);
    mkdirSync('tests/.artifacts', { recursive: true });
    const file = 'tests/.artifacts/letter-with-plan.pdf';
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', ['-layout', file, '-']).toString();
    expect(text).toContain('Plan: where your land (HM-02) lies');
    expect(text).toContain('Other land');
    expect(text).toContain('Extent of impact');
    expect(pdf.length).toBeGreaterThan((await renderLetterPdf({ ...letter, plan: null })).length);
  });
});
