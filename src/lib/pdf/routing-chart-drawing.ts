import type { RoutingResult } from '@/lib/hydraulics/routing/routing-result';
import { hoursOf } from '@/lib/routing-sheet/event-routing';
import { fixed, levelUnit, pdfText } from './certificate-text';
import { type Box, niceStep, polyline } from './chart-drawing';
import type { Doc } from './pdf-layout';


const COLOURS = { ink: '#1f2a2e', soft: '#4a5a60', edge: '#d9d2c3', accent: '#17636b', level: '#8a6f4d' };


export interface RoutingChartScale {
  lengthUnit: string;
  dischargeUnit: string;
  datum: string | null;
}

/**
 * A routed flood as vector graphics: time in hours on x; inflow (dashed) and outflow (solid) against the discharge
 * scale on the left, the reservoir level (dotted) against the level scale on the right.
 */
export function drawRoutingChart(doc: Doc, routing: RoutingResult, scale: RoutingChartScale, box: Box): void {
  const steps = routing.steps;
  const tMax = Math.max(...steps.map((s) => hoursOf(s.time)), 1e-6);
  const qMax = Math.max(...steps.flatMap((s) => [s.inflow, s.outflow]), 1e-6) * 1.08;
  const levels = steps.map((s) => s.level);
  const pad = Math.max((Math.max(...levels) - Math.min(...levels)) * 0.1, 0.05);
  const [h0, h1] = [Math.min(...levels) - pad, Math.max(...levels) + pad];
  const plot = { x: box.x + 40, y: box.y + 14, width: box.width - 84, height: box.height - 42 };
  const px = (t: number) => plot.x + (t / tMax) * plot.width;
  const pq = (q: number) => plot.y + plot.height - (q / qMax) * plot.height;
  const ph = (h: number) => plot.y + plot.height - ((h - h0) / (h1 - h0)) * plot.height;

  doc.save().font('mono').fontSize(6.5).fillColor(COLOURS.soft).lineWidth(0.4).strokeColor(COLOURS.edge);
  const tStep = niceStep(tMax, 8);
  for (let t = 0; t <= tMax + 1e-9; t += tStep) {
    doc.moveTo(px(t), plot.y).lineTo(px(t), plot.y + plot.height).stroke();
    doc.text(fixed(t, tStep < 1 ? 1 : 0), px(t) - 20, plot.y + plot.height + 3, { width: 40, align: 'center' });
  }
  const qStep = niceStep(qMax, 5);
  for (let q = 0; q <= qMax; q += qStep) {
    doc.moveTo(plot.x, pq(q)).lineTo(plot.x + plot.width, pq(q)).stroke();
    doc.text(fixed(q, qStep < 1 ? 1 : 0), plot.x - 38, pq(q) - 3, { width: 34, align: 'right' });
  }
  const hStep = niceStep(h1 - h0, 5);
  doc.fillColor(COLOURS.level);
  for (let h = Math.ceil(h0 / hStep) * hStep; h <= h1; h += hStep) doc.text(fixed(h, hStep < 0.1 ? 2 : hStep < 1 ? 1 : 0), plot.x + plot.width + 4, ph(h) - 3, { width: 40 });
  doc.lineWidth(0.8).strokeColor(COLOURS.soft).rect(plot.x, plot.y, plot.width, plot.height).stroke();
  doc.font('sans').fontSize(7).fillColor(COLOURS.ink);
  doc.text('Time from the start of the inflow (hours)', plot.x, plot.y + plot.height + 13, { width: plot.width, align: 'center' });
  doc.text(pdfText(`Discharge (${scale.dischargeUnit})`), box.x, box.y, { width: box.width / 2 });
  doc.fillColor(COLOURS.level).text(pdfText(`Reservoir level (${levelUnit(scale.lengthUnit, scale.datum)})`), box.x + box.width / 2, box.y, { width: box.width / 2, align: 'right' });
  doc.restore();

  polyline(doc, steps.map((s) => [px(hoursOf(s.time)), pq(s.inflow)]), COLOURS.soft, 1, 3);
  polyline(doc, steps.map((s) => [px(hoursOf(s.time)), pq(s.outflow)]), COLOURS.accent, 1.6);
  polyline(doc, steps.map((s) => [px(hoursOf(s.time)), ph(s.level)]), COLOURS.level, 1, 1);
  const peak = [px(hoursOf(routing.peakLevel.time)), ph(routing.peakLevel.level)] as const;
  doc.save().lineWidth(0.8).strokeColor(COLOURS.level).polygon([peak[0], peak[1] - 4], [peak[0] - 3.5, peak[1] + 2.5], [peak[0] + 3.5, peak[1] + 2.5]).stroke().restore();
}

/** The legend in words, below the drawing. */
export function routingChartLegend(routing: RoutingResult, scale: RoutingChartScale): string[] {
  return [
    'Dashed grey line: inflow to the reservoir. Solid teal line: outflow over the structure (both on the left-hand discharge scale).',
    `Dotted brown line: reservoir level (right-hand scale); triangle: peak level ${fixed(routing.peakLevel.level)} ${levelUnit(scale.lengthUnit, scale.datum)} at ${fixed(hoursOf(routing.peakLevel.time), 2)} h.`,
  ].map(pdfText);
}
