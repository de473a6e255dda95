import type { CaseResult } from '@/lib/hydraulics/case-result';
import { eventRouting } from '@/lib/routing-sheet/event-routing';
import { dischargeUnit, lengthUnit } from './certificate-text';
import { type Doc, MARGIN, SOFT, bullets, contentWidth, fields, heading, paragraph } from './pdf-layout';
import { drawRoutingChart, routingChartLegend } from './routing-chart-drawing';
import { routingInputRows, routingPeakRows } from './routing-summary';

const DRAWING_HEIGHT = 190;

/** For each event routed through the reservoir: what was routed and how, the peak figures, the chart and the assumptions. */
export function drawRoutingSections(doc: Doc, results: CaseResult, datum: string | null): void {
  const units = { length: lengthUnit(results.units), discharge: dischargeUnit(results.units) };
  for (const event of results.events) {
    const routing = eventRouting(event);
    if (!routing) continue;
    heading(doc, `Flood routed through the reservoir, ${event.name}`, 80);
    fields(doc, routingInputRows(routing, units, datum), 170);
    doc.moveDown(0.4);
    fields(doc, routingPeakRows(routing, units, datum), 170);
    heading(doc, `Inflow, outflow and reservoir level, ${event.name}`, DRAWING_HEIGHT + 30);
    const box = { x: MARGIN, y: doc.y, width: contentWidth(doc), height: DRAWING_HEIGHT };
    drawRoutingChart(doc, routing, { lengthUnit: units.length, dischargeUnit: units.discharge, datum }, box);
    doc.x = MARGIN;
    doc.y = box.y + box.height + 6;
    for (const line of routingChartLegend(routing, { lengthUnit: units.length, dischargeUnit: units.discharge, datum })) paragraph(doc, line, { size: 7.5, colour: SOFT });
    const inReservoir = event.limits.filter((l) => l.source === 'reservoir').map((l) => l.label);
    if (inReservoir.length > 0) paragraph(doc, `Limits within the reservoir, checked against the peak reservoir level: ${inReservoir.join('; ')}.`);
    if (routing.assumptions.length > 0) {
      paragraph(doc, `Assumptions of the routing, ${event.name}:`, { font: 'sansSemiBold' });
      bullets(doc, routing.assumptions);
    }
  }
}
