// Evaluating a whole case file: every event, the overall verdict, and crest sizing and sensitivity if asked for.
import type { CaseInput } from '@/lib/validation/case-schema';
import { defaultDesignHead } from './case-control';
import { type CaseRunner, caseSensitivity, crestSizing, leastMarginOf, type RunOptions } from './case-design';
import { failingRuns, robustness } from './design/robustness';
import { reachModel } from './case-reach';
import type { CaseResult, EventResult } from './case-result';
import { resultToUS } from './case-result-units';
import { casePlausibility } from './case-plausibility';
import { caseToSI, unitScale } from './case-units';
import { EngineError, InvalidInputError, NoPhysicalSolutionError } from './errors';
import { evaluateEvent } from './evaluate-event';
import { ENGINE_VERSION } from './version';

const BASE_RUN: RunOptions = { adjust: {}, manningFactor: 1, dischargeFactor: 1, skipSelfCheck: false };

const runEvents: CaseRunner = (input, opts) => {
  const model = reachModel(input.reach, opts.manningFactor);
  const designDischarges = input.events.map((e) => e.discharge * (1 + (e.climateChangeAllowance ?? 0) / 100) * opts.dischargeFactor);
  const designHead = opts.adjust.designHead ?? defaultDesignHead(input.control, model.controlSection, Math.max(...designDischarges), opts.adjust);
  const adjust = { ...opts.adjust, ...(designHead !== undefined ? { designHead } : {}) };
  const evaluate = (i: number) => evaluateEvent(input.events[i], i, { input, model, adjust, dischargeFactor: opts.dischargeFactor, skipSelfCheck: opts.skipSelfCheck, routingFactors: opts.routingFactors });
  const holds = opts.holds;
  if (holds === undefined) return input.events.map((_, i) => evaluate(i));
  // The largest flow is the likeliest to fail, so it goes first; the rest are needed only if it holds.
  const order = input.events.map((_, i) => i).sort((a, b) => designDischarges[b] - designDischarges[a] || a - b);
  const done: EventResult[] = [];
  for (const i of order) {
    done[i] = evaluate(i);
    if (!holds(done[i])) break;
  }
  return done.filter((e) => e !== undefined);
};

function governingEvent(events: readonly EventResult[]): CaseResult['governingEvent'] {
  let best: CaseResult['governingEvent'] = null;
  events.forEach((e, index) => {
    if (e.leastMargin !== null && (best === null || e.leastMargin < best.leastMargin)) best = { index, name: e.name, leastMargin: e.leastMargin };
  });
  return best;
}

function caseWarnings(input: CaseInput, events: readonly EventResult[], plausibility: readonly string[]): string[] {
  const warnings: string[] = [...plausibility];
  if (input.limits.length === 0) warnings.push('No limits were given: the verdict "pass" only means that nothing was checked against a limit.');
  if (input.reservoir !== undefined && !input.events.some((e) => e.hydrograph !== undefined)) {
    warnings.push("A reservoir was given but no event has an inflow hydrograph, so every event was checked at its steady peak discharge, without the reservoir's storage.");
  }
  const seen = new Set<string>();
  for (const event of events) {
    for (const w of event.warnings) {
      const line = `${event.name}: ${w}`;
      if (!seen.has(line)) warnings.push(line);
      seen.add(line);
    }
  }
  return warnings;
}

function evaluateInSI(input: CaseInput): CaseResult {
  const si = caseToSI(input);
  const scale = unitScale(input.units).length;
  const plausibility = casePlausibility(si, reachModel(si.reach), { toCaseUnits: (m) => m / scale, unit: input.units === 'US' ? 'ft' : 'm' });
  const events = runEvents(si, BASE_RUN);
  const governing = governingEvent(events);
  const sensitivity = caseSensitivity(si, events, governing?.index ?? null, runEvents);
  return {
    engineVersion: ENGINE_VERSION,
    title: input.title ?? '',
    units: 'SI',
    verdict: events.every((e) => e.verdict === 'pass') ? 'pass' : 'fail',
    warnings: caseWarnings(si, events, plausibility),
    events,
    governingEvent: governing,
    sizing: crestSizing(si, runEvents),
    sensitivity,
    robustness: robustness({
      verdict: events.every((e) => e.verdict === 'pass') ? 'pass' : 'fail',
      least: leastMarginOf(events),
      minimumMargin: si.minimumMargin ?? 0,
      failures: sensitivity && governing ? failingRuns(sensitivity, events[governing.index].limits, sensitivity.percentages) : [],
    }),
  };
}

/** H1's and H3's paths use `.0.` for list items and `.survey` for a station's ground; the case file has `[0]` and none. */
export function caseFieldPath(field: string): string {
  return field.replace(/\.(\d+)(?=\.|\[|$)/g, '[$1]').replace(/(reach\.sections\[\d+\])\.survey/, '$1');
}

function withCaseFieldPath(error: unknown): unknown {
  if (!(error instanceof EngineError)) return error;
  const field = caseFieldPath(error.field);
  if (field === error.field) return error;
  const reason = error.message.startsWith(`${error.field}: `) ? error.message.slice(error.field.length + 2) : error.message;
  if (error instanceof InvalidInputError) return new InvalidInputError(field, reason);
  if (error instanceof NoPhysicalSolutionError) return new NoPhysicalSolutionError(field, error.code, reason);
  return new EngineError(`${field}: ${reason}`, field, error.code);
}

/**
 * Evaluates a parsed case (see `parseCase`). Works in SI; a US-customary case is converted on the way in and
 * its result on the way out. Throws InvalidInputError or NoPhysicalSolutionError with the case-file path.
 */
export function evaluateCase(input: CaseInput): CaseResult {
  try {
    const result = evaluateInSI(input);
    return input.units === 'US' ? resultToUS(result) : result;
  } catch (error) {
    throw withCaseFieldPath(error);
  }
}
