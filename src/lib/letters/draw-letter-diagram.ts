import 'server-only';
import type PDFDocument from 'pdfkit';
import { distance, level } from '@/lib/parcels/format-quantity';
import type { ParcelStrip } from '@/lib/parcels/parcel-strip';

type Doc = InstanceType<typeof PDFDocument>;

const ACCENT = '#17636b';
const INK = '#1f2a2e';
const SOFT = '#7d8b90';
const GROUND = '#8a6212';
const WASH = '#e3f0ef';

function niceTicks(lo: number, hi: number, count: number): number[] {
  const raw = (hi - lo) / count;
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((k) => k * magnitude).find((s) => s >= raw) ?? raw;
  const ticks: number[] = [];
  for (let t = Math.ceil(lo / step) * step; t <= hi + 1e-9; t += step) ticks.push(t);
  return ticks;
}

function polyline(doc: Doc, pts: [number, number][]): void {
  pts.forEach(([x, y], i) => (i === 0 ? doc.moveTo(x, y) : doc.lineTo(x, y)));
}

/** A small long-section of the parcel's stretch of river: distance upstream across, level up, legend in words below. */
export function drawLetterDiagram(doc: Doc, strip: ParcelStrip, box: { x: number; y: number; width: number; height: number }): number {
  const plot = { x: box.x + 46, y: box.y + 6, width: box.width - 56, height: box.height - 34 };
  const levels = strip.points.flatMap((p) => [p.withScheme, p.withoutScheme, ...(p.ground === null ? [] : [p.ground])]);
  const pad = Math.max(0.1, 0.15 * (Math.max(...levels) - Math.min(...levels)));
  const yLo = Math.min(...levels) - pad;
  const yHi = Math.max(...levels) + pad;
  const dLo = strip.points[0].distance;
  const dHi = strip.points[strip.points.length - 1].distance;
  const X = (d: number) => plot.x + ((d - dLo) / (dHi - dLo || 1)) * plot.width;
  const Y = (z: number) => plot.y + plot.height - ((z - yLo) / (yHi - yLo)) * plot.height;

  doc.save().rect(X(strip.from), plot.y, X(strip.to) - X(strip.from), plot.height).fill(WASH).restore();
  doc.save().lineWidth(0.5).strokeColor(SOFT).rect(plot.x, plot.y, plot.width, plot.height).stroke().restore();
  doc.font('sans').fontSize(7).fillColor(SOFT);
  for (const t of niceTicks(yLo, yHi, 5)) doc.text(level(t), box.x, Y(t) - 4, { width: 42, align: 'right', lineBreak: false });
  for (const t of niceTicks(dLo, dHi, 5)) doc.text(distance(t), X(t) - 30, plot.y + plot.height + 3, { width: 60, align: 'center', lineBreak: false });

  if (strip.points.every((p) => p.ground !== null)) {
    doc.save().lineWidth(1).strokeColor(GROUND).dash(1.5, { space: 2 });
    polyline(doc, strip.points.map((p) => [X(p.distance), Y(p.ground as number)]));
    doc.stroke().undash().restore();
  }
  doc.save().lineWidth(1).strokeColor(INK).dash(4, { space: 3 });
  polyline(doc, strip.points.map((p) => [X(p.distance), Y(p.withoutScheme)]));
  doc.stroke().undash().restore();
  doc.save().lineWidth(1.8).strokeColor(ACCENT);
  polyline(doc, strip.points.map((p) => [X(p.distance), Y(p.withScheme)]));
  doc.stroke().restore();

  const legendY = box.y + box.height - 8;
  const entry = (x: number, label: string, draw: () => void) => {
    draw();
    doc.font('sans').fontSize(7.5).fillColor(INK).text(label, x + 20, legendY - 4, { lineBreak: false });
  };
  entry(plot.x, 'With the scheme', () => doc.save().lineWidth(1.8).strokeColor(ACCENT).moveTo(plot.x, legendY).lineTo(plot.x + 16, legendY).stroke().restore());
  entry(plot.x + 105, 'Without the scheme', () => doc.save().lineWidth(1).strokeColor(INK).dash(4, { space: 3 }).moveTo(plot.x + 105, legendY).lineTo(plot.x + 121, legendY).stroke().undash().restore());
  entry(plot.x + 225, 'Ground or bank level', () => doc.save().lineWidth(1).strokeColor(GROUND).dash(1.5, { space: 2 }).moveTo(plot.x + 225, legendY).lineTo(plot.x + 241, legendY).stroke().undash().restore());
  entry(plot.x + 350, 'Your land', () => doc.save().rect(plot.x + 350, legendY - 4, 16, 8).fill(WASH).restore());
  doc.fillColor(INK);
  return box.y + box.height;
}
