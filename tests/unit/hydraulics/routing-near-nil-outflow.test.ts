import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { parseCase } from '@/lib/validation/parse-case';

// A pond full to the crest passes almost nothing at first: the storage-indication equation's bracket then spans outflows
// of 1e-9 m³/s, and the sign of its residual at the lower end is round-off. The march must carry on (the level can only
// rise while water flows in), not report a draw-down. The Harrowfield broad-crested demo, its tailwater 0.4 m over the
// crest, is given a reservoir here (invented figures).
describe('a reservoir full to the crest when the flood starts', () => {
  const file = JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-broad-crested.json', 'utf8'));
  delete file.sizing;
  delete file.sensitivity;
  const crest = file.reach.bedLevelAtControl + file.control.sillHeight;
  file.reservoir = { storage: { kind: 'level-area', rows: [{ level: crest - 1, area: 50_000 }, { level: crest + 3, area: 90_000 }] } };
  file.events[1].hydrograph = { kind: 'unit-shape', shape: 'nrcs-dimensionless', timeToPeak: 3 };
  const parsed = parseCase(file);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));

  it('routes the flood: the level never falls below the crest, and the volume balance closes', { timeout: 60_000 }, () => {
    const routing = evaluateCase(parsed.value).events[1].routing!;
    expect(routing.steps.every((s) => s.level >= crest - 1e-9)).toBe(true);
    expect(routing.peakLevel.level).toBeGreaterThan(crest);
    expect(routing.outflowPeak.discharge).toBeLessThan(routing.inflowPeak.discharge);
    expect(Math.abs(routing.volumeBalance.residual)).toBeLessThan(1e-9 * routing.volumeBalance.inflow);
    expect(routing.selfCheck!.peakLevelDifference).toBeLessThan(2e-3);
  });
});
