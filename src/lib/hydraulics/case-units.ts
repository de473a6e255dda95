// US customary case files: converted to SI on the way in, and their results back on the way out.
import type { CaseInput } from '@/lib/validation/case-schema';
import { CUBIC_METRES_PER_CUBIC_FOOT, METRES_PER_FOOT } from './units';

export interface UnitScale {
  length: number;
  discharge: number;
  /** A weir coefficient C of Q = C·L·H^1.5 carries units of √length / time: C_SI = C_US·√0.3048. */
  weirCoefficient: number;
}

/** Factors from the case's units to SI (all 1 for an SI case). */
export function unitScale(units: CaseInput['units']): UnitScale {
  return units === 'US'
    ? { length: METRES_PER_FOOT, discharge: CUBIC_METRES_PER_CUBIC_FOOT, weirCoefficient: Math.sqrt(METRES_PER_FOOT) }
    : { length: 1, discharge: 1, weirCoefficient: 1 };
}

function scaled<T extends number | undefined>(value: T, factor: number): T {
  return (value === undefined ? undefined : value * factor) as T;
}

function reachToSI(reach: CaseInput['reach'], k: UnitScale): CaseInput['reach'] {
  const L = k.length;
  if (reach.kind === 'surveyed') {
    return {
      ...reach,
      sections: reach.sections.map((s) => ({
        ...s,
        distanceUpstream: s.distanceUpstream * L,
        points: s.points.map(([station, elevation]) => [station * L, elevation * L] as [number, number]),
        bankStations: s.bankStations && ([s.bankStations[0] * L, s.bankStations[1] * L] as [number, number]),
        bankLevel: scaled(s.bankLevel, L),
      })),
    };
  }
  const section = reach.section;
  const sectionSI =
    section.shape === 'rectangular'
      ? { ...section, width: section.width * L }
      : section.shape === 'trapezoidal'
        ? { ...section, bottomWidth: section.bottomWidth * L }
        : section.shape === 'circular'
          ? { ...section, diameter: section.diameter * L }
          : section;
  return { ...reach, section: sectionSI, length: reach.length * L, bedLevelAtControl: reach.bedLevelAtControl * L, bankHeight: scaled(reach.bankHeight, L) };
}

function controlToSI(control: CaseInput['control'], k: UnitScale): CaseInput['control'] {
  const L = k.length;
  if (control.type === 'depth') return { ...control, depth: control.depth * L };
  // Only the ogee's C has units; the thin-plate and broad-crested Cd are dimensionless.
  const coefficientScale = control.kind === 'ogee' ? k.weirCoefficient : 1;
  return {
    ...control,
    crestLength: scaled(control.crestLength, L),
    sillHeight: control.sillHeight * L,
    coefficient: scaled(control.coefficient, coefficientScale),
    crestBreadth: scaled(control.crestBreadth, L),
    channelWidth: scaled(control.channelWidth, L),
    designHead: scaled(control.designHead, L),
    tailwaterLevel: scaled(control.tailwaterLevel, L),
    tailwaterDepth: scaled(control.tailwaterDepth, L),
    ratingTable: control.ratingTable?.map(([level, q]) => [level * L, q * k.discharge] as [number, number]),
  };
}

type CaseEvent = CaseInput['events'][number];
type Reservoir = NonNullable<CaseInput['reservoir']>;

/** Hydrograph discharges to SI; its times stay in hours, as the case file gives them. */
function eventToSI(e: CaseEvent, k: UnitScale): CaseEvent {
  const hydrograph = e.hydrograph?.kind === 'table' ? { ...e.hydrograph, points: e.hydrograph.points.map((p) => ({ ...p, discharge: p.discharge * k.discharge })) } : e.hydrograph;
  return { ...e, discharge: e.discharge * k.discharge, ...(hydrograph ? { hydrograph } : {}) };
}

function reservoirToSI(r: Reservoir, k: UnitScale): Reservoir {
  const L = k.length;
  const s = r.storage;
  const storage: Reservoir['storage'] =
    s.kind === 'constant-area'
      ? { ...s, area: s.area * L * L }
      : s.kind === 'level-area'
        ? { ...s, rows: s.rows.map((row) => ({ level: row.level * L, area: row.area * L * L })) }
        : { ...s, rows: s.rows.map((row) => ({ level: row.level * L, volume: row.volume * L * L * L })) };
  return { ...r, storage, startLevel: scaled(r.startLevel, L), length: scaled(r.length, L) };
}

/** The same case in SI units (returned unchanged when it is SI already). Slopes, n, Cd and percentages need no change. */
export function caseToSI(input: CaseInput): CaseInput {
  if (input.units === 'SI') return input;
  const k = unitScale(input.units);
  const L = k.length;
  return {
    ...input,
    units: 'SI',
    reach: reachToSI(input.reach, k),
    events: input.events.map((e) => eventToSI(e, k)),
    reservoir: input.reservoir && reservoirToSI(input.reservoir, k),
    control: controlToSI(input.control, k),
    existingControl: input.existingControl && { ...input.existingControl, depth: input.existingControl.depth * L },
    impactThreshold: scaled(input.impactThreshold, L),
    minimumMargin: scaled(input.minimumMargin, L),
    limits: input.limits.map((l) => ({ ...l, distanceUpstream: l.distanceUpstream * L, maxLevel: l.maxLevel * L, freeboard: l.freeboard * L })),
    sizing: input.sizing && { ...input.sizing, increment: input.sizing.increment * L, min: scaled(input.sizing.min, L), max: scaled(input.sizing.max, L) },
  };
}
