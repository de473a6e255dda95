import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { renderCalculationSheet } from '@/lib/pdf/calculation-sheet';
import { parseCase } from '@/lib/validation/parse-case';
import { routingResultFixture } from '../../fixtures/routing/routing-result-fixture';

// The calculation sheet of a demo case with an invented routing attached to its first event: the sheet must print the
// routing's inputs, method, peak figures, chart legend and assumptions, and print nothing of routing for other events.

function routedSheetText(): Promise<string> {
  const parsed = parseCase(JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-broad-crested.json', 'utf8')));
  if (!parsed.ok) throw new Error('the demo case no longer parses');
  const result = evaluateCase(parsed.value);
  const events = result.events.map((e, i) => ({ ...e, routing: i === 0 ? routingResultFixture() : null }));
  return renderCalculationSheet({
    scheme: { reference: 'WND-7', name: 'Harrowfield weir', watercourse: 'River Wendle', site: 'Harrowfield' },
    revision: { number: 1, status: { kind: 'draft' } },
    designer: 'A. Designer',
    datum: 'Ordnance Datum Newlyn',
    input: parsed.value,
    result: { ...result, events },
    generatedAt: new Date('2026-12-01T10:00:00Z'),
  }).then((pdf) => {
    mkdirSync('tests/.artifacts', { recursive: true });
    const file = path.join('tests/.artifacts', 'routing-calculation-sheet.pdf');
    writeFileSync(file, pdf);
    return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
  });
}

describe('routing on the calculation sheet', () => {
  it('summarises the inflow and storage, names the method, and prints the peaks, the chart legend and the assumptions', async () => {
    const text = await routedSheetText();
    expect(text).toContain('Flood routed through the reservoir');
    expect(text).toContain('9 points entered by the designer');
    expect(text).toContain('table of surface area by level, 5 rows from 60.500 to 63.500 m above Ordnance Datum Newlyn');
    expect(text).toContain('Routing method Fixture Author, A Hydrology Text, 2000, section 1 (invented for the tests)');
    expect(text).toContain('Peak outflow 30.000 m³/s at 8.00 h');
    expect(text).toContain('Peak reservoir level 61.760 m above Ordnance Datum Newlyn at 8.00 h');
    expect(text).toContain('12.000 m³/s lower, 2.00 h later');
    expect(text).toContain('left over 0.2 m³');
    expect(text).toContain('peak level differs by 0.0002 m');
    expect(text).toContain('Reservoir level (m above Ordnance Datum Newlyn)');
    expect(text).toContain('The reservoir surface is level from the structure to its head.');
    expect(text.match(/Flood routed through the reservoir,/g)).toHaveLength(1);
  });
});
