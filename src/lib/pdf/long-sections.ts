import type { CaseResult } from '@/lib/hydraulics/case-result';
import type { CaseInput } from '@/lib/validation/case-schema';
import { drawLongSection, type LongSectionScale, longSectionLegend } from './certificate-long-section';
import { lengthUnit } from './certificate-text';
import { bedLevelAtStructure } from './input-summary-structure';
import { type Doc, MARGIN, SOFT, contentWidth, heading, paragraph } from './pdf-layout';

const DRAWING_HEIGHT = 210;
/** Room for the legend's first lines, kept on the page with the drawing. */
const LEGEND_ROOM = 40;

function scaleOf(inputs: CaseInput, results: CaseResult, datum: string | null): LongSectionScale {
  const bedLevel = bedLevelAtStructure(inputs, results);
  return {
    bankHeight: inputs.reach.kind === 'prismatic' ? (inputs.reach.bankHeight ?? null) : null,
    crestLevel: inputs.control.type === 'weir' && bedLevel !== null ? bedLevel + inputs.control.sillHeight : null,
    unit: lengthUnit(results.units),
    datum,
  };
}

/** The long-section of every design event, with and without the scheme, each under its heading and above its legend. */
export function drawLongSections(doc: Doc, inputs: CaseInput, results: CaseResult, datum: string | null): void {
  const scale = scaleOf(inputs, results, datum);
  results.events.forEach((event, i) => {
    const governing = results.governingEvent?.index === i ? ' (the governing event)' : '';
    heading(doc, `Long-section, ${event.name}${governing}`, DRAWING_HEIGHT + LEGEND_ROOM);
    const box = { x: MARGIN, y: doc.y, width: contentWidth(doc), height: DRAWING_HEIGHT };
    drawLongSection(doc, event, scale, box);
    doc.x = MARGIN;
    doc.y = box.y + box.height + 6;
    for (const line of longSectionLegend(event, scale)) paragraph(doc, line, { size: 7.5, colour: SOFT });
  });
}
