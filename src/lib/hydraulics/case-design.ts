// Crest sizing and sensitivity for a case: both re-run the evaluation with one input changed.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ControlAdjustments } from './case-control';
import type { CaseResult, EventResult } from './case-result';
import { sizeCrest } from './design/crest-sizing';
import { type Perturbation, sensitivity } from './design/sensitivity';
import { InvalidInputError } from './errors';

export interface RunOptions {
  adjust: ControlAdjustments;
  manningFactor: number;
  dischargeFactor: number;
  skipSelfCheck: boolean;
}

/** Evaluates every event of `input` (SI) with the options; the evaluator's own loop. */
export type CaseRunner = (input: CaseInput, opts: RunOptions) => EventResult[];

const QUICK: RunOptions = { adjust: {}, manningFactor: 1, dischargeFactor: 1, skipSelfCheck: true };

/** Default search range: from one increment up to three times the present value (a sharp crest no wider than its channel). */
function sizingRange(input: CaseInput, vary: 'sillHeight' | 'crestLength', increment: number): { lower: number; upper: number } {
  const control = input.control;
  if (control.type !== 'weir') throw new InvalidInputError('sizing', 'needs a weir control: a depth control has no crest to size');
  if (vary === 'crestLength' && control.kind === 'rating-table') throw new InvalidInputError('sizing.vary', 'cannot be crestLength for a rating-table control');
  const present = vary === 'sillHeight' ? control.sillHeight : (control.crestLength ?? increment);
  const widest = vary === 'crestLength' && control.kind === 'sharp-crested' && control.channelWidth !== undefined ? control.channelWidth : Infinity;
  const lower = input.sizing?.min ?? increment;
  const upper = input.sizing?.max ?? Math.min(widest, Math.max(3 * present, lower + increment));
  if (upper <= lower) throw new InvalidInputError('sizing.max', `must be greater than the lower end of the search (${lower} m)`);
  return { lower, upper };
}

/** The highest sill, or the shortest crest, for which every limit passes in every event. */
export function crestSizing(input: CaseInput, run: CaseRunner): CaseResult['sizing'] {
  const sizing = input.sizing;
  if (!sizing) return null;
  const { lower, upper } = sizingRange(input, sizing.vary, sizing.increment);
  if (input.limits.length === 0) throw new InvalidInputError('sizing', 'needs at least one limit to size the crest against');
  const passes = (value: number) => run(input, { ...QUICK, adjust: { [sizing.vary]: value } }).every((e) => e.verdict === 'pass');
  const result = sizeCrest({ passes, lower, upper, increment: sizing.increment, direction: sizing.vary === 'sillHeight' ? 'highest-passing' : 'lowest-passing' });
  return { ...result, vary: sizing.vary, lower, upper };
}

/** Sensitivity of the governing event (least margin, or the largest flow without limits) to n, Q and the coefficient. */
export function caseSensitivity(input: CaseInput, events: readonly EventResult[], governingIndex: number | null, run: CaseRunner): CaseResult['sensitivity'] {
  const percentages = input.sensitivity;
  if (!percentages) return null;
  const index = governingIndex ?? events.reduce((best, e, i) => (e.discharge > events[best].discharge ? i : best), 0);
  const designHead = events[index].control.weir?.designHead ?? undefined;
  const eventOnly: CaseInput = { ...input, events: [input.events[index]] };
  const runOne = (p: Perturbation) => {
    const [event] = run(eventOnly, {
      adjust: { coefficientMultiplier: p.coefficientFactor, ...(designHead !== undefined ? { designHead } : {}) },
      manningFactor: p.manningFactor,
      dischargeFactor: p.dischargeFactor,
      skipSelfCheck: true,
    });
    return { levelsAtLimits: event.limits.map((l) => l.waterLevel), extent: event.extent.distanceUpstream };
  };
  return { ...sensitivity(runOne, percentages), event: events[index].name, percentages };
}
