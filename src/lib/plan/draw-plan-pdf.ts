import type PDFDocument from 'pdfkit';
import { distance } from '@/lib/parcels/format-quantity';
import type { PlanDrawing } from './plan-drawing';
import { type CategoryStyle, PLAN_CATEGORY_STYLES, PLAN_INK, type PlanCategory } from './plan-style';

// The plan in a PDF with pdfkit's vector drawing, from the same layout (and path commands) the browser draws as SVG.

type Doc = InstanceType<typeof PDFDocument>;
type Box = { x: number; y: number; width: number; height: number };

/** Hatching inside an outline, drawn as lines clipped to it (so the categories differ in black and white too). */
function hatch(doc: Doc, path: string, style: CategoryStyle, box: Box): void {
  if (style.hatch === 'none') return;
  doc.save().path(path).clip().lineWidth(0.4).strokeColor(style.stroke);
  for (let k = -box.height; k < box.width; k += 7) {
    doc.moveTo(k, box.height).lineTo(k + box.height, 0);
    if (style.hatch === 'cross') doc.moveTo(k, 0).lineTo(k + box.height, box.height);
  }
  if (style.hatch === 'dots') doc.dash(0.6, { space: 5 });
  doc.stroke().undash().restore();
}

/** Draws the plan in `box` (its layout made for the box's size) with the key below it; returns the height used. */
export function drawPlanPdf(doc: Doc, drawing: PlanDrawing, box: Box, focus: string | null): number {
  doc.save().translate(box.x, box.y);
  doc.rect(0, 0, box.width, box.height).fill(PLAN_INK.paper);
  doc.rect(0, 0, box.width, box.height).clip();
  for (const p of drawing.parcels) {
    const style = PLAN_CATEGORY_STYLES[p.category];
    doc.path(p.path).fillColor(style.fill).fill('even-odd');
    hatch(doc, p.path, style, box);
    doc.path(p.path).lineWidth(p.reference === focus ? 2.2 : 0.6).strokeColor(p.reference === focus ? PLAN_INK.text : style.stroke).stroke();
  }
  for (const d of drawing.inundated) doc.path(d).lineWidth(6).strokeColor(PLAN_INK.inundated).strokeOpacity(0.45).lineCap('round').stroke();
  doc.strokeOpacity(1).lineCap('butt');
  doc.path(drawing.river).lineWidth(1.4).strokeColor(PLAN_INK.river).stroke();
  if (drawing.extent) doc.save().translate(0, -4).path(drawing.extent).lineWidth(1.4).dash(5, { space: 3 }).strokeColor(PLAN_INK.extent).stroke().undash().restore();
  if (drawing.structure) doc.rect(drawing.structure[0] - 4, drawing.structure[1] - 4, 8, 8).fill(PLAN_INK.structure);
  doc.font('sans').fontSize(7).fillColor(PLAN_INK.text);
  for (const p of drawing.parcels) doc.text(p.reference, p.labelAt[0] - 30, p.labelAt[1] - 3.5, { width: 60, align: 'center', lineBreak: false });
  // North arrow (grid north up) and scale bar.
  const nx = box.width - 20;
  doc.polygon([nx, 8], [nx + 5, 26], [nx, 22], [nx - 5, 26]).fill(PLAN_INK.text);
  doc.fontSize(8).text('N', nx - 10, 28, { width: 20, align: 'center', lineBreak: false });
  const bar = drawing.scaleBar;
  doc.rect(12, box.height - 14, bar.length / 2, 4).fill(PLAN_INK.text);
  doc.rect(12 + bar.length / 2, box.height - 14, bar.length / 2, 4).lineWidth(0.6).fillAndStroke(PLAN_INK.paper, PLAN_INK.text);
  doc.fillColor(PLAN_INK.text).fontSize(7).text(`0 – ${distance(bar.metres)}`, 12, box.height - 24, { lineBreak: false });
  doc.restore();
  doc.lineWidth(0.5).strokeColor(PLAN_INK.text).rect(box.x, box.y, box.width, box.height).stroke();
  return box.height + legendPdf(doc, [...new Set(drawing.parcels.map((p) => p.category))], { x: box.x, y: box.y + box.height + 6 });
}

function legendPdf(doc: Doc, categories: PlanCategory[], at: { x: number; y: number }): number {
  const entries: [string, (x: number, y: number) => void][] = [
    ...categories.map((c): [string, (x: number, y: number) => void] => [PLAN_CATEGORY_STYLES[c].words, (x, y) => doc.rect(x, y, 14, 8).fillAndStroke(PLAN_CATEGORY_STYLES[c].fill, PLAN_CATEGORY_STYLES[c].stroke)]),
    ['Water above the bank with the scheme', (x, y) => doc.rect(x, y + 2, 14, 4).fillOpacity(0.45).fill(PLAN_INK.inundated).fillOpacity(1)],
    ['Extent of impact', (x, y) => doc.moveTo(x, y + 4).lineTo(x + 14, y + 4).lineWidth(1.4).dash(3, { space: 2 }).strokeColor(PLAN_INK.extent).stroke().undash()],
    ['Structure', (x, y) => doc.rect(x + 3, y, 8, 8).fill(PLAN_INK.structure)],
  ];
  entries.forEach(([words, draw], i) => {
    const x = at.x + (i % 3) * 165;
    const y = at.y + Math.floor(i / 3) * 12;
    draw(x, y);
    doc.font('sans').fontSize(7.5).fillColor(PLAN_INK.text).text(words, x + 18, y, { lineBreak: false });
  });
  return 6 + Math.ceil(entries.length / 3) * 12;
}
