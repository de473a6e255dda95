import 'server-only';
import type { DraftInputs } from '@/lib/revisions/draft-inputs';
import type { ReservoirStepInput } from '@/lib/validation/reservoir-step-schema';

export interface ReservoirEvent {
  name: string;
  discharge: number | null;
  climateChangeAllowance: number | null;
}

type ReservoirStepOpening =
  | { unavailable: { reason: string; go: { step: 'flows' | 'limits'; label: string } } }
  | { unavailable: null; defaults: ReservoirStepInput; events: ReservoirEvent[]; crestLevel: number | null };

/** What the reservoir step opens with, or why it cannot be used yet (no events; a structure that holds no storage). */
export function reservoirDefaults(draft: DraftInputs): ReservoirStepOpening {
  const events = draft.events ?? [];
  if (events.length === 0) return { unavailable: { reason: 'Enter the design flows first: each flood event can then be given its own inflow hydrograph.', go: { step: 'flows', label: 'Go to the design flows' } } };
  const control = draft.control;
  if (control && control.type !== 'weir') return { unavailable: { reason: 'The structure is a fixed depth, which gives no outflow for each reservoir level, so floods cannot be routed through storage. Routing needs a weir, spillway or rating table.', go: { step: 'limits', label: 'Go on to thresholds and limits' } } };
  const bed = draft.reach?.kind === 'prismatic' ? draft.reach.bedLevelAtControl : undefined;
  const crestLevel = control?.type === 'weir' && control.kind !== 'rating-table' && bed !== undefined ? bed + control.sillHeight : null;
  return {
    unavailable: null,
    events: events.map((e) => ({ name: e.name, discharge: e.discharge ?? null, climateChangeAllowance: e.climateChangeAllowance ?? null })),
    crestLevel,
    defaults: { ...(draft.reservoir ? { reservoir: draft.reservoir } : {}), hydrographs: events.map((e) => e.hydrograph ?? null) },
  };
}
