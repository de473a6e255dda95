// Which of the classical gradually-varied-flow profiles a depth lies on.
import { InvalidInputError } from '../errors';
import type { SlopeClass } from '../slope-class';
import type { Metres } from '../units';

export type { SlopeClass } from '../slope-class';

export type ProfileType = 'M1' | 'M2' | 'M3' | 'S1' | 'S2' | 'S3' | 'C1' | 'C3' | 'H2' | 'H3' | 'A2' | 'A3';

/** Profiles that lie above critical depth: the ones a downstream control can set, marching upstream. */
export const SUBCRITICAL_PROFILE_TYPES: readonly ProfileType[] = ['M1', 'M2', 'S1', 'C1', 'H2', 'A2'];

/**
 * The profile zone of `depth` between the normal and critical depths (Chow, Open-Channel Hydraulics, 1959,
 * §9-3 and Fig. 9-1 — from memory; Henderson, Open Channel Flow, 1966, §4.4 — from memory).
 * Zone 1 lies above both yn and yc, zone 2 between them, zone 3 below both; horizontal and adverse beds have
 * no normal depth, hence no zone 1. A depth exactly on a boundary is put in the zone above it (a control at
 * exactly normal depth gives a zero-length M1; a free overfall at exactly critical depth starts an M2).
 * C2 (uniform flow at critical depth) is not a profile a control can produce, so it is not reported.
 */
export function profileType(slopeClass: SlopeClass, depth: Metres, normalDepth: Metres | null, criticalDepth: Metres): ProfileType {
  if (!(depth > 0) || !Number.isFinite(depth)) throw new InvalidInputError('depth', 'must be a finite depth above 0');
  if (!(criticalDepth > 0) || !Number.isFinite(criticalDepth)) throw new InvalidInputError('criticalDepth', 'must be a finite depth above 0');
  const subcritical = depth >= criticalDepth;
  switch (slopeClass) {
    case 'horizontal':
      return subcritical ? 'H2' : 'H3';
    case 'adverse':
      return subcritical ? 'A2' : 'A3';
    case 'critical':
      return subcritical ? 'C1' : 'C3';
    case 'mild':
      if (depth >= requiredNormalDepth(normalDepth, slopeClass)) return 'M1';
      return subcritical ? 'M2' : 'M3';
    case 'steep':
      if (subcritical) return 'S1';
      return depth >= requiredNormalDepth(normalDepth, slopeClass) ? 'S2' : 'S3';
  }
}

function requiredNormalDepth(normalDepth: Metres | null, slopeClass: SlopeClass): Metres {
  if (normalDepth === null || !(normalDepth > 0) || !Number.isFinite(normalDepth)) {
    throw new InvalidInputError('normalDepth', `a ${slopeClass} bed needs a finite normal depth above 0`);
  }
  return normalDepth;
}
