import { InvalidInputError, NoPhysicalSolutionError, requireFinite } from '../errors';
import type { FlowSection } from '../section';
import type { CubicMetresPerSecond, Metres } from '../units';
import { approachState } from './approach';
import { freeFlowRating } from './ratings';
import { tailwaterHead } from './submergence';
import type { WeirOptions, WeirSpec } from './weir-types';

const MAX_ITERATIONS = 2000;
const RELATIVE_TOLERANCE = 1e-14;

/**
 * The forward rating: discharge at measured head h. With the approach velocity in the equation,
 * Q = f(h + αQ²/(2g·A²)) is solved by successive substitution from Q₀ = f(h). f rises with Q, so the
 * iterates rise monotonically to the smallest root, the one with a slow approach; the cap and the
 * check for a critical approach stop it when there is none.
 */
export function weirDischarge(spec: WeirSpec, head: Metres, approach: FlowSection, opts: WeirOptions = {}): CubicMetresPerSecond {
  const field = opts.field ?? 'control';
  requireFinite(head, 'head');
  if (head < 0) throw new InvalidInputError('head', 'must be 0 or more');
  const rating = freeFlowRating(spec, field);
  const tailwater = spec.tailwaterDepth === undefined ? 0 : tailwaterHead(spec.tailwaterDepth, spec.sillHeight);
  const freeDischarge = (energyHead: Metres) => rating.discharge(head, energyHead) * rating.submergence.factor(head, energyHead, tailwater);
  if (spec.approachVelocity === false || !rating.usesEnergyHead || head === 0) return freeDischarge(head);
  let discharge = freeDischarge(head);
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    const { velocityHead, velocity } = approachState(approach, spec.sillHeight, head, discharge, opts.energyCoefficient, field);
    const next = freeDischarge(head + velocityHead);
    if (!Number.isFinite(next) || velocityHead > head + spec.sillHeight || velocity <= 0) break;
    if (Math.abs(next - discharge) <= RELATIVE_TOLERANCE * next) return next;
    discharge = next;
  }
  throw new NoPhysicalSolutionError(
    field,
    'weir-no-control',
    `at a head of ${head.toPrecision(4)} m the approach velocity head grows faster than the weir can pass the flow; no steady discharge exists`,
  );
}
