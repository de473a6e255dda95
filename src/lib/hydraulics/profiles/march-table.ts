// The nodes of one direct-step march, column by column: what each depth gives, evaluated once.
import { InvalidInputError } from '../errors';
import { wettedState } from '../flow-properties';
import type { FlowSection } from '../section';
import { emptySample, sampleSection } from '../section-sample';
import type { CubicMetresPerSecond, Metres } from '../units';
import { GRAVITY } from '../units';
import type { ProfilePoint } from './profile-point';

/**
 * Node i holds a depth, its distance upstream and the properties the step and the reported point are made of.
 * Why columns of plain numbers: a converged profile evaluates hundreds of depths per event, and sizing repeats that
 * dozens of times; one evaluation per depth with no object per node keeps that to arithmetic. (Plain arrays, not
 * typed ones: allocating small typed arrays costs more than the whole march.)
 */
export class MarchTable {
  readonly depth: number[] = [];
  readonly distance: number[] = [];
  /** Specific energy y + αV²/2g, m. */
  readonly energy: number[] = [];
  /** Friction slope (Q/K)². */
  readonly friction: number[] = [];
  readonly area: number[] = [];
  readonly topWidth: number[] = [];
  readonly energyCoefficient: number[] = [];
  count = 0;
  private readonly sample = emptySample();

  constructor(
    readonly section: FlowSection,
    readonly discharge: CubicMetresPerSecond,
  ) {}

  /**
   * Evaluates `depth` into slot i: E = y + αV²/(2g) with V = Q/A (Chow, Open-Channel Hydraulics, 1959, §3-2 — from
   * memory) and Sf = (Q/K)² (Manning's formula solved for the energy slope; Chow 1959, §10-1 — from memory).
   */
  evaluate(i: number, depth: Metres): void {
    const { section, discharge, sample } = this;
    sampleSection(section, depth, sample);
    // The usual checks (and their messages) apply only when something is wrong, so that the march stays arithmetic.
    if (!(depth > 0) || !(sample.area > 0) || !(sample.conveyance > 0)) wettedState(section, depth, discharge);
    const velocity = discharge / sample.area;
    const energy = depth + (sample.energyCoefficient * velocity * velocity) / (2 * GRAVITY);
    const friction = (discharge / sample.conveyance) ** 2;
    if (!Number.isFinite(energy) || !Number.isFinite(friction)) throw new InvalidInputError('discharge', 'is out of range for this section (the result overflows)');
    this.depth[i] = depth;
    this.energy[i] = energy;
    this.friction[i] = friction;
    this.area[i] = sample.area;
    this.topWidth[i] = sample.topWidth;
    this.energyCoefficient[i] = sample.energyCoefficient;
  }

  /** Node i as a reported point, derived from its stored properties exactly as profilePointAt derives them. */
  point(i: number, bedLevel: Metres): ProfilePoint {
    const depth = this.depth[i];
    const area = this.area[i];
    const velocity = this.discharge / area;
    const froude = velocity * Math.sqrt((this.energyCoefficient[i] * this.topWidth[i]) / (GRAVITY * area));
    if (!Number.isFinite(velocity) || !Number.isFinite(froude)) throw new InvalidInputError('discharge', 'is out of range for this section (the result overflows)');
    return {
      distanceUpstream: this.distance[i],
      depth,
      waterLevel: bedLevel + depth,
      bedLevel,
      velocity,
      froude,
      frictionSlope: this.friction[i],
      // Energy level = bed level + specific energy y + αV²/2g (Chow, Open-Channel Hydraulics, 1959, §3-1 — from memory).
      energyLevel: bedLevel + this.energy[i],
    };
  }
}
