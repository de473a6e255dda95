import 'server-only';
import { discharge, distance, metres } from '@/lib/parcels/format-quantity';
import { drawPlanPdf } from '@/lib/plan/draw-plan-pdf';
import { LETTER_PLAN_SIZE, type LetterPlan } from '@/lib/plan/letter-plan-page';
import { cautionText } from './letter-content';
import type { LetterImpact } from './letter-impact';
import { CAUTION, type Doc, INK, MARGIN, SOFT, heading, paragraph } from './letter-page-style';
import { letterText } from './pdf-text';

// The parts of a letter that show the impact on the land: the table of floods, the caution, the certificate check, the plan.

export function eventTable(doc: Doc, impact: LetterImpact): void {
  const widths = [118, 70, 95, 100, 100];
  // Plex Sans figures are tabular already; the Plex Mono files fail in pdfkit's font engine on the space glyph.
  const row = (cells: string[], font: 'sans' | 'sansSemiBold') => {
    const y = doc.y;
    let x = MARGIN;
    cells.forEach((cell, i) => {
      doc.font(font).fontSize(8.5).fillColor(INK).text(letterText(cell), x, y, { width: widths[i] - 6 });
      x += widths[i];
    });
    doc.x = MARGIN;
    doc.y = Math.max(doc.y, y + 12) + 2;
  };
  row(['Flood', 'River flow', 'Greatest rise', 'Under water without', 'Under water with'], 'sansSemiBold');
  doc.save().lineWidth(0.5).strokeColor(SOFT).moveTo(MARGIN, doc.y - 1).lineTo(MARGIN + 483, doc.y - 1).stroke().restore();
  for (const e of impact.events) {
    const wet = (f: typeof e.withScheme) => (f ? (f.inundatedLength === 0 ? 'none' : `${distance(f.inundatedLength)}, ${metres(f.maxDepth)} deep`) : 'not known');
    row([e.event, discharge(e.dischargeM3s), metres(e.maxAfflux), wet(e.withoutScheme), wet(e.withScheme)], 'sans');
  }
}

export function cautionBox(doc: Doc, impact: LetterImpact): void {
  doc.moveDown(0.6);
  const text = `Caution. ${cautionText(impact)}`;
  doc.font('sans').fontSize(9);
  const height = doc.heightOfString(letterText(text), { width: 463 }) + 14;
  if (doc.y + height > 842 - MARGIN - 20) doc.addPage();
  const top = doc.y;
  doc.save().rect(MARGIN, top, 483, height).fill('#f2eee4').restore();
  doc.save().rect(MARGIN, top, 3, height).fill(CAUTION).restore();
  doc.fillColor(INK).text(letterText(text), MARGIN + 12, top + 7, { width: 463 });
  doc.x = MARGIN;
  doc.y = top + height + 4;
}

/** How the landowner can check, on the public verification page, that the design's certificate is genuine and still in force. */
export function certificateCheck(doc: Doc, certificate: NonNullable<LetterImpact['certificate']>): void {
  heading(doc, 'Checking the design certificate');
  paragraph(doc, `The design behind these figures was checked independently and certified: certificate ${certificate.number}. You can check that this certificate is genuine and has not been withdrawn at:`);
  doc.font('sans').fontSize(10).fillColor(INK).text(letterText(certificate.verificationUrl), { link: certificate.verificationUrl, underline: true }).moveDown(0.5);
}

/** The plan round the parcel: the same drawing the portal shows, cropped, with a key in words. */
export function planOfTheLand(doc: Doc, plan: LetterPlan, reference: string): void {
  if (doc.y + LETTER_PLAN_SIZE.height + 70 > 842 - MARGIN) doc.addPage();
  doc.moveDown(0.8).font('sansSemiBold').fontSize(9).fillColor(INK).text(letterText(`Plan: where your land (${reference}) lies`));
  const top = doc.y + 4;
  const used = drawPlanPdf(doc, plan.drawing, { x: MARGIN, y: top, ...LETTER_PLAN_SIZE }, reference);
  doc.x = MARGIN;
  doc.y = top + used + 8;
  doc.font('sansItalic').fontSize(8).fillColor(SOFT).text(letterText(`Your land has the heavy outline. Grid north is up (${plan.coordinateSystem}). The river marks show the flood "${plan.event}".`));
}
