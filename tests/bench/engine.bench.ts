import { readFileSync } from 'node:fs';
import { bench, describe } from 'vitest';
import { directStepProfile, evaluateCase, normalDepth, prismaticSection } from '@/lib/hydraulics';
import { distancePerDepth } from '@/lib/hydraulics/profiles/ode-self-check';
import { Solver } from '@/lib/hydraulics/profiles/odex-solver';
import { parseCase } from '@/lib/validation/parse-case';

// The invented Harrowfield Mill reach (db/seeds/cases): trapezoid 10 m wide, 2:1 sides, n 0.035, S0 0.0006, 38 m³/s.
const section = prismaticSection({ shape: 'trapezoidal', bottomWidth: 10, sideSlope: 2 }, 0.035);
const discharge = 38;
const bedSlope = 0.0006;
const controlDepth = 2.95;
const tolerance = 0.01;
const yn = normalDepth(section, discharge, bedSlope);

function odexExtent(relativeTolerance: number): number {
  const solver = new Solver(1);
  solver.relativeTolerance = relativeTolerance;
  solver.absoluteTolerance = relativeTolerance;
  solver.maxSteps = 10_000;
  const end = solver.solve((y) => [distancePerDepth(section, discharge, bedSlope, y)], controlDepth, [0], yn * (1 + tolerance));
  return end.y[0];
}

// Equal accuracy is checked, not assumed: odex's extent must agree with the converged direct step's within 0.1 %.
const ODEX_TOLERANCE = 1e-4;
const directStepExtent = directStepProfile({ section, discharge, bedSlope, controlDepth, bedLevelAtControl: 31.2, reachLength: 12_000, normalDepthTolerance: tolerance, skipSelfCheck: true }).points.at(-1)!.distanceUpstream;
const odexDifference = Math.abs(odexExtent(ODEX_TOLERANCE) - directStepExtent) / directStepExtent;
if (odexDifference > 1e-3) throw new Error(`odex at ${ODEX_TOLERANCE} differs by ${(odexDifference * 100).toFixed(3)} % from the direct step: not equal accuracy`);

describe('one converged backwater profile (M1, 4.5 km)', () => {
  bench('direct step, refined until the extent changes < 0.1 % on halving', () => {
    directStepProfile({ section, discharge, bedSlope, controlDepth, bedLevelAtControl: 31.2, reachLength: 12_000, normalDepthTolerance: tolerance, skipSelfCheck: true });
  });
  bench(`odex (general-purpose ODE integrator) at equal accuracy (extent within ${(odexDifference * 100).toFixed(3)} %)`, () => {
    odexExtent(ODEX_TOLERANCE);
  });
});

const demo = JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-broad-crested.json', 'utf8'));
const fullCase = parseCase({
  ...demo,
  events: [
    { name: '50% AEP', discharge: 14 },
    { name: '1% AEP', discharge: 38 },
    { name: '0.1% AEP', discharge: 52, climateChangeAllowance: 20 },
  ],
  sizing: { vary: 'sillHeight', increment: 0.01, min: 0.3, max: 2.5 },
  sensitivity: { manningN: 20, discharge: 20, coefficient: 10 },
});
if (!fullCase.ok) throw new Error(`bench case invalid: ${JSON.stringify(fullCase.issues)}`);

describe('a full case', () => {
  bench('three events, with and without the scheme, crest sizing and sensitivity', () => {
    evaluateCase(fullCase.value);
  }, { iterations: 5, time: 0 });
});
