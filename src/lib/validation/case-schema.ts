import { z } from 'zod';
import {
  atMost,
  type CaseUnits,
  depthControlSchema,
  eventSchema,
  finite,
  missingOr,
  nonNegative,
  positive,
  prismaticReachSchema,
  surveyedReachSchema,
  text,
  UNIT_LABELS,
  weirControlSchema,
} from './case-schema-parts';
import { reservoirSchema, routingCrossChecks, withEventDischargesFromHydrographs } from './case-schema-routing';
import { singleLineText } from './plain-text';
import { MAX_EVENTS, MAX_LIMITS } from './input-limits';

// The Sillmark case file, version 1. Shared by the CLI, the API and the web forms, so every message
// is written for a practitioner and carries its unit. Unknown keys are ignored.

export const CASE_FORMAT = 'sillmark-case';
export const CASE_VERSION = 1;

export type { CaseUnits } from './case-schema-parts';

function caseObject(units: CaseUnits) {
  const u = UNIT_LABELS[units];
  return z.object({
    format: z.literal(CASE_FORMAT, { error: `must be "${CASE_FORMAT}"` }),
    version: z.literal(CASE_VERSION, { error: `must be ${CASE_VERSION}` }),
    title: singleLineText('the case title').max(300, { error: 'must be at most 300 characters' }).optional(),
    units: z.literal(units),
    reach: z.discriminatedUnion('kind', [prismaticReachSchema(u), surveyedReachSchema(u)], { error: missingOr('"prismatic" or "surveyed"') }),
    events: z.array(eventSchema(u), { error: missingOr('a list of flood events') }).min(1, { error: 'must list at least one flood event' })
      .max(MAX_EVENTS, { error: atMost(MAX_EVENTS, 'per case') }),
    control: z.discriminatedUnion('type', [depthControlSchema(u), weirControlSchema(u)], { error: missingOr('"depth" or "weir"') }),
    existingControl: depthControlSchema(u).optional(),
    /** The storage behind a spillway; events with a hydrograph are routed through it. */
    reservoir: reservoirSchema(u).optional(),
    profile: z
      .object({
        /** Default: direct-step for a prismatic reach, standard-step for a surveyed one. */
        method: z.enum(['direct-step', 'standard-step'], { error: 'must be direct-step or standard-step' }).optional(),
        normalDepthTolerance: positive().lt(0.5, { error: 'must be below 0.5 (a fraction of the normal depth)' }).default(0.01),
        frictionSlopeAveraging: z.enum(['average-conveyance', 'arithmetic', 'geometric', 'harmonic'], { error: 'must be average-conveyance, arithmetic, geometric or harmonic' }).optional(),
        expansionCoefficient: nonNegative().max(1, { error: 'must be at most 1' }).optional(),
        contractionCoefficient: nonNegative().max(1, { error: 'must be at most 1' }).optional(),
      })
      .default({ normalDepthTolerance: 0.01 }),
    impactThreshold: positive(u.length).optional(),
    /** A pass with less room than this below every limit is reported as not robust. */
    minimumMargin: nonNegative(u.length).optional(),
    limits: z
      .array(
        z.object({
          label: text('the place name'),
          distanceUpstream: nonNegative(u.length),
          maxLevel: finite(u.length),
          freeboard: nonNegative(u.length).default(0),
        }),
      )
      .max(MAX_LIMITS, { error: atMost(MAX_LIMITS, 'per case') })
      .default([]),
    sizing: z
      .object({
        vary: z.enum(['sillHeight', 'crestLength'], { error: 'must be sillHeight or crestLength' }),
        increment: positive(u.length).default(units === 'US' ? 0.05 : 0.01),
        min: positive(u.length).optional(),
        max: positive(u.length).optional(),
        /** Size so that every sensitivity run passes too, not only the base case. */
        robust: z.boolean({ error: 'must be true or false' }).optional(),
      })
      .superRefine((v, ctx) => {
        if (v.min !== undefined && v.max !== undefined && v.max <= v.min) ctx.addIssue({ code: 'custom', path: ['max'], message: 'must be greater than sizing.min' });
      })
      .optional(),
    sensitivity: z
      .object({
        manningN: nonNegative('%').lt(100, { error: 'must be below 100 %' }).default(20),
        discharge: nonNegative('%').max(200, { error: 'must be at most 200 %' }).default(20),
        coefficient: nonNegative('%').lt(100, { error: 'must be below 100 %' }).default(10),
        /** Routed events only: the reservoir's storage up and down. */
        storage: nonNegative('%').lt(100, { error: 'must be below 100 %' }).default(20),
        /** Routed events only: the hydrograph's volume up and down at the same peak (its times stretched). */
        hydrographVolume: nonNegative('%').lt(100, { error: 'must be below 100 %' }).default(20),
      })
      .optional(),
  });
}

/** `units` defaults to SI, and an event given by its hydrograph table alone takes the table's peak as its discharge. */
function withDefaultUnits(raw: unknown): unknown {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) return raw;
  const record = withEventDischargesFromHydrographs(raw as Record<string, unknown>);
  return record.units === undefined ? { ...record, units: 'SI' } : record;
}

/** The whole case file; `units` defaults to SI. Use `parseCase` for issues with dotted field paths. */
export const caseSchema = z.preprocess(
  withDefaultUnits,
  z.discriminatedUnion('units', [caseObject('SI'), caseObject('US')], { error: 'must be "SI" or "US"' }).superRefine(routingCrossChecks),
);

export type CaseInput = z.infer<typeof caseSchema>;
export type CaseReach = CaseInput['reach'];
export type CaseControl = CaseInput['control'];
export type CaseEvent = CaseInput['events'][number];
