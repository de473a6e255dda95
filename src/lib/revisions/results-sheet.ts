import type { CaseResult, EventResult } from '@/lib/hydraulics/case-result';
import { caseToSI, unitScale } from '@/lib/hydraulics/case-units';
import { bankLevelAlong } from '@/lib/hydraulics/reach-banks';
import type { CaseInput } from '@/lib/validation/case-schema';

// The engine's result arranged for drawing: long-section series and cross-section outlines, in the case's units.
// Nothing here computes hydraulics; levels are the engine's, and bank levels come from the engine's reach model.

export interface XY {
  x: number;
  y: number;
}

export interface LongSectionData {
  event: string;
  bed: XY[];
  bank: XY[] | null;
  withScheme: XY[];
  withoutScheme: XY[];
  normalDepthLine: XY[] | null;
  criticalDepthLine: XY[];
  /** Water level plus the velocity head along the with-scheme profile. */
  energyLine: XY[];
  /** The structure at chainage 0: the bed there and the crest (bed plus sill); null for a given depth at the control. */
  structure: { bedLevel: number; crestLevel: number; sillHeight: number } | null;
  limits: { label: string; x: number; maxLevel: number; allowedLevel: number; waterLevel: number; pass: boolean }[];
  extentOfImpact: number;
  inundationExtent: number | null;
}

export type SectionOutline =
  | { kind: 'prismatic'; section: Extract<CaseInput['reach'], { kind: 'prismatic' }>['section'] }
  | { kind: 'surveyed'; sections: { distanceUpstream: number; points: [number, number][]; bankStations?: [number, number] }[] };

function byDistance(points: XY[]): XY[] {
  const seen = new Map<number, XY>();
  for (const p of points) seen.set(p.x, p);
  return [...seen.values()].sort((a, b) => a.x - b.x);
}

// One case, many events: the banks are read once per case (the sheet draws a long-section for each event).
const banksOfCase = new WeakMap<CaseInput, ReturnType<typeof bankLevelAlong>>();
function bankLevelOf(input: CaseInput): ReturnType<typeof bankLevelAlong> {
  if (!banksOfCase.has(input)) banksOfCase.set(input, bankLevelAlong(caseToSI(input).reach));
  return banksOfCase.get(input) ?? null;
}

/** Bank level along the reach, as the engine reads it (in SI; the case may be in ft), without building its sections. */
function bankLine(input: CaseInput, distances: number[]): XY[] | null {
  const levelAt = bankLevelOf(input);
  if (!levelAt) return null;
  const k = unitScale(input.units).length;
  const stations = input.reach.kind === 'surveyed' ? input.reach.sections.map((s) => s.distanceUpstream) : [];
  return byDistance([...distances, ...stations].map((x) => ({ x, y: levelAt(x * k) / k })));
}

function structureAtControl(input: CaseInput, event: EventResult): LongSectionData['structure'] {
  const first = event.profile[0];
  if (input.control.type !== 'weir' || !first) return null;
  return { bedLevel: first.bedLevel, crestLevel: first.bedLevel + input.control.sillHeight, sillHeight: input.control.sillHeight };
}

export function longSectionData(input: CaseInput, event: EventResult): LongSectionData {
  const all = [...event.profile, ...event.withoutScheme.profile];
  const bed = byDistance(all.map((p) => ({ x: p.distanceUpstream, y: p.bedLevel })));
  const distances = bed.map((p) => p.x);
  const inundation = event.inundation?.withScheme;
  return {
    event: event.name,
    bed,
    bank: bankLine(input, distances),
    withScheme: event.profile.map((p) => ({ x: p.distanceUpstream, y: p.waterLevel })),
    withoutScheme: event.withoutScheme.profile.map((p) => ({ x: p.distanceUpstream, y: p.waterLevel })),
    normalDepthLine: event.normalDepthExists ? bed.map((p) => ({ x: p.x, y: p.y + event.normalDepth })) : null,
    criticalDepthLine: bed.map((p) => ({ x: p.x, y: p.y + event.criticalDepth })),
    energyLine: event.profile.map((p) => ({ x: p.distanceUpstream, y: p.energyLevel })),
    structure: structureAtControl(input, event),
    limits: event.limits.map((l) => ({ label: l.label, x: l.distanceUpstream, maxLevel: l.maxLevel, allowedLevel: l.maxLevel - l.freeboard, waterLevel: l.waterLevel, pass: l.pass })),
    extentOfImpact: event.extent.distanceUpstream,
    inundationExtent: inundation && inundation.extentUpstream > 0 ? inundation.extentUpstream : null,
  };
}

export function sectionOutline(input: CaseInput): SectionOutline {
  if (input.reach.kind === 'prismatic') return { kind: 'prismatic', section: input.reach.section };
  return { kind: 'surveyed', sections: input.reach.sections.map((s) => ({ distanceUpstream: s.distanceUpstream, points: s.points, ...(s.bankStations ? { bankStations: s.bankStations } : {}) })) };
}

/** The event the sheet opens on: the designer's governing event, else the engine's (least margin), else the first. */
export function featuredEventIndex(result: CaseResult, governing: 'all' | number | undefined): number {
  if (typeof governing === 'number' && governing < result.events.length) return governing;
  return result.governingEvent?.index ?? 0;
}
