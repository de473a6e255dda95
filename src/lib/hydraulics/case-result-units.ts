// The result of a US-customary case, converted back from SI: lengths to ft, discharges to ft³/s, velocities to ft/s.
import type { CaseResult, EventResult, WeirDetails } from './case-result';
import { unitScale } from './case-units';
import type { RunResult } from './design/sensitivity';
import type { Inundation, InundationComparison } from './impact/inundation';
import type { ProfilePoint } from './profiles/profile-point';
import { routingToUS } from './routing/routing-result-units';
import type { ValidityCheck } from './weirs';

export interface Back {
  length: (m: number) => number;
  discharge: (q: number) => number;
  weirCoefficient: (c: number) => number;
}

function backConverter(): Back {
  const k = unitScale('US');
  return { length: (m) => m / k.length, discharge: (q) => q / k.discharge, weirCoefficient: (c) => c / k.weirCoefficient };
}

function point(p: ProfilePoint, b: Back): ProfilePoint {
  const L = b.length;
  return { ...p, distanceUpstream: L(p.distanceUpstream), depth: L(p.depth), waterLevel: L(p.waterLevel), bedLevel: L(p.bedLevel), velocity: L(p.velocity), energyLevel: L(p.energyLevel) };
}

function check(c: ValidityCheck, b: Back): ValidityCheck {
  if (!c.name.endsWith('(m)')) return c;
  return {
    ...c,
    name: c.name.replace(/\(m\)$/, '(ft)'),
    value: b.length(c.value),
    ...(c.min !== undefined ? { min: b.length(c.min) } : {}),
    ...(c.max !== undefined ? { max: b.length(c.max) } : {}),
  };
}

function weir(w: WeirDetails, b: Back): WeirDetails {
  const L = b.length;
  return {
    ...w,
    sillHeight: L(w.sillHeight),
    head: L(w.head),
    energyHead: L(w.energyHead),
    approachVelocity: L(w.approachVelocity),
    coefficient: w.kind === 'ogee' ? b.weirCoefficient(w.coefficient) : w.coefficient,
    coefficientForm: w.coefficientForm.unit === 'm^½/s' && b.weirCoefficient(1) !== 1 ? { ...w.coefficientForm, unit: 'ft^½/s' } : w.coefficientForm,
    tailwaterDepth: w.tailwaterDepth === null ? null : L(w.tailwaterDepth),
    submergence: w.submergence && { ...w.submergence, tailwaterHead: L(w.submergence.tailwaterHead) },
    validity: w.validity.map((c) => check(c, b)),
    designHead: w.designHead === null ? null : L(w.designHead),
  };
}

function flooded(i: Inundation, b: Back): Inundation {
  const L = b.length;
  return {
    stretches: i.stretches.map((s) => ({ from: L(s.from), to: L(s.to), length: L(s.length), maxDepth: L(s.maxDepth) })),
    totalLength: L(i.totalLength),
    maxDepth: L(i.maxDepth),
    extentUpstream: L(i.extentUpstream),
  };
}

function inundationBack(i: InundationComparison, b: Back): InundationComparison {
  return { withScheme: flooded(i.withScheme, b), withoutScheme: flooded(i.withoutScheme, b), addedLength: b.length(i.addedLength) };
}

function eventBack(e: EventResult, b: Back): EventResult {
  const L = b.length;
  return {
    ...e,
    discharge: b.discharge(e.discharge),
    baseDischarge: b.discharge(e.baseDischarge),
    normalDepth: L(e.normalDepth),
    criticalDepth: L(e.criticalDepth),
    control: { ...e.control, head: L(e.control.head), depth: L(e.control.depth), level: L(e.control.level), structureDepth: L(e.control.structureDepth), weir: e.control.weir && weir(e.control.weir, b) },
    profile: e.profile.map((p) => point(p, b)),
    selfCheck: e.selfCheck && { ...e.selfCheck, maxLevelDifference: L(e.selfCheck.maxLevelDifference) },
    withoutScheme: { ...e.withoutScheme, controlDepth: L(e.withoutScheme.controlDepth), controlLevel: L(e.withoutScheme.controlLevel), profile: e.withoutScheme.profile.map((p) => point(p, b)) },
    afflux: { atControl: L(e.afflux.atControl), max: L(e.afflux.max), min: L(e.afflux.min) },
    extent: {
      ...e.extent,
      distanceUpstream: L(e.extent.distanceUpstream),
      ...(e.extent.affluxAtReachEnd !== undefined ? { affluxAtReachEnd: L(e.extent.affluxAtReachEnd) } : {}),
    },
    jump: e.jump && { distanceUpstream: L(e.jump.distanceUpstream), upstreamDepth: L(e.jump.upstreamDepth), downstreamDepth: L(e.jump.downstreamDepth) },
    inundation: e.inundation && inundationBack(e.inundation, b),
    limits: e.limits.map((l) => ({
      ...l,
      distanceUpstream: L(l.distanceUpstream),
      maxLevel: L(l.maxLevel),
      freeboard: L(l.freeboard),
      waterLevel: L(l.waterLevel),
      withoutSchemeLevel: L(l.withoutSchemeLevel),
      afflux: L(l.afflux),
      margin: L(l.margin),
    })),
    leastMargin: e.leastMargin === null ? null : L(e.leastMargin),
    routing: e.routing ? routingToUS(e.routing, b) : null,
  };
}

function runBack(r: RunResult, b: Back): RunResult {
  return { levelsAtLimits: r.levelsAtLimits.map(b.length), extent: b.length(r.extent) };
}

/** The result in US customary units. Numbers quoted inside warning and reason texts stay in SI, and a warning says so. */
export function resultToUS(result: CaseResult): CaseResult {
  const b = backConverter();
  const L = b.length;
  const sensitivity = result.sensitivity;
  return {
    ...result,
    units: 'US',
    warnings: [...result.warnings, 'Numbers quoted inside warning and explanation texts are in SI units (m, m³/s); the result fields are in ft and ft³/s.'],
    events: result.events.map((e) => eventBack(e, b)),
    governingEvent: result.governingEvent && { ...result.governingEvent, leastMargin: L(result.governingEvent.leastMargin) },
    sizing: result.sizing && {
      ...result.sizing,
      value: result.sizing.value === null ? null : L(result.sizing.value),
      lower: L(result.sizing.lower),
      upper: L(result.sizing.upper),
      governing: result.sizing.governing && { ...result.sizing.governing, margin: L(result.sizing.governing.margin) },
    },
    robustness: { ...result.robustness, minimumMargin: L(result.robustness.minimumMargin) },
    sensitivity: sensitivity && {
      ...sensitivity,
      base: runBack(sensitivity.base, b),
      cases: sensitivity.cases.map((c) => ({
        ...c,
        result: c.result && runBack(c.result, b),
        levelChanges: c.levelChanges && c.levelChanges.map(L),
        extentChange: c.extentChange === null ? null : L(c.extentChange),
      })),
    },
  };
}
