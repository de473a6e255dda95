import { z } from 'zod';
import { type CaseUnits, caseSchema } from './case-schema';
import { multiLineText, singleLineText } from './plain-text';
import { missingOr } from './case-schema-parts';
import { reservoirStepSchema } from './reservoir-step-schema';

// The wizard's forms, one schema per step. Every case field is taken from the engine's own case schema
// (a .pick() or a part of it), so the form in the browser and the server refuse exactly the same input.

const [siCase, usCase] = caseSchema.out.options;
const CASE_OBJECTS = { SI: siCase, US: usCase } as const;

function caseObject(units: CaseUnits) {
  return CASE_OBJECTS[units];
}

function prismaticReach(units: CaseUnits) {
  return caseObject(units).shape.reach.options[0];
}

function surveyedSection(units: CaseUnits) {
  return caseObject(units).shape.reach.options[1].shape.sections.element;
}

export const WIZARD_STEPS = ['scheme', 'channel', 'flows', 'structure', 'reservoir', 'limits', 'results'] as const;
export type WizardStep = (typeof WIZARD_STEPS)[number];
export const EDITABLE_STEPS = ['scheme', 'channel', 'flows', 'structure', 'reservoir', 'limits'] as const;
export type EditableStep = (typeof EDITABLE_STEPS)[number];

export const unitsSchema = z.enum(['SI', 'US'], { error: 'must be SI (m, m³/s) or US customary (ft, ft³/s)' });

const words = (what: string, max: number) =>
  singleLineText(what)
    .min(1, { error: `is required (${what})` })
    .max(max, { error: `must be at most ${max} characters` });

/** Step 1, the scheme: the register's fields, the datum, the units and the site levels. */
export function schemeStepSchema(units: CaseUnits) {
  const reach = prismaticReach(units).shape;
  return z.object({
    name: words('the scheme’s name', 200),
    watercourse: words('the river or stream', 200),
    site: words('where the structure is', 200),
    description: multiLineText('the description').max(2000, { error: 'must be at most 2000 characters' }).optional(),
    datum: words('the level datum, e.g. Ordnance Datum Newlyn', 120),
    units: z.literal(units, { error: 'must be SI (m, m³/s) or US customary (ft, ft³/s)' }),
    bedLevelAtControl: reach.bedLevelAtControl.optional(),
    reachLength: reach.length.optional(),
  });
}
export type SchemeStepInput = z.input<ReturnType<typeof schemeStepSchema>>;
export type SchemeStepValues = z.output<ReturnType<typeof schemeStepSchema>>;

/** Step 2, a prismatic channel: shape, Manning's n and bed slope (a surveyed reach comes from a CSV upload instead). */
export function channelStepSchema(units: CaseUnits) {
  return prismaticReach(units).pick({ section: true, manningN: true, bedSlope: true, energyCoefficient: true });
}
export type ChannelStepInput = z.input<ReturnType<typeof channelStepSchema>>;
export type ChannelStepValues = z.output<ReturnType<typeof channelStepSchema>>;

export const governingSchema = z.union([z.literal('all'), z.number().int().nonnegative()], { error: 'must be "all" or the number of one event' });
export type Governing = z.infer<typeof governingSchema>;

/** Step 3, the design flows, and which one governs (or all checked alike). */
export function flowsStepSchema(units: CaseUnits) {
  return caseObject(units)
    .pick({ events: true })
    .extend({ governing: governingSchema })
    .superRefine((v, ctx) => {
      if (v.governing !== 'all' && v.governing >= v.events.length) ctx.addIssue({ code: 'custom', path: ['governing'], message: 'must be one of the events listed' });
    });
}
export type FlowsStepInput = z.input<ReturnType<typeof flowsStepSchema>>;
export type FlowsStepValues = z.output<ReturnType<typeof flowsStepSchema>>;

/** Step 4, the structure: the weir or spillway, and the level downstream without it. */
export function structureStepSchema(units: CaseUnits) {
  return caseObject(units)
    .pick({ control: true, existingControl: true })
    .superRefine((v, ctx) => {
      if (v.control.type === 'weir' && v.control.coefficient !== undefined && !v.control.coefficientReason?.trim()) {
        ctx.addIssue({ code: 'custom', path: ['control', 'coefficientReason'], message: 'is required with your own coefficient: say where the value comes from (a model test, a reference, a calibration)' });
      }
    });
}
export type StructureStepInput = z.input<ReturnType<typeof structureStepSchema>>;
export type StructureStepValues = z.output<ReturnType<typeof structureStepSchema>>;

/** Step 6, thresholds and limits, and whether to size the crest and run the sensitivity table. */
export function limitsStepSchema(units: CaseUnits) {
  const c = caseObject(units).shape;
  return z.object({
    bankHeight: prismaticReach(units).shape.bankHeight,
    // One entry per surveyed section; null (JSON has no undefined) means "the lower ground level at its bank stations".
    sectionBankLevels: z.array(surveyedSection(units).shape.bankLevel.nullable()).optional(),
    impactThreshold: c.impactThreshold,
    minimumMargin: c.minimumMargin,
    limits: c.limits,
    sizing: c.sizing,
    sensitivity: c.sensitivity,
  });
}
export type LimitsStepInput = z.input<ReturnType<typeof limitsStepSchema>>;
export type LimitsStepValues = z.output<ReturnType<typeof limitsStepSchema>>;

export const STEP_SCHEMAS = {
  scheme: schemeStepSchema,
  channel: channelStepSchema,
  flows: flowsStepSchema,
  structure: structureStepSchema,
  reservoir: reservoirStepSchema,
  limits: limitsStepSchema,
} as const;

/** The body of PUT /api/revisions/[id]: which step, and that step's values (checked against the step's schema on the server). */
export const saveStepRequestSchema = z.object({
  step: z.enum(EDITABLE_STEPS, { error: `must be one of ${EDITABLE_STEPS.join(', ')}` }),
  values: z.record(z.string(), z.unknown(), { error: 'must be the form’s values' }),
});
export type SaveStepRequest = z.infer<typeof saveStepRequestSchema>;

/** A new scheme: step 1 of the wizard. */
export const newSchemeSchema = z.discriminatedUnion('units', [schemeStepSchema('SI'), schemeStepSchema('US')], { error: 'must be SI (m, m³/s) or US customary (ft, ft³/s)' });
export type NewSchemeInput = z.infer<typeof newSchemeSchema>;

/** The live head preview: the structure form's values, against the draft's saved channel and flows. */
export const headPreviewRequestSchema = z.object({
  revisionId: z.string({ error: missingOr('text') }).min(1, { error: 'is required' }).max(64),
  control: z.unknown(),
  existingControl: z.unknown().optional(),
});
export type HeadPreviewRequest = z.infer<typeof headPreviewRequestSchema>;

export const startDraftSchema = z.object({ revisionId: z.string({ error: missingOr('text') }).min(1, { error: 'is required' }).max(64) });
export const adoptCrestSchema = z.object({ revisionId: z.string({ error: missingOr('text') }).min(1, { error: 'is required' }).max(64) });
export const evaluateRequestSchema = z.object({ revisionId: z.string({ error: missingOr('text') }).min(1, { error: 'is required' }).max(64) });
