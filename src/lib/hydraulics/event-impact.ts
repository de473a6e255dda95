// What the scheme does upstream in one event: afflux, extent of impact, inundation, the limits and the verdict.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ReachModel } from './case-reach';
import type { EventResult } from './case-result';
import type { AffluxPoint } from './impact/afflux';
import { extentOfImpact } from './impact/extent-of-impact';
import { checkLimits, type LimitCheck } from './impact/flood-limits';
import { inundationComparison } from './impact/inundation';
import type { GvfProfile } from './profiles/profile-point';
import type { WithoutScheme } from './profiles/without-scheme';
import type { Metres } from './units';

/** Afflux threshold for the extent of impact when the case gives none, m (common practice). */
export const DEFAULT_IMPACT_THRESHOLD = 0.01;

type Impact = Pick<EventResult, 'afflux' | 'extent' | 'inundation' | 'limits' | 'leastMargin' | 'verdict'>;

/** A routed reservoir's reach: limits within `length` of the structure stand in the level pool at its peak level. */
export interface LevelPool {
  length: Metres;
  peakLevel: Metres;
}

function inPool(limit: LimitCheck, pool: LevelPool | null): LimitCheck {
  if (pool === null || limit.distanceUpstream > pool.length) return limit;
  const margin = limit.maxLevel - limit.freeboard - pool.peakLevel;
  return { ...limit, waterLevel: pool.peakLevel, afflux: pool.peakLevel - limit.withoutSchemeLevel, margin, pass: pool.peakLevel + limit.freeboard <= limit.maxLevel, source: 'reservoir' };
}

export function eventImpact(input: CaseInput, model: ReachModel, profile: GvfProfile, levels: WithoutScheme, warnings: string[], pool: LevelPool | null = null): Impact {
  // The without-scheme level is read at each with-scheme point; it is defined along the whole reach.
  const afflux: AffluxPoint[] = profile.points.map((p) => ({ distanceUpstream: p.distanceUpstream, afflux: p.waterLevel - levels.levelAt(p.distanceUpstream) }));
  const extent = extentOfImpact(afflux, input.impactThreshold ?? DEFAULT_IMPACT_THRESHOLD, profile.stoppedBy);
  if (extent.warning) warnings.push(extent.warning.replace(/^the afflux/, extent.sense === 'drawdown' ? 'The drawdown' : 'The afflux'));

  let inundation: EventResult['inundation'] = null;
  if (model.bankLevelAt) {
    // Compared over the computed with-scheme profile; beyond it the levels with and without the scheme agree.
    const withoutAtSamePoints = profile.points.map((p) => {
      const waterLevel = levels.levelAt(p.distanceUpstream);
      return { ...p, waterLevel, depth: waterLevel - p.bedLevel };
    });
    inundation = inundationComparison(profile.points, withoutAtSamePoints, model.bankLevelAt);
    if (inundation.addedLength > 0) warnings.push(`The scheme floods ${inundation.addedLength.toFixed(1)} m more of the banks than without it.`);
  } else {
    warnings.push('No bank height or bank levels were given, so out-of-bank flooding was not checked.');
  }

  const limits = checkLimits(profile.points, levels.levelAt, input.limits, 'limits').map((l) => inPool(l, pool));
  const leastMargin = limits.length === 0 ? null : limits.reduce((m, l) => Math.min(m, l.margin), Infinity);
  return {
    afflux: { atControl: afflux[0]?.afflux ?? 0, max: afflux.reduce((m, a) => Math.max(m, a.afflux), 0), min: afflux.reduce((m, a) => Math.min(m, a.afflux), 0) },
    extent,
    inundation,
    limits,
    leastMargin,
    verdict: limits.every((l) => l.pass) ? 'pass' : 'fail',
  };
}
