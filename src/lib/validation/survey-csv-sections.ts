import { EngineError } from '@/lib/hydraulics/errors';
import { validatedSurvey } from '@/lib/hydraulics/surveyed-spec';
import type { CaseUnits } from './case-schema';
import type { SurveyRow } from './survey-csv-rows';

// Grouping checked rows into cross-sections: order, point count, banks and one Manning's n per sub-area.

/** A cross-section as the case file's surveyed reach holds it, plus the lines it came from. */
export interface SurveySection {
  distanceUpstream: number;
  points: [number, number][];
  manningN: number | { left: number; channel: number; right: number };
  bankStations?: [number, number];
  lines: [first: number, last: number];
}

interface Issue {
  line: number;
  message: string;
}

const fmt = (x: number) => String(Number(x.toPrecision(10)));

function groups(rows: SurveyRow[], length: string, issues: Issue[]): SurveyRow[][] {
  const out: SurveyRow[][] = [];
  rows.forEach((row, i) => {
    const previous = rows[i - 1];
    if (previous && row.distanceUpstream < previous.distanceUpstream) {
      issues.push({ line: row.line, message: `distance_upstream ${fmt(row.distanceUpstream)} ${length} comes after ${fmt(previous.distanceUpstream)} ${length} on line ${previous.line}: list the sections in order upstream from the structure (0 ${length}), each section's points together` });
    }
    if (!previous || row.distanceUpstream !== previous.distanceUpstream) out.push([row]);
    else out[out.length - 1].push(row);
  });
  return out;
}

function span(group: SurveyRow[]): string {
  const first = group[0].line;
  const last = group[group.length - 1].line;
  return first === last ? `line ${first}` : `lines ${first}–${last}`;
}

function banks(group: SurveyRow[], where: string, issues: Issue[]): [number, number] | undefined | null {
  const left = group.filter((r) => r.bank === 'left');
  const right = group.filter((r) => r.bank === 'right');
  if (left.length > 1) issues.push({ line: left[1].line, message: `marks a second left bank in ${where}; mark one left and one right bank per section` });
  if (right.length > 1) issues.push({ line: right[1].line, message: `marks a second right bank in ${where}; mark one left and one right bank per section` });
  if (left.length === 0 && right.length === 0) return undefined;
  if (left.length === 0 || right.length === 0) {
    issues.push({ line: (left[0] ?? right[0]).line, message: `${where} marks a ${left.length ? 'left' : 'right'} bank but no ${left.length ? 'right' : 'left'} bank: mark both, or neither` });
    return null;
  }
  if (!(right[0].station > left[0].station)) {
    issues.push({ line: right[0].line, message: `the right bank (station ${fmt(right[0].station)}) must lie to the right of the left bank (station ${fmt(left[0].station)}) in ${where}` });
    return null;
  }
  return [left[0].station, right[0].station];
}

/** n of each point, carried down from the row above when blank; each applies from its point to the next. */
function roughness(group: SurveyRow[], bankStations: [number, number] | undefined, where: string, issues: Issue[]): SurveySection['manningN'] | null {
  if (group[0].manningN === null) {
    issues.push({ line: group[0].line, message: `manning_n is empty on the first point of ${where}: give each section's n on its first row (later rows may be left blank to keep it)` });
    return null;
  }
  let current = group[0].manningN;
  const areaOf = (row: SurveyRow) => (!bankStations ? 'channel' : row.station < bankStations[0] ? 'left' : row.station < bankStations[1] ? 'channel' : 'right');
  const areaN: Partial<Record<'left' | 'channel' | 'right', number>> = {};
  for (const row of group) {
    current = row.manningN ?? current;
    const area = row.station === bankStations?.[1] && row === group[group.length - 1] ? 'channel' : areaOf(row);
    const seen = areaN[area];
    if (seen === undefined) areaN[area] = current;
    else if (seen !== current) {
      const hint = bankStations ? 'give one n per sub-area (left overbank, channel, right overbank), changing only at a bank marker' : 'mark the banks left and right to give the overbanks their own n';
      const part = bankStations ? `the ${area === 'channel' ? 'main channel' : `${area} overbank`} of ${where}` : where;
      issues.push({ line: row.line, message: `manning_n changes from ${seen} to ${current} within ${part}: ${hint}` });
      return null;
    }
  }
  if (!bankStations) return areaN.channel ?? current;
  const channel = areaN.channel ?? current;
  const left = areaN.left ?? channel;
  const right = areaN.right ?? channel;
  return left === channel && right === channel ? channel : { left, channel, right };
}

function sectionOf(group: SurveyRow[], length: string, issues: Issue[]): SurveySection | null {
  const at = group[0].distanceUpstream;
  const where = `the section at ${fmt(at)} ${length} (${span(group)})`;
  const before = issues.length;
  if (group.length < 3) issues.push({ line: group[0].line, message: `${where} has ${group.length} point${group.length === 1 ? '' : 's'}; a cross-section needs at least three` });
  group.forEach((row, i) => {
    if (i > 0 && row.station < group[i - 1].station) {
      issues.push({ line: row.line, message: `station ${fmt(row.station)} ${length} is less than ${fmt(group[i - 1].station)} ${length} on line ${group[i - 1].line}: list each section's points from left to right` });
    }
  });
  const bankStations = banks(group, where, issues);
  if (bankStations === null || issues.length > before) return null;
  const manningN = roughness(group, bankStations, where, issues);
  if (manningN === null) return null;
  const section: SurveySection = { distanceUpstream: at, points: group.map((r) => [r.station, r.elevation]), manningN, ...(bankStations ? { bankStations } : {}), lines: [group[0].line, group[group.length - 1].line] };
  try {
    validatedSurvey({ points: section.points, manningN: section.manningN, ...(bankStations ? { bankStations } : {}) }, 'section');
  } catch (error) {
    if (!(error instanceof EngineError)) throw error;
    issues.push({ line: group[0].line, message: `${where} ${error.message.replace(/^section(\.points)?(\[\d+\])?(\.\w+)?: /, '')}` });
    return null;
  }
  return section;
}

export function surveySections(rows: SurveyRow[], units: CaseUnits): { ok: true; sections: SurveySection[] } | { ok: false; issues: Issue[] } {
  const length = units === 'US' ? 'ft' : 'm';
  const issues: Issue[] = [];
  const grouped = groups(rows, length, issues);
  if (issues.length > 0) return { ok: false, issues };
  if (grouped[0][0].distanceUpstream !== 0) {
    issues.push({ line: grouped[0][0].line, message: `the first section is at ${fmt(grouped[0][0].distanceUpstream)} ${length}; it must be at distance_upstream 0 ${length}, the control section at the structure` });
  }
  if (grouped.length < 2) issues.push({ line: 0, message: `has ${grouped.length} cross-section; a surveyed reach needs at least two (different distance_upstream values)` });
  const sections = grouped.map((g) => sectionOf(g, length, issues));
  if (issues.length > 0) return { ok: false, issues };
  return { ok: true, sections: sections.filter((s): s is SurveySection => s !== null) };
}
