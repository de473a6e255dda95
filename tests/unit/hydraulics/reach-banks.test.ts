import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { reachModel } from '@/lib/hydraulics/case-reach';
import { caseToSI } from '@/lib/hydraulics/case-units';
import { bankLevelAlong, reachLengthOf } from '@/lib/hydraulics/reach-banks';
import { parseCase } from '@/lib/validation/parse-case';

// The pages read the banks without building the reach's sections; the engine reads them from its built sections.
// Both must give the same level everywhere along the reach (an internal cross-check, no outside source needed).
const caseFrom = (file: string) => {
  const parsed = parseCase(JSON.parse(readFileSync(`db/seeds/cases/${file}`, 'utf8')));
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return caseToSI(parsed.value);
};

function expectSameBanks(reach: Parameters<typeof reachModel>[0]) {
  const model = reachModel(reach);
  const light = bankLevelAlong(reach);
  expect(light === null).toBe(model.bankLevelAt === null);
  expect(reachLengthOf(reach)).toBe(model.length);
  for (let i = 0; i <= 200; i++) {
    const d = (model.length * 1.1 * i) / 200;
    expect(light!(d)).toBe(model.bankLevelAt!(d));
  }
}

describe('bank levels along the reach without building its sections', () => {
  it('match the engine’s reach model on the demo cases, surveyed and prismatic', () => {
    for (const file of ['wendle-harrowfield-surveyed-broad-crested.json', 'wendle-harrowfield-broad-crested.json']) expectSameBanks(caseFrom(file).reach);
  });

  it('match it on an invented surveyed reach with bank stations on and between points, a given bank level and ground stepping at a bank', () => {
    const sections = Array.from({ length: 12 }, (_, i) => ({
      distanceUpstream: i * 37,
      manningN: 0.04,
      bankStations: (i % 2 === 0 ? [4, 16] : [6.5, 18]) as [number, number],
      points: [[0, 36 + i * 0.02], [4, 34.1 + i * 0.02], [4, 33.2 + i * 0.02], [9, 30 + i * 0.02], [16, 33.6 + i * 0.03], [20, 36.5]] as [number, number][],
      ...(i === 5 ? { bankLevel: 34.9 } : {}),
    }));
    expectSameBanks({ kind: 'surveyed', sections } as Parameters<typeof reachModel>[0]);
  });
});
