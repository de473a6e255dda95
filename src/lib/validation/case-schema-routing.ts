import { z } from 'zod';
import { atMost, finite, missingOr, nonNegative, positive, type UnitLabels } from './case-schema-primitives';
import { MAX_HYDROGRAPH_POINTS, MAX_STORAGE_ROWS } from './input-limits';

// The parts of the case file for routing a flood through a reservoir: an event's inflow hydrograph and the reservoir's
// storage. Times are hours from the start of the hydrograph.

const HOURS = 'hours from the start';

function hydrographTableSchema(u: UnitLabels) {
  const point = z.object({ time: nonNegative(HOURS), discharge: nonNegative(u.discharge) });
  return z.object({
    kind: z.literal('table'),
    points: z
      .array(point, { error: missingOr('a list of { time, discharge } points') })
      .min(3, { error: 'must list at least three { time, discharge } points' })
      .max(MAX_HYDROGRAPH_POINTS, { error: atMost(MAX_HYDROGRAPH_POINTS, 'in one hydrograph') })
      .superRefine((points, ctx) => {
        if (points[0] && points[0].time !== 0) ctx.addIssue({ code: 'custom', path: [0, 'time'], message: 'must be 0: the hydrograph starts at time 0' });
        points.forEach((p, i) => {
          if (i > 0 && !(p.time > points[i - 1].time)) ctx.addIssue({ code: 'custom', path: [i, 'time'], message: 'must be later than the time of the point before it' });
        });
        if (points.length > 0 && points.every((p) => p.discharge === 0)) ctx.addIssue({ code: 'custom', message: 'has no flow: every discharge is 0' });
      }),
  });
}

export function hydrographSchema(u: UnitLabels) {
  return z.discriminatedUnion(
    'kind',
    [
      hydrographTableSchema(u),
      z.object({
        kind: z.literal('unit-shape'),
        shape: z.enum(['nrcs-dimensionless'], { error: 'must be nrcs-dimensionless (the NRCS dimensionless unit hydrograph)' }),
        timeToPeak: positive(HOURS),
      }),
    ],
    { error: missingOr('"table" or "unit-shape"') },
  );
}

/** The largest discharge of a table's points, or null when they are not readable numbers yet. */
export function tablePeak(points: readonly { discharge: unknown }[]): number | null {
  const discharges = points.map((p) => p.discharge);
  if (discharges.length === 0 || !discharges.every((q): q is number => typeof q === 'number' && Number.isFinite(q))) return null;
  return Math.max(...discharges);
}

/** An event's discharge, when it has a hydrograph table, is the table's peak (within 1 %). */
export function dischargeMatchesHydrograph(u: UnitLabels) {
  return (event: { discharge: number; hydrograph?: { kind: string; points?: readonly { discharge: unknown }[] } }, ctx: z.RefinementCtx) => {
    const peak = event.hydrograph?.kind === 'table' && event.hydrograph.points ? tablePeak(event.hydrograph.points) : null;
    if (peak !== null && peak > 0 && Math.abs(event.discharge - peak) > 0.01 * peak) {
      ctx.addIssue({
        code: 'custom',
        path: ['discharge'],
        message: `differs from the peak of the inflow hydrograph (${peak} ${u.discharge}) by more than 1 %: give the same peak in both, or leave the discharge out to use the hydrograph's`,
      });
    }
  };
}

const isRecord = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);

/** An event with a hydrograph table and no discharge takes the table's peak as its discharge. */
export function withDischargeFromHydrograph(raw: unknown): unknown {
  if (!isRecord(raw) || raw.discharge !== undefined || !isRecord(raw.hydrograph) || raw.hydrograph.kind !== 'table') return raw;
  const points: unknown = raw.hydrograph.points;
  if (!Array.isArray(points) || !points.every(isRecord)) return raw;
  const peak = tablePeak(points.map((p) => ({ discharge: p.discharge })));
  return peak === null || peak <= 0 ? raw : { ...raw, discharge: peak };
}

/** The same for every event of a case file. */
export function withEventDischargesFromHydrographs(raw: Record<string, unknown>): Record<string, unknown> {
  return Array.isArray(raw.events) ? { ...raw, events: raw.events.map(withDischargeFromHydrograph) } : raw;
}

/** Levels rising down the table, and the column beside them valid for its kind. */
function storageRows<T extends { level: number }>(checkValue: (row: T, before: T) => { field: string; message: string } | null) {
  return (rows: T[], ctx: z.RefinementCtx) => {
    rows.forEach((row, i) => {
      if (i === 0) return;
      if (!(row.level > rows[i - 1].level)) ctx.addIssue({ code: 'custom', path: [i, 'level'], message: 'must be higher than the level of the row before it' });
      const problem = checkValue(row, rows[i - 1]);
      if (problem) ctx.addIssue({ code: 'custom', path: [i, problem.field], message: problem.message });
    });
  };
}

const areaAboveZero = (row: { level: number; area: number }) => (row.area > 0 ? null : { field: 'area', message: 'must be greater than 0 above the lowest row' });
const volumeGrowing = (row: { level: number; volume: number }, before: { level: number; volume: number }) =>
  row.volume > before.volume ? null : { field: 'volume', message: 'must be greater than the volume of the row before it' };

function storageSchema(u: UnitLabels) {
  const rows = <T extends z.ZodRawShape>(shape: T) =>
    z
      .array(z.object(shape), { error: missingOr('a list of rows') })
      .min(2, { error: 'must list at least two rows' })
      .max(MAX_STORAGE_ROWS, { error: atMost(MAX_STORAGE_ROWS, 'in one storage table') });
  return z.discriminatedUnion(
    'kind',
    [
      z.object({
        kind: z.literal('level-area'),
        rows: rows({ level: finite(`${u.length} above the datum`), area: nonNegative(u.area) }).superRefine(storageRows<{ level: number; area: number }>(areaAboveZero)),
      }),
      z.object({
        kind: z.literal('level-volume'),
        rows: rows({ level: finite(`${u.length} above the datum`), volume: nonNegative(u.volume) }).superRefine(storageRows<{ level: number; volume: number }>(volumeGrowing)),
      }),
      z.object({ kind: z.literal('constant-area'), area: positive(u.area) }),
    ],
    { error: missingOr('"level-area", "level-volume" or "constant-area"') },
  );
}

export function reservoirSchema(u: UnitLabels) {
  return z.object({
    storage: storageSchema(u),
    /** Default: the crest level (the reservoir full to the spillway). */
    startLevel: finite(`${u.length} above the datum`).optional(),
    /** Length along the valley from the structure; limits within it are checked against the peak level. */
    length: nonNegative(u.length).optional(),
  });
}

/** A hydrograph needs a reservoir to be routed through, and a reservoir needs a structure with a rating. */
export function routingCrossChecks(v: { events: { hydrograph?: unknown }[]; reservoir?: unknown; control: { type: string } }, ctx: z.RefinementCtx): void {
  if (v.reservoir === undefined) {
    v.events.forEach((e, i) => {
      if (e.hydrograph !== undefined) {
        ctx.addIssue({ code: 'custom', path: ['events', i, 'hydrograph'], message: 'needs a reservoir to route it through: give the reservoir (its storage) as well, or remove the hydrograph to check the steady peak discharge' });
      }
    });
  } else if (v.control.type === 'depth') {
    ctx.addIssue({ code: 'custom', path: ['reservoir'], message: 'needs a weir or rating-table control: a fixed depth at the control has no rating to pass the outflow through' });
  }
}
