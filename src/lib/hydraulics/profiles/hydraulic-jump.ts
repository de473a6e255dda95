// The hydraulic jump that ends an S1 profile on a steep reach.
import type { Metres } from '../units';
import type { JumpLocation } from './profile-point';
import type { BackwaterRegime } from './profile-regime';

export interface JumpReport {
  jump: JumpLocation | null;
  warnings: string[];
}

/**
 * On a steep reach the flow arrives supercritical at normal depth yn; the S1 backwater curve rises from the
 * jump, whose downstream (sequent) depth y₂ satisfies equal specific force with yn (Chow, Open-Channel
 * Hydraulics, 1959, §3-7 and ch. 15 — from memory). Upstream of the jump the flow stays at normal depth, so
 * the scheme has no effect there. A control at or below y₂ cannot hold a jump upstream: the jump is swept down
 * to the control itself.
 */
export function jumpReport(regime: BackwaterRegime, jumpDistance: Metres | null): JumpReport {
  if (jumpDistance === null || regime.endsBy !== 'hydraulic-jump' || regime.normalDepth === null || regime.endDepth === null) return { jump: null, warnings: [] };
  const jump: JumpLocation = { distanceUpstream: jumpDistance, upstreamDepth: regime.normalDepth, downstreamDepth: regime.endDepth };
  const where =
    jumpDistance === 0
      ? `the control depth ${regime.controlDepth.toFixed(3)} m does not exceed the depth sequent to normal flow (${regime.endDepth.toFixed(3)} m), so the jump forms at the control`
      : `a hydraulic jump forms ${jumpDistance.toFixed(1)} m upstream of the control`;
  return { jump, warnings: [`${where}; upstream of it the flow is supercritical at normal depth ${regime.normalDepth.toFixed(3)} m and unaffected by the scheme`] };
}
