// What routing a flood through a reservoir costs, as a ratio to the same case checked at its steady peak, measured in
// the same run (issue 17). Only figures to read: no target is set yet.
import { readFileSync } from 'node:fs';
import { bench, describe } from 'vitest';
import { evaluateCase } from '@/lib/hydraulics';
import type { CaseInput } from '@/lib/validation/case-schema';
import { parseCase } from '@/lib/validation/parse-case';
import { machineDescription } from './machine';

// The invented Harrowfield Upper Pond (db/seeds/cases), without its sensitivity runs.
const parsed = parseCase({ ...JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-reservoir-spillway.json', 'utf8')), sensitivity: undefined });
if (!parsed.ok) throw new Error(`bench case invalid: ${JSON.stringify(parsed.issues)}`);
const routed: CaseInput = parsed.value;
const steady: CaseInput = { ...routed, reservoir: undefined, events: routed.events.map(({ hydrograph: _h, ...e }) => e) };

/** Fastest time per call over interleaved rounds, ms: the least disturbed by the other work on the machine. */
function fastest(subjects: (() => unknown)[], rounds: number): number[] {
  const best = subjects.map(() => Infinity);
  for (let round = 0; round < rounds; round++) {
    subjects.forEach((subject, i) => {
      const start = performance.now();
      subject();
      best[i] = Math.min(best[i], performance.now() - start);
    });
  }
  return best;
}

const [routedMs, steadyMs] = fastest([() => evaluateCase(routed), () => evaluateCase(steady)], 7);
const steps = evaluateCase(routed).events.map((e) => e.routing?.steps.length ?? 0);
console.log(`Machine: ${machineDescription()}`);
console.log(`two routed events (${steps.join(' and ')} routing steps, with self-checks) = ${(routedMs / steadyMs).toFixed(1)} × the same case at its steady peaks (${routedMs.toFixed(1)} ms against ${steadyMs.toFixed(1)} ms)`);

describe('reservoir routing (the ratio above; these timings are for reading only)', () => {
  bench('the Upper Pond case, routed', () => {
    evaluateCase(routed);
  }, { iterations: 5, time: 0 });
});
