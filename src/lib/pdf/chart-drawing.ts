import type { Doc } from './pdf-layout';

// Pieces both vector charts of the PDFs (the long-section and the routing chart) draw with.

export interface Box { x: number; y: number; width: number; height: number }

/** A round grid step (1, 2, 2.5 or 5 × a power of ten) giving about `count` divisions of `span`. */
export function niceStep(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 2.5, 5, 10].map((f) => f * power).find((s) => s >= raw) ?? 10 * power;
}

export function polyline(doc: Doc, points: [number, number][], colour: string, width: number, dash?: number): void {
  if (points.length < 2) return;
  doc.save().lineWidth(width).strokeColor(colour);
  if (dash) doc.dash(dash, { space: dash * 0.8 });
  doc.moveTo(...points[0]);
  for (const p of points.slice(1)) doc.lineTo(...p);
  doc.stroke().restore();
}
