import { parse } from 'csv-parse/sync';
import { excerpt } from '@/lib/case-words/excerpt';
import { MAX_CENTRELINE_VERTICES, MAX_OUTLINE_VERTICES, MAX_PLAN_OUTLINES, type PlanGeometry, chainageStartSchema, parcelReferenceSchema, positionSchema } from '@/lib/validation/plan-schemas';
import { planGeometryIssues, withOpenRings } from './check-plan-geometry';
import type { ParsedPlan } from './outlines-geojson';
import type { PlanIssue } from './plan-issues';

// A plan as a CSV of vertices: one line per vertex, in order round each outline (the closing vertex may be left out),
// the vertices of one outline on consecutive lines. The column `feature` holds the parcel reference, or the word
// "centreline" for the river centreline drawn from the structure upstream; `part` numbers the pieces of a parcel in
// several pieces (default 1); `chainage_start_m`, on the centreline's first line only, is its first vertex's chainage.

export const PLAN_CSV_COLUMNS = ['feature', 'easting_m', 'northing_m', 'part', 'chainage_start_m'] as const;
type Column = (typeof PLAN_CSV_COLUMNS)[number];
const REQUIRED: Column[] = ['feature', 'easting_m', 'northing_m'];
const CENTRELINE = 'centreline';
const NUMBER = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;
const lineAt = (n: number) => `line ${n}`;
const asNumber = (text: string): number | string | undefined => (text === '' ? undefined : NUMBER.test(text) ? Number(text) : text);

function readRows(text: string): { rows: { cells: Record<Column, string>; line: number }[]; issues: PlanIssue[] } {
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(text, { bom: true, info: true, relax_column_count: true, skip_empty_lines: true, trim: true });
  } catch (error) {
    return { rows: [], issues: [{ place: lineAt((error as { lines?: number }).lines ?? 1), field: null, message: `the file is not valid CSV: ${excerpt((error as Error).message, 80)}` }] };
  }
  if (!records.length) return { rows: [], issues: [{ place: 'the file', field: null, message: 'is empty: it needs a header line and one line per vertex' }] };
  const header = records[0].record.map((h) => h.trim().toLowerCase());
  const issues: PlanIssue[] = header.flatMap((h, i) => (PLAN_CSV_COLUMNS.includes(h as Column) ? [] : [{ place: lineAt(1), field: null, message: `column ${i + 1} "${excerpt(h)}" is not a plan column; the columns are ${PLAN_CSV_COLUMNS.join(', ')}` }]));
  for (const c of REQUIRED) if (!header.includes(c)) issues.push({ place: lineAt(1), field: null, message: `the header has no ${c} column (required)` });
  if (issues.length) return { rows: [], issues };
  const rows = records.slice(1).map((r) => ({ line: r.info.lines, cells: Object.fromEntries(PLAN_CSV_COLUMNS.map((c) => [c, r.record[header.indexOf(c)] ?? ''])) as Record<Column, string> }));
  return { rows, issues: [] };
}

/** Reads and checks the CSV text; every problem names its line and column. */
export function parsePlanCsv(text: string): ParsedPlan {
  const read = readRows(text);
  if (read.issues.length) return { ok: false, issues: read.issues };
  const issues: PlanIssue[] = [];
  const groups = new Map<string, { reference: string; first: number; last: number; parts: Map<string, [number, number][]> }>();
  let chainageStartM = 0;
  let previousKey = '';
  for (const { line, cells } of read.rows) {
    const reference = parcelReferenceSchema.safeParse(cells.feature);
    if (!reference.success) { issues.push({ place: lineAt(line), field: 'feature', message: reference.error.issues[0].message }); continue; }
    const position = positionSchema.safeParse([asNumber(cells.easting_m), asNumber(cells.northing_m)]);
    if (!position.success) { issues.push(...position.error.issues.map((i) => ({ place: lineAt(line), field: i.path[0] === 0 ? 'easting_m' : 'northing_m', message: i.message }))); continue; }
    const key = reference.data.toLowerCase();
    const group = groups.get(key) ?? { reference: reference.data, first: line, last: line, parts: new Map() };
    if (groups.has(key) && previousKey !== key) issues.push({ place: lineAt(line), field: 'feature', message: `the vertices of ${reference.data} must be on consecutive lines (it began on line ${group.first})` });
    if (cells.chainage_start_m !== '') {
      const start = chainageStartSchema.safeParse(asNumber(cells.chainage_start_m));
      if (key !== CENTRELINE || groups.has(key)) issues.push({ place: lineAt(line), field: 'chainage_start_m', message: 'belongs on the first line of the centreline only' });
      else if (!start.success) issues.push({ place: lineAt(line), field: 'chainage_start_m', message: start.error.issues[0].message });
      else chainageStartM = start.data;
    }
    const part = cells.part || '1';
    group.parts.set(part, [...(group.parts.get(part) ?? []), position.data]);
    group.last = line;
    groups.set(key, group);
    previousKey = key;
  }
  const centreline = groups.get(CENTRELINE);
  const outlines = [...groups.entries()].filter(([k]) => k !== CENTRELINE).map(([, g]) => g);
  if (!centreline) issues.push({ place: 'the file', field: 'feature', message: 'has no centreline: add the river centreline’s vertices with feature "centreline", from the structure upstream' });
  else if (centreline.parts.size > 1 || [...centreline.parts.values()][0].length > MAX_CENTRELINE_VERTICES) issues.push({ place: lineAt(centreline.first), field: 'feature', message: `the centreline must be one line of at most ${MAX_CENTRELINE_VERTICES} vertices` });
  if (outlines.length > MAX_PLAN_OUTLINES) issues.push({ place: 'the file', field: 'feature', message: `holds ${outlines.length} outlines; a plan holds at most ${MAX_PLAN_OUTLINES}` });
  for (const g of outlines) {
    const count = [...g.parts.values()].reduce((n, p) => n + p.length, 0);
    if (count > MAX_OUTLINE_VERTICES) issues.push({ place: lineAt(g.first), field: 'feature', message: `the outline of ${g.reference} has ${count} vertices; at most ${MAX_OUTLINE_VERTICES}` });
  }
  if (issues.length || !centreline) return { ok: false, issues };
  const plan = withOpenRings({
    outlines: outlines.map((g) => ({ reference: g.reference, source: g.first, polygons: [...g.parts.values()].map((ring) => [ring]) })),
    centreline: { chainageStartM, points: [...centreline.parts.values()][0] },
  });
  const geometry = planGeometryIssues(plan, lineAt);
  return geometry.length ? { ok: false, issues: geometry } : { ok: true, plan };
}
