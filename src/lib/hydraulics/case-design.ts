// Crest sizing and sensitivity for a case: both re-run the evaluation with one input changed.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ControlAdjustments } from './case-control';
import type { CaseResult, EventResult } from './case-result';
import { sizeCrest } from './design/crest-sizing';
import { type Perturbation, routedPlan, type SensitivityPercentages, sensitivity } from './design/sensitivity';
import type { RoutingFactors } from './routing/event-routing';
import { InvalidInputError } from './errors';
import { type ReachModel, reachModel } from './case-reach';

export interface RunOptions {
  adjust: ControlAdjustments;
  manningFactor: number;
  dischargeFactor: number;
  skipSelfCheck: boolean;
  /** Storage and hydrograph-volume factors of a sensitivity run; default 1. */
  routingFactors?: RoutingFactors;
  /** Given, the events are evaluated largest flow first and only until one does not hold (a yes-or-no question). */
  holds?: (event: EventResult) => boolean;
}

/** Evaluates every event of `input` (SI) with the options; the evaluator's own loop. */
export type CaseRunner = (input: CaseInput, opts: RunOptions) => EventResult[];

const DEFAULT_SENSITIVITY: SensitivityPercentages = { manningN: 20, discharge: 20, coefficient: 10, storage: 20, hydrographVolume: 20 };

const QUICK: RunOptions = { adjust: {}, manningFactor: 1, dischargeFactor: 1, skipSelfCheck: true };

const m = (x: number) => `${x.toFixed(2)} m`;

interface SizingRange {
  lower: number;
  upper: number;
  /** Why the search ran over this range, in words. */
  why: string;
}

/**
 * Sill heights above the lowest allowed level at the structure cannot pass: on a subcritical backwater the level rises
 * going upstream, so the water at every limit stands at least at the crest. Nor can a sill above the bank, nor a crest
 * longer than the channel is wide at crest level (it would not be a crest across this channel).
 */
function physicalSillUpper(input: CaseInput, model: ReachModel): { upper: number; because: string } {
  const bounds: [number, string][] = [];
  const bank = model.bankLevelAt?.(0);
  if (bank !== undefined) bounds.push([bank - model.bedLevelAtControl, `the bank at the structure (${m(bank - model.bedLevelAtControl)} above the bed)`]);
  const highestAllowed = Math.max(...input.limits.map((l) => l.maxLevel - l.freeboard));
  if (Number.isFinite(highestAllowed)) bounds.push([highestAllowed - model.bedLevelAtControl, `the highest allowed level of the limits (${m(highestAllowed - model.bedLevelAtControl)} above the bed at the structure)`]);
  if (Number.isFinite(model.controlSection.maxDepth)) bounds.push([model.controlSection.maxDepth, `the top of the section (${m(model.controlSection.maxDepth)})`]);
  const [upper, because] = bounds.reduce((a, b) => (b[0] < a[0] ? b : a));
  return { upper, because };
}

function sizingRange(input: CaseInput, model: ReachModel, vary: 'sillHeight' | 'crestLength', increment: number): SizingRange {
  const control = input.control;
  if (control.type !== 'weir') throw new InvalidInputError('sizing', 'needs a weir control: a depth control has no crest to size');
  if (vary === 'crestLength' && control.kind === 'rating-table') throw new InvalidInputError('sizing.vary', 'cannot be crestLength for a rating-table control');
  const lower = input.sizing?.min ?? increment;
  let physical: { upper: number; because: string };
  if (vary === 'sillHeight') physical = physicalSillUpper(input, model);
  else if (control.kind === 'sharp-crested' && control.channelWidth !== undefined) physical = { upper: control.channelWidth, because: `the channel width given for the thin-plate weir (${m(control.channelWidth)})` };
  else {
    const width = model.controlSection.stateAtDepth(control.sillHeight).topWidth;
    physical = { upper: width, because: `the channel's width at crest level (${m(width)})` };
  }
  const upper = input.sizing?.max ?? physical.upper;
  if (upper <= lower) {
    throw new InvalidInputError(input.sizing?.max !== undefined ? 'sizing.max' : 'sizing.min', `leaves nothing to search: the range runs from ${m(lower)} to ${m(upper)} (${input.sizing?.max !== undefined ? 'the maximum given' : physical.because})`);
  }
  const what = vary === 'sillHeight' ? 'sill heights' : 'crest lengths';
  const from = input.sizing?.min !== undefined ? 'the minimum given' : 'one increment';
  const to = input.sizing?.max !== undefined ? 'the maximum given' : physical.because;
  return { lower, upper, why: `searched ${what} from ${m(lower)} (${from}) to ${m(upper)} (${to})` };
}

/** Where the least margin lies among the events of one run. */
export function leastMarginOf(events: readonly EventResult[]): { margin: number; event: string; limit: string } | null {
  let least: { margin: number; event: string; limit: string } | null = null;
  for (const e of events) for (const l of e.limits) if (least === null || l.margin < least.margin) least = { margin: l.margin, event: e.name, limit: l.label };
  return least;
}

