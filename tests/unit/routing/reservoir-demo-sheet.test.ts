import { execFileSync } from 'node:child_process';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { renderCalculationSheet } from '@/lib/pdf/calculation-sheet';
import { parseCase } from '@/lib/validation/parse-case';

// The routed demo case (the spillway above Harrowfield) through the real engine and onto the calculation sheet: the
// reservoir's inputs are listed in full, so the routing can be rebuilt from the sheet, and each routed event has its section.

describe('the calculation sheet of the routed demo case', () => {
  it('lists the storage row by row and each hydrograph as entered, then the routing of both events', async () => {
    const raw = JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-reservoir-spillway.json', 'utf8')) as { reservoir: { storage: { rows: { level: number; area: number }[] } }; events: { hydrograph: { kind: string; points?: { time: number; discharge: number }[]; timeToPeak?: number } }[] };
    const parsed = parseCase(raw);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    const result = evaluateCase(parsed.value);
    const pdf = await renderCalculationSheet({
      scheme: { reference: 'SM-DEMO', name: 'Upper Pond spillway', watercourse: 'River Wendle', site: 'above Harrowfield' },
      revision: { number: 1, status: { kind: 'draft' } },
      designer: 'A. Designer',
      datum: 'Wendle Valley local datum',
      input: parsed.value,
      result,
      generatedAt: new Date('2026-12-01T10:00:00Z'),
    });
    mkdirSync('tests/.artifacts', { recursive: true });
    const file = path.join('tests/.artifacts', 'reservoir-demo-calculation-sheet.pdf');
    writeFileSync(file, pdf);
    const text = execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('The reservoir and the inflow hydrographs');
    for (const row of raw.reservoir.storage.rows) expect(text).toContain(`${row.level.toFixed(3)} ${row.area.toFixed(0)}`);
    const table = raw.events[0].hydrograph.points!;
    expect(text).toContain(`(${table.length} points)`);
    for (const p of table) expect(text).toContain(`${p.time.toFixed(3)} ${p.discharge.toFixed(3)}`);
    expect(text).toContain(`time to peak ${raw.events[1].hydrograph.timeToPeak!.toFixed(2)} h`);
    for (const e of result.events) {
      expect(e.routing, e.name).not.toBeNull();
      expect(text).toContain(`Flood routed through the reservoir, ${e.name}`);
      expect(text).toContain(`Peak reservoir level ${e.routing!.peakLevel.level.toFixed(3)} m above Wendle Valley local datum`);
    }
    expect(text).toContain("the reservoir's storage 20 % larger and smaller, and the flood's volume 20 % larger and smaller");
  });
});
