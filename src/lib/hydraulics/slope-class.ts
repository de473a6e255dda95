// Classifying a reach's bed slope by comparing normal and critical depth.
import { InvalidInputError, requireFinite, requirePositive } from './errors';
import type { Metres, Slope } from './units';

export type SlopeClass = 'mild' | 'steep' | 'critical' | 'horizontal' | 'adverse';

export interface SlopeClassOptions {
  /** |yn − yc| ≤ relativeTolerance · yc counts as critical; default 0.001. */
  relativeTolerance?: number;
  /** Path of the bed slope in errors, default 'reach.bedSlope'. */
  field?: string;
}

/**
 * Mild when yn > yc, steep when yn < yc, critical when equal, horizontal when S₀ = 0, adverse when S₀ < 0
 * (Chow, Open-Channel Hydraulics, 1959, §9-1, classification of flow profiles — from memory).
 */
export function classifySlope(bedSlope: Slope, normalDepth: Metres | null, criticalDepth: Metres, opts: SlopeClassOptions = {}): SlopeClass {
  const field = opts.field ?? 'reach.bedSlope';
  const tolerance = opts.relativeTolerance ?? 0.001;
  requireFinite(bedSlope, field);
  requirePositive(criticalDepth, 'criticalDepth');
  requireFinite(tolerance, 'relativeTolerance');
  if (tolerance < 0) throw new InvalidInputError('relativeTolerance', 'must be 0 or more');
  if (bedSlope === 0) return 'horizontal';
  if (bedSlope < 0) return 'adverse';
  if (normalDepth === null) throw new InvalidInputError('normalDepth', 'is required when the bed falls in the direction of flow');
  requirePositive(normalDepth, 'normalDepth');
  if (Math.abs(normalDepth - criticalDepth) <= tolerance * criticalDepth) return 'critical';
  return normalDepth > criticalDepth ? 'mild' : 'steep';
}
