import type { XY } from '@/lib/revisions/results-sheet';

// Outlines to draw a prismatic section, centred on its axis with the bed at 0. Drawing only: the hydraulics of
// the section (areas, conveyance) are the engine's.

export type PrismaticShape =
  | { shape: 'rectangular'; width?: number }
  | { shape: 'trapezoidal'; bottomWidth?: number; sideSlope?: number; sideSlopeLeft?: number; sideSlopeRight?: number }
  | { shape: 'triangular'; sideSlope?: number; sideSlopeLeft?: number; sideSlopeRight?: number }
  | { shape: 'circular'; diameter?: number };

export interface Outline {
  /** The ground or the pipe invert, left to right (x increasing). */
  ground: XY[];
  /** The pipe's crown, for a circular section. */
  cover: XY[] | null;
  height: number;
}

const ok = (x: number | undefined): x is number => typeof x === 'number' && Number.isFinite(x) && x >= 0;

/** The outline up to `height` above the bed, or null while the dimensions are incomplete. */
export function prismaticOutline(section: PrismaticShape, height: number): Outline | null {
  if (section.shape === 'circular') {
    if (!ok(section.diameter) || section.diameter === 0) return null;
    const r = section.diameter / 2;
    // Centre (0, r): the invert runs t = π → 2π, the crown t = π → 0, both from x = −r to x = r.
    const arc = (from: number, to: number) => Array.from({ length: 49 }, (_, i) => {
      const t = from + (i / 48) * (to - from);
      return { x: r * Math.cos(t), y: r + r * Math.sin(t) };
    });
    return { ground: arc(Math.PI, 2 * Math.PI), cover: arc(Math.PI, 0), height: section.diameter };
  }
  const left = section.shape === 'rectangular' ? 0 : (section.sideSlopeLeft ?? section.sideSlope);
  const right = section.shape === 'rectangular' ? 0 : (section.sideSlopeRight ?? section.sideSlope);
  const bottom = section.shape === 'rectangular' ? section.width : section.shape === 'trapezoidal' ? section.bottomWidth : 0;
  if (!ok(left) || !ok(right) || !ok(bottom) || !(height > 0)) return null;
  const b = bottom / 2;
  const ground = [
    { x: -b - left * height, y: height },
    { x: -b, y: 0 },
    ...(b > 0 ? [{ x: b, y: 0 }] : []),
    { x: b + right * height, y: height },
  ];
  return { ground, cover: null, height };
}

/** A sensible drawing height: the bank height if known, else a depth in proportion to the width. */
export function drawingHeight(section: PrismaticShape, bankHeight?: number): number {
  if (section.shape === 'circular') return section.diameter ?? 1;
  if (bankHeight && bankHeight > 0) return bankHeight;
  const width = section.shape === 'rectangular' ? section.width : section.shape === 'trapezoidal' ? section.bottomWidth : undefined;
  return width && width > 0 ? Math.max(width / 4, 0.5) : 1;
}
