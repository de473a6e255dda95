// Prismatic cross-sections (rectangle, trapezoid, triangle, part-full circle) as FlowSections.
import { InvalidInputError, requireFinite, requirePositive } from './errors';
import { manningConveyance } from './manning';
import { circleGeometry } from './prismatic/circle-geometry';
import { type TrapezoidDimensions, trapezoidGeometry } from './prismatic/trapezoid-geometry';
import { type PrismaticShapeSpec, validatedShape } from './prismatic/shape-spec';
import type { FlowSection, SectionState } from './section';
import type { SectionSample } from './section-sample';
import { requireDepth, type SectionGeometry, sectionState } from './section-state';
import type { Metres } from './units';

export type { PrismaticShapeSpec } from './prismatic/shape-spec';

export interface PrismaticSectionOptions {
  /** Energy (Coriolis) coefficient α, at least 1; default 1. */
  energyCoefficient?: number;
  /** Path prefix for errors about the shape, default 'reach.section'. */
  field?: string;
  /** Path for errors about Manning's n, default 'reach.manningN'. */
  nField?: string;
  /** Path for errors about α, default 'reach.energyCoefficient'. */
  energyCoefficientField?: string;
}

export interface PrismaticSection extends FlowSection {
  readonly shape: 'rectangular' | 'trapezoidal' | 'triangular' | 'circular';
  readonly manningN: number;
}

export function prismaticSection(spec: PrismaticShapeSpec, manningN: number, opts: PrismaticSectionOptions = {}): PrismaticSection {
  const field = opts.field ?? 'reach.section';
  const shape = validatedShape(spec, field);
  requirePositive(manningN, opts.nField ?? 'reach.manningN');
  const energyCoefficient = opts.energyCoefficient ?? 1;
  const alphaField = opts.energyCoefficientField ?? 'reach.energyCoefficient';
  requireFinite(energyCoefficient, alphaField);
  if (energyCoefficient < 1) throw new InvalidInputError(alphaField, 'must be 1 or more');

  const geometryAt: (depth: Metres) => SectionGeometry =
    shape.kind === 'circular' ? (depth) => circleGeometry(shape.diameter, depth) : (depth) => trapezoidGeometry(shape.dimensions, depth);
  const maxDepth = shape.kind === 'circular' ? shape.diameter : Infinity;
  const sampleInto = shape.kind === 'circular' ? circleSampler(shape.diameter, manningN, energyCoefficient) : trapezoidSampler(shape.dimensions, manningN, energyCoefficient);

  return {
    shape: shape.kind === 'circular' ? 'circular' : shape.shape,
    invertLevel: 0,
    maxDepth,
    manningN,
    stateAtDepth(depth: Metres): SectionState {
      requireDepth(depth);
      const geometry = geometryAt(depth);
      const conveyance = manningConveyance(geometry.area, geometry.wettedPerimeter, manningN);
      return sectionState(geometry, conveyance, energyCoefficient, depth > maxDepth);
    },
    sampleInto,
  };
}

type Sampler = (depth: Metres, out: SectionSample) => void;

/** trapezoidGeometry's A and T with its perimeter factor worked out once (same expressions, so the same numbers). */
function trapezoidSampler(dimensions: TrapezoidDimensions, manningN: number, energyCoefficient: number): Sampler {
  const { bottomWidth: b, sideSlopeLeft: zL, sideSlopeRight: zR } = dimensions;
  const zSum = zL + zR;
  const perimeterPerDepth = Math.hypot(1, zL) + Math.hypot(1, zR);
  return (depth, out) => {
    requireDepth(depth);
    const area = b * depth + (zSum * depth * depth) / 2;
    out.area = area;
    out.topWidth = b + zSum * depth;
    out.conveyance = manningConveyance(area, b + depth * perimeterPerDepth, manningN);
    out.energyCoefficient = energyCoefficient;
  };
}

function circleSampler(diameter: Metres, manningN: number, energyCoefficient: number): Sampler {
  return (depth, out) => {
    requireDepth(depth);
    const geometry = circleGeometry(diameter, depth);
    out.area = geometry.area;
    out.topWidth = geometry.topWidth;
    out.conveyance = manningConveyance(geometry.area, geometry.wettedPerimeter, manningN);
    out.energyCoefficient = energyCoefficient;
  };
}