const PERTURBATIONS = (p: SensitivityPercentages, routed: boolean): Perturbation[] => [
  { manningFactor: 1 + p.manningN / 100, dischargeFactor: 1, coefficientFactor: 1 },
  { manningFactor: 1 - p.manningN / 100, dischargeFactor: 1, coefficientFactor: 1 },
  { manningFactor: 1, dischargeFactor: 1 + p.discharge / 100, coefficientFactor: 1 },
  { manningFactor: 1, dischargeFactor: 1, coefficientFactor: 1 + p.coefficient / 100 },
  { manningFactor: 1, dischargeFactor: 1, coefficientFactor: 1 - p.coefficient / 100 },
  ...(routed ? routedPlan(p).map(([, perturbation]) => perturbation) : []),
];

/** The run options of a perturbation. */
function perturbedRun(p: Perturbation): Pick<RunOptions, 'manningFactor' | 'dischargeFactor' | 'routingFactors'> {
  return { manningFactor: p.manningFactor, dischargeFactor: p.dischargeFactor, routingFactors: { storage: p.storageFactor ?? 1, hydrographVolume: p.hydrographVolumeFactor ?? 1 } };
}

/** Whether any event of the case is routed through a reservoir. */
export function hasRoutedEvents(input: CaseInput): boolean {
  return input.reservoir !== undefined && input.events.some((e) => e.hydrograph !== undefined);
}

/** The highest sill, or the shortest crest, for which every limit passes in every event (with the minimum margin, and robustly if asked). */
export function crestSizing(input: CaseInput, run: CaseRunner): CaseResult['sizing'] {
  const sizing = input.sizing;
  if (!sizing) return null;
  if (input.limits.length === 0) throw new InvalidInputError('sizing', 'needs at least one limit to size the crest against');
  const model = reachModel(input.reach);
  const range = sizingRange(input, model, sizing.vary, sizing.increment);
  const minimumMargin = input.minimumMargin ?? 0;
  const percentages = input.sensitivity ?? DEFAULT_SENSITIVITY;
  const eventHolds = (e: EventResult) => e.verdict === 'pass' && (e.leastMargin === null || e.leastMargin >= minimumMargin);
  const holds = (events: EventResult[]) => events.every(eventHolds);
  // A value that passes had every event evaluated; the governing one is read from that run, not run again.
  const passingRuns = new Map<number, EventResult[]>();
  const passes = (value: number) => {
    const adjust = { [sizing.vary]: value };
    const events = run(input, { ...QUICK, adjust, holds: eventHolds });
    if (!holds(events)) return false;
    passingRuns.set(value, events);
    if (!sizing.robust) return true;
    return PERTURBATIONS(percentages, hasRoutedEvents(input)).every((p) =>
      holds(run(input, { ...QUICK, adjust: { ...adjust, coefficientMultiplier: p.coefficientFactor }, ...perturbedRun(p), holds: eventHolds })),
    );
  };
  const result = sizeCrest({ passes, lower: range.lower, upper: range.upper, increment: sizing.increment, direction: sizing.vary === 'sillHeight' ? 'highest-passing' : 'lowest-passing' });
  const governingRun = result.value === null ? null : (passingRuns.get(result.value) ?? run(input, { ...QUICK, adjust: { [sizing.vary]: result.value } }));
  const governing = governingRun === null ? null : leastMarginOf(governingRun);
  const demands = [minimumMargin > 0 ? `a margin of at least ${(minimumMargin * 1000).toFixed(0)} mm` : null, sizing.robust ? 'every sensitivity run passing' : null].filter((d) => d !== null);
  const reason = `${result.reason}; ${range.why}${demands.length > 0 ? `; sized for ${demands.join(' and ')}` : ''}`;
  return { ...result, reason, vary: sizing.vary, lower: range.lower, upper: range.upper, searchedRange: range.why, robust: sizing.robust ?? false, governing };
}

/** Sensitivity of the governing event (least margin, or the largest flow without limits) to n, Q and the coefficient. */
export function caseSensitivity(input: CaseInput, events: readonly EventResult[], governingIndex: number | null, run: CaseRunner): CaseResult['sensitivity'] {
  const percentages = input.sensitivity;
  if (!percentages) return null;
  const index = governingIndex ?? events.reduce((best, e, i) => (e.discharge > events[best].discharge ? i : best), 0);
  const designHead = events[index].control.weir?.designHead ?? undefined;
  const eventOnly: CaseInput = { ...input, events: [input.events[index]] };
  const runOne = (p: Perturbation) => {
    // The unperturbed run is the governing event itself, already evaluated with the same design head.
    const unperturbed = p.manningFactor === 1 && p.dischargeFactor === 1 && p.coefficientFactor === 1 && (p.storageFactor ?? 1) === 1 && (p.hydrographVolumeFactor ?? 1) === 1;
    const [event] = unperturbed ? [events[index]] : run(eventOnly, {
      adjust: { coefficientMultiplier: p.coefficientFactor, ...(designHead !== undefined ? { designHead } : {}) },
      ...perturbedRun(p),
      skipSelfCheck: true,
    });
    return { levelsAtLimits: event.limits.map((l) => l.waterLevel), extent: event.extent.distanceUpstream };
  };
  const routed = events[index].routing !== null && events[index].routing !== undefined;
  return { ...sensitivity(runOne, percentages, { routed }), event: events[index].name, percentages };
}
