// A surveyed section's flow properties at a level, and bounds on them over a range of levels, from its table.
import { manningConveyance } from './manning';
import type { FroudeFactorBounds } from './section-sample';
import type { PieceValues, SurveyTable } from './surveyed-table';
import type { Metres } from './units';

/** The whole section's wetted geometry at one level, with its conveyance and energy coefficient. */
export interface FlowAtLevel extends PieceValues {
  conveyance: number;
  energyCoefficient: number;
}

export function emptyFlow(): FlowAtLevel {
  return { area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0, conveyance: 0, energyCoefficient: 1 };
}

// Scratch for one evaluation at a time: the engine is synchronous, and nothing here calls back out.
const piece: PieceValues = { area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0 };
const subAreaAreas = [0, 0, 0];
const subAreaConveyances = [0, 0, 0];

/**
 * Energy coefficient of a divided section: α = Σ vᵢ³Aᵢ / (V³A) (Chow, Open-Channel Hydraulics, 1959, §2-7 — from memory)
 * with vᵢ = Kᵢ√S/Aᵢ and V = K√S/A, i.e. α = (Σ Kᵢ³/Aᵢ²) / (K³/A²).
 * Summed as Σ (vᵢ/V)³ (Aᵢ/A) so that a sliver of a sub-area cannot overflow or underflow.
 */
function dividedEnergyCoefficient(area: number, conveyance: number): number {
  if (area <= 0 || conveyance <= 0) return 1;
  const meanRatio = conveyance / area;
  let alpha = 0;
  for (let j = 0; j < subAreaAreas.length; j++) {
    const subArea = subAreaAreas[j];
    if (subArea > 0) {
      const ratio = subAreaConveyances[j] / subArea / meanRatio;
      alpha += ratio * ratio * ratio * (subArea / area);
    }
  }
  return Number.isFinite(alpha) ? Math.max(1, alpha) : 1;
}

/**
 * Fills `out` at `level`. Manning's n of the left overbank, the channel and the right overbank are roughness[at] to
 * roughness[at + 2]: a section keeps them beside its other numbers (see surveyed-section.ts).
 */
export function flowAtLevel(table: SurveyTable, roughness: ArrayLike<number>, at: number, level: Metres, out: FlowAtLevel): FlowAtLevel {
  const k = table.interval(level);
  out.area = out.wettedPerimeter = out.topWidth = out.firstMoment = out.conveyance = 0;
  for (let j = 0; j < 3; j++) {
    table.fill(k, j, level, piece);
    subAreaAreas[j] = piece.area;
    subAreaConveyances[j] = manningConveyance(piece.area, piece.wettedPerimeter, roughness[at + j]);
    out.conveyance += subAreaConveyances[j];
    out.area += piece.area;
    out.wettedPerimeter += piece.wettedPerimeter;
    out.topWidth += piece.topWidth;
    out.firstMoment += piece.firstMoment;
  }
  out.energyCoefficient = dividedEnergyCoefficient(out.area, out.conveyance);
  return out;
}

const lower: PieceValues = { area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0 };
const upper: PieceValues = { area: 0, wettedPerimeter: 0, topWidth: 0, firstMoment: 0 };

/** (A + T·rise)³/T: A grows by at most T per metre of rise, T never falling, so this bounds A³/T at that T. */
function cubedAreaOverWidth(area: number, topWidth: number, rise: Metres): number {
  const most = area + topWidth * rise;
  return (most * most * most) / topWidth;
}

/**
 * Bounds on αT/A³ holding at every level in [from, to] (roughness as for flowAtLevel). Every piece of ground is wet
 * over a length and a width that never shrink as the water rises (surveyed-table.ts), so each sub-area's A, P and T at `from` and at `to` bound them
 * in between. With vᵢ = Rᵢ^(2/3)/nᵢ, dividedEnergyCoefficient's α is the greater of 1 and (Σ Aᵢvᵢ³)·A²/K³, so
 * αT/A³ ≤ T(to)·max(1/A(from)³, (Σ Aᵢ(to)Rᵢ,most²/nᵢ³)/(A(from)·K_least³)), where Rᵢ,most is the lesser of
 * Aᵢ(to)/Pᵢ(from) and the depth (Aᵢ ≤ Tᵢ·depth ≤ Pᵢ·depth) and K_least = Σ Aᵢ(from)(Aᵢ(from)/Pᵢ(to))^(2/3)/nᵢ;
 * and, α being at least 1, αT/A³ ≥ T(from)/A(to)³, and ≥ T/(A(from) + T·(to − from))³ (as A ≤ A(from) + T·rise), whose
 * least over T between T(from) and T(to) is at one of the two (it falls and then rises with T).
 */
export function froudeFactorBoundsBetween(table: SurveyTable, roughness: ArrayLike<number>, at: number, invertLevel: Metres, from: Metres, to: Metres, out: FroudeFactorBounds): FroudeFactorBounds {
  const kFrom = table.interval(from);
  const kTo = table.interval(to);
  const depth = to - invertLevel;
  // Six declarations, not one destructured list: destructuring walks an iterator, garbage at every call.
  let leastArea = 0;
  let mostArea = 0;
  let leastTopWidth = 0;
  let mostTopWidth = 0;
  let leastConveyance = 0;
  let mostCubedVelocityArea = 0;
  for (let j = 0; j < 3; j++) {
    table.fill(kFrom, j, from, lower);
    table.fill(kTo, j, to, upper);
    leastArea += lower.area;
    mostArea += upper.area;
    leastTopWidth += lower.topWidth;
    mostTopWidth += upper.topWidth;
    leastConveyance += manningConveyance(lower.area, upper.wettedPerimeter, roughness[at + j]);
    if (upper.area > 0) {
      const radius = lower.wettedPerimeter > 0 ? Math.min(depth, upper.area / lower.wettedPerimeter) : depth;
      const n = roughness[at + j];
      mostCubedVelocityArea += (upper.area * radius * radius) / (n * n * n);
    }
  }
  const withoutAlpha = mostTopWidth / (leastArea * leastArea * leastArea);
  const withAlpha = (mostTopWidth * mostCubedVelocityArea) / (leastArea * leastConveyance * leastConveyance * leastConveyance);
  out.most = leastArea > 0 && leastConveyance > 0 ? Math.max(withoutAlpha, withAlpha) : Infinity;
  out.least = Math.max(leastTopWidth / (mostArea * mostArea * mostArea), 1 / Math.max(cubedAreaOverWidth(leastArea, leastTopWidth, to - from), cubedAreaOverWidth(leastArea, mostTopWidth, to - from))) || 0;
  return out;
}
