import type PDFDocument from 'pdfkit';
import type { EventResult } from '@/lib/hydraulics/case-result';
import { fixed, levelUnit, pdfText } from './certificate-text';
import { type Box, niceStep, polyline } from './chart-drawing';

type Doc = InstanceType<typeof PDFDocument>;

const COLOURS = { ink: '#1f2a2e', soft: '#4a5a60', faint: '#7d8b90', edge: '#d9d2c3', accent: '#17636b', fail: '#a33a2a', bank: '#8a6212' };


/**
 * The long-section of one event as vector graphics: distance upstream on x, level on y; the bed, the bank line
 * when known, the water level without and with the scheme, each flood-level limit and the extent of impact.
 */
export interface LongSectionScale {
  /** Bank height above the bed, when the case gives one. */
  bankHeight: number | null;
  /** Crest level of the structure, drawn at the control; null for a given depth. */
  crestLevel: number | null;
  unit: string;
  datum: string | null;
}

export function drawLongSection(doc: Doc, event: EventResult, scale: LongSectionScale, box: Box): void {
  const { bankHeight, crestLevel, unit } = scale;
  const withScheme = event.profile;
  const without = event.withoutScheme.profile;
  const xMax = Math.max(...withScheme.map((p) => p.distanceUpstream), ...event.limits.map((l) => l.distanceUpstream), 1);
  const levels = [...withScheme.flatMap((p) => [p.bedLevel, p.waterLevel]), ...without.map((p) => p.waterLevel), ...event.limits.map((l) => l.maxLevel)];
  if (bankHeight !== null) levels.push(...withScheme.map((p) => p.bedLevel + bankHeight));
  if (crestLevel !== null) levels.push(crestLevel);
  const yLow = Math.min(...levels);
  const yHigh = Math.max(...levels);
  const pad = Math.max((yHigh - yLow) * 0.08, 0.1);
  const [y0, y1] = [yLow - pad, yHigh + pad];
  const plot = { x: box.x + 44, y: box.y + 14, width: box.width - 52, height: box.height - 42 };
  const px = (d: number) => plot.x + (Math.min(d, xMax) / xMax) * plot.width;
  const py = (level: number) => plot.y + plot.height - ((level - y0) / (y1 - y0)) * plot.height;

  doc.save().font('mono').fontSize(6.5).fillColor(COLOURS.soft).lineWidth(0.4).strokeColor(COLOURS.edge);
  const xStep = niceStep(xMax, 6);
  for (let d = 0; d <= xMax + 1e-9; d += xStep) {
    doc.moveTo(px(d), plot.y).lineTo(px(d), plot.y + plot.height).stroke();
    doc.text(fixed(d, 0), px(d) - 20, plot.y + plot.height + 3, { width: 40, align: 'center' });
  }
  const yStep = niceStep(y1 - y0, 5);
  for (let level = Math.ceil(y0 / yStep) * yStep; level <= y1; level += yStep) {
    doc.moveTo(plot.x, py(level)).lineTo(plot.x + plot.width, py(level)).stroke();
    doc.text(fixed(level, yStep < 1 ? 1 : 0), plot.x - 42, py(level) - 3, { width: 38, align: 'right' });
  }
  doc.lineWidth(0.8).strokeColor(COLOURS.soft).rect(plot.x, plot.y, plot.width, plot.height).stroke();
  doc.font('sans').fontSize(7).fillColor(COLOURS.ink);
  doc.text(pdfText(`Distance upstream of the control (${unit})`), plot.x, plot.y + plot.height + 13, { width: plot.width, align: 'center' });
  doc.text(pdfText(`Level (${levelUnit(unit, scale.datum)})`), box.x, box.y, { width: box.width });
  doc.restore();

  const bed = withScheme.map((p): [number, number] => [px(p.distanceUpstream), py(p.bedLevel)]);
  doc.save().fillColor('#ece7db').moveTo(bed[0][0], plot.y + plot.height);
  for (const p of bed) doc.lineTo(...p);
  doc.lineTo(bed[bed.length - 1][0], plot.y + plot.height).closePath().fill().restore();
  polyline(doc, bed, COLOURS.ink, 1);
  if (bankHeight !== null) polyline(doc, withScheme.map((p) => [px(p.distanceUpstream), py(p.bedLevel + bankHeight)]), COLOURS.bank, 0.7, 1.5);
  polyline(doc, without.filter((p) => p.distanceUpstream <= xMax).map((p) => [px(p.distanceUpstream), py(p.waterLevel)]), COLOURS.soft, 1, 3);
  polyline(doc, withScheme.map((p) => [px(p.distanceUpstream), py(p.waterLevel)]), COLOURS.accent, 1.6);

  if (crestLevel !== null) polyline(doc, [[px(0), py(withScheme[0]?.bedLevel ?? crestLevel)], [px(0), py(crestLevel)]], COLOURS.ink, 3);
  const extent = event.extent.distanceUpstream;
  if (extent > 0 && extent <= xMax) polyline(doc, [[px(extent), plot.y], [px(extent), plot.y + plot.height]], COLOURS.accent, 0.6, 2);
  event.limits.forEach((limit, i) => {
    const x = px(limit.distanceUpstream);
    const colour = limit.pass ? COLOURS.ink : COLOURS.fail;
    polyline(doc, [[x - 5, py(limit.maxLevel)], [x + 5, py(limit.maxLevel)]], colour, 1.4);
    polyline(doc, [[x, py(limit.maxLevel)], [x, py(limit.waterLevel)]], colour, 0.5);
    doc.save().font('mono').fontSize(6.5).fillColor(colour).text(`L${i + 1}`, x + 3, py(limit.maxLevel) - 9, { lineBreak: false }).restore();
  });
}

/** The legend in words, one entry a line, below the drawing. */
export function longSectionLegend(event: EventResult, scale: LongSectionScale): string[] {
  const unit = scale.unit;
  const legend = [
    'Solid teal line: water level with the scheme. Dashed grey line: water level without the scheme. Filled line: channel bed.',
    ...(scale.crestLevel !== null ? [`Thick bar at distance 0: the structure, crest level ${fixed(scale.crestLevel)} ${levelUnit(unit, scale.datum)}.`] : []),
    ...(scale.bankHeight !== null ? ['Dotted ochre line: bank level.'] : []),
    `Thin dashed teal line: extent of impact, ${fixed(event.extent.distanceUpstream, 0)} ${unit} upstream.`,
    ...event.limits.map((l, i) => `L${i + 1}: ${l.label}, maximum level ${fixed(l.maxLevel)} ${levelUnit(unit, scale.datum)} at ${fixed(l.distanceUpstream, 0)} ${unit} upstream (${l.pass ? 'met' : 'NOT met'}).`),
  ];
  return legend.map(pdfText);
}
