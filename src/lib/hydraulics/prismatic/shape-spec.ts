import { InvalidInputError, requireNonNegative, requirePositive } from '../errors';
import type { Metres } from '../units';
import type { TrapezoidDimensions } from './trapezoid-geometry';

/** Field names match the case file's `reach.section`; a side slope is the horizontal run per unit rise (z:1). */
export type PrismaticShapeSpec =
  | { shape: 'rectangular'; width: Metres }
  | { shape: 'trapezoidal'; bottomWidth: Metres; sideSlope?: number; sideSlopeLeft?: number; sideSlopeRight?: number }
  | { shape: 'triangular'; sideSlope?: number; sideSlopeLeft?: number; sideSlopeRight?: number }
  | { shape: 'circular'; diameter: Metres };

export type ValidatedShape =
  | { kind: 'open'; shape: 'rectangular' | 'trapezoidal' | 'triangular'; dimensions: TrapezoidDimensions }
  | { kind: 'circular'; diameter: Metres };

const SHAPES = ['rectangular', 'trapezoidal', 'triangular', 'circular'] as const;

interface SideSlopeSpec {
  sideSlope?: number;
  sideSlopeLeft?: number;
  sideSlopeRight?: number;
}

function sideSlopes(spec: SideSlopeSpec, field: string): { left: number; right: number } {
  const left = spec.sideSlopeLeft ?? spec.sideSlope;
  const right = spec.sideSlopeRight ?? spec.sideSlope;
  if (left === undefined || right === undefined) {
    throw new InvalidInputError(`${field}.sideSlope`, 'is required (or give both sideSlopeLeft and sideSlopeRight)');
  }
  requireNonNegative(left, `${field}.${spec.sideSlopeLeft === undefined ? 'sideSlope' : 'sideSlopeLeft'}`);
  requireNonNegative(right, `${field}.${spec.sideSlopeRight === undefined ? 'sideSlope' : 'sideSlopeRight'}`);
  return { left, right };
}

/** The spec checked field by field (errors name e.g. `reach.section.bottomWidth`), reduced to a trapezoid or a circle. */
export function validatedShape(spec: PrismaticShapeSpec, field: string): ValidatedShape {
  if (spec === null || typeof spec !== 'object') throw new InvalidInputError(field, 'must be an object describing the section');
  const shape: unknown = spec.shape;
  if (!SHAPES.some((known) => known === shape)) {
    throw new InvalidInputError(`${field}.shape`, `must be one of ${SHAPES.join(', ')}`);
  }
  switch (spec.shape) {
    case 'rectangular':
      requirePositive(spec.width, `${field}.width`);
      return { kind: 'open', shape: 'rectangular', dimensions: { bottomWidth: spec.width, sideSlopeLeft: 0, sideSlopeRight: 0 } };
    case 'trapezoidal': {
      requirePositive(spec.bottomWidth, `${field}.bottomWidth`);
      const { left, right } = sideSlopes(spec, field);
      return { kind: 'open', shape: 'trapezoidal', dimensions: { bottomWidth: spec.bottomWidth, sideSlopeLeft: left, sideSlopeRight: right } };
    }
    case 'triangular': {
      const { left, right } = sideSlopes(spec, field);
      if (left + right <= 0) throw new InvalidInputError(`${field}.sideSlope`, 'must be greater than 0 on at least one side');
      return { kind: 'open', shape: 'triangular', dimensions: { bottomWidth: 0, sideSlopeLeft: left, sideSlopeRight: right } };
    }
    case 'circular':
      requirePositive(spec.diameter, `${field}.diameter`);
      return { kind: 'circular', diameter: spec.diameter };
  }
}
