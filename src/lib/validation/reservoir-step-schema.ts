import { z } from 'zod';
import { type CaseUnits, UNIT_LABELS } from './case-schema-parts';
import { hydrographSchema, reservoirSchema } from './case-schema-routing';

// The wizard's reservoir step: the storage and, per design event in order, its inflow hydrograph or null (the event
// is then checked at its steady design discharge). The parts are the case file's own, so form and server agree.

export function reservoirStepSchema(units: CaseUnits) {
  const u = UNIT_LABELS[units];
  return z
    .object({
      reservoir: reservoirSchema(u).optional(),
      hydrographs: z.array(hydrographSchema(u).nullable(), { error: 'must be one entry per design event' }),
    })
    .superRefine((v, ctx) => {
      const routed = v.hydrographs.some((h) => h !== null);
      if (routed && !v.reservoir) ctx.addIssue({ code: 'custom', path: ['reservoir'], message: 'is required to route an inflow hydrograph: give the storage' });
      if (v.reservoir && !routed) ctx.addIssue({ code: 'custom', path: ['hydrographs'], message: 'must give at least one event an inflow hydrograph to route through the reservoir' });
    });
}
export type ReservoirStepInput = z.input<ReturnType<typeof reservoirStepSchema>>;
export type ReservoirStepValues = z.output<ReturnType<typeof reservoirStepSchema>>;
