import { z } from 'zod';
import { atMost, finite, missingOr, nonNegative, positive, text, type UnitLabels } from './case-schema-primitives';
import { multiLineText } from './plain-text';
import { dischargeMatchesHydrograph, hydrographSchema } from './case-schema-routing';
import { MAX_MANNING_N, MIN_MANNING_N } from './manning-range';
import { MAX_POINTS_PER_SECTION, MAX_RATING_TABLE_ROWS, MAX_SURVEYED_SECTIONS } from './input-limits';

// Building blocks of the case-file schema: one schema per part of the file, with messages in the case's units.

export { atMost, type CaseUnits, finite, missingOr, nonNegative, positive, text, UNIT_LABELS, type UnitLabels } from './case-schema-primitives';

function sectionSchema(u: UnitLabels) {
  const slope = nonNegative().optional();
  const slopes = { sideSlope: slope, sideSlopeLeft: slope, sideSlopeRight: slope };
  const needSlopes = (v: { sideSlope?: number; sideSlopeLeft?: number; sideSlopeRight?: number }, ctx: z.RefinementCtx) => {
    const left = v.sideSlopeLeft ?? v.sideSlope;
    const right = v.sideSlopeRight ?? v.sideSlope;
    if (left === undefined || right === undefined) {
      ctx.addIssue({ code: 'custom', path: ['sideSlope'], message: 'is required (horizontal run per unit rise, z in z:1), or give both sideSlopeLeft and sideSlopeRight' });
    }
  };
  return z.discriminatedUnion(
    'shape',
    [
      z.object({ shape: z.literal('rectangular'), width: positive(u.length) }),
      z.object({ shape: z.literal('trapezoidal'), bottomWidth: positive(u.length), ...slopes }).superRefine(needSlopes),
      z
        .object({ shape: z.literal('triangular'), ...slopes })
        .superRefine(needSlopes)
        .superRefine((v, ctx) => {
          if ((v.sideSlopeLeft ?? v.sideSlope ?? 1) + (v.sideSlopeRight ?? v.sideSlope ?? 1) <= 0) {
            ctx.addIssue({ code: 'custom', path: ['sideSlope'], message: 'must be greater than 0 on at least one side' });
          }
        }),
      z.object({ shape: z.literal('circular'), diameter: positive(u.length) }),
    ],
    { error: missingOr('one of rectangular, trapezoidal, triangular, circular') },
  );
}

export const manningN = finite()
  .min(MIN_MANNING_N, { error: `must be at least ${MIN_MANNING_N} (Manning's n is dimensionless, typically 0.01–0.15)` })
  .max(MAX_MANNING_N, { error: `must be at most ${MAX_MANNING_N} (Manning's n is dimensionless, typically 0.01–0.15)` });
export const energyCoefficient = finite().min(1, { error: 'must be 1 or more' }).max(3, { error: 'must be at most 3' });

export function prismaticReachSchema(u: UnitLabels) {
  return z.object({
    kind: z.literal('prismatic'),
    section: sectionSchema(u),
    manningN,
    bedSlope: finite('m/m, positive when the bed falls downstream').gt(-1, { error: 'must be more than −1 m/m' }).lt(1, { error: 'must be less than 1 m/m' }),
    length: positive(u.length),
    bedLevelAtControl: finite(u.length),
    energyCoefficient: energyCoefficient.optional(),
    bankHeight: positive(u.length).optional(),
  });
}

export function surveyedReachSchema(u: UnitLabels) {
  const point = z.tuple([finite(`station, ${u.length}`), finite(`elevation, ${u.length}`)], { error: 'must be a [station, elevation] pair' });
  const roughness = z.union([manningN, z.object({ left: manningN, channel: manningN, right: manningN })], {
    error: "must be a Manning's n or { left, channel, right }",
  });
  const section = z.object({
    distanceUpstream: nonNegative(u.length),
    points: z.array(point, { error: missingOr('a list of [station, elevation] points') }).min(3, { error: 'must list at least three [station, elevation] points' })
      .max(MAX_POINTS_PER_SECTION, { error: atMost(MAX_POINTS_PER_SECTION, 'per cross-section') }),
    manningN: roughness,
    bankStations: z.tuple([finite(u.length), finite(u.length)], { error: 'must be a [left, right] pair of stations' }).optional(),
    bankLevel: finite(u.length).optional(),
  });
  return z.object({
    kind: z.literal('surveyed'),
    sections: z
      .array(section, { error: missingOr('a list of cross-sections') })
      .min(2, { error: 'must list at least two cross-sections' })
      .max(MAX_SURVEYED_SECTIONS, { error: atMost(MAX_SURVEYED_SECTIONS, 'per reach') })
      .superRefine((sections, ctx) => {
        if (sections[0] && sections[0].distanceUpstream !== 0) {
          ctx.addIssue({ code: 'custom', path: [0, 'distanceUpstream'], message: 'must be 0: the first section is the control section' });
        }
        sections.forEach((s, i) => {
          if (i > 0 && !(s.distanceUpstream > sections[i - 1].distanceUpstream)) {
            ctx.addIssue({ code: 'custom', path: [i, 'distanceUpstream'], message: 'must be greater than the distance of the section before it' });
          }
        });
      }),
    energyCoefficient: energyCoefficient.optional(),
  });
}

// Below this (a litre a second, or a thirtieth of one in ft³/s) depths underflow to nothing in a wide channel.
const MIN_EVENT_DISCHARGE = 0.001;

export function eventSchema(u: UnitLabels) {
  return z
    .object({
      name: text('the event name'),
      /** With a hydrograph table it may be left out of the file: it is then the table's peak (see withDischargeFromHydrograph). */
      discharge: finite(u.discharge)
        .positive({ error: `must be greater than 0 ${u.discharge}`, abort: true })
        .min(MIN_EVENT_DISCHARGE, { error: `must be at least ${MIN_EVENT_DISCHARGE} ${u.discharge} (a smaller flow is below what the depth calculations resolve)` }),
      annualExceedanceProbability: finite().gt(0, { error: 'must be greater than 0' }).lte(1, { error: 'must be at most 1' }).optional(),
      returnPeriod: finite('years').gte(1, { error: 'must be at least 1 year' }).optional(),
      climateChangeAllowance: finite('%').gte(0, { error: 'must be 0 % or more' }).lte(200, { error: 'must be at most 200 %' }).optional(),
      hydrograph: hydrographSchema(u).optional(),
    })
    .superRefine(dischargeMatchesHydrograph(u));
}

const WEIR_KINDS = ['sharp-crested', 'broad-crested', 'ogee', 'rating-table'] as const;

export function weirControlSchema(u: UnitLabels) {
  return z
    .object({
      type: z.literal('weir'),
      kind: z.enum(WEIR_KINDS, { error: `must be one of ${WEIR_KINDS.join(', ')}` }),
      crestLength: positive(u.length).optional(),
      sillHeight: nonNegative(u.length),
      coefficient: positive().optional(),
      coefficientReason: multiLineText('where the coefficient comes from').max(500).optional(),
      approachVelocity: z.boolean({ error: 'must be true or false' }).optional(),
      crestBreadth: positive(u.length).optional(),
      noseShape: z.enum(['square-edged', 'round-nosed'], { error: 'must be square-edged or round-nosed' }).optional(),
      channelWidth: positive(u.length).optional(),
      designHead: positive(u.length).optional(),
      piers: z.object({ count: finite().int({ error: 'must be a whole number' }).nonnegative({ error: 'must be 0 or more' }), coefficient: nonNegative().optional() }).optional(),
      abutmentCoefficient: nonNegative().optional(),
      tailwaterDepth: nonNegative(`${u.length} above the channel bed just downstream of the structure`).optional(),
      /** Version 1's name for tailwaterDepth (it always held a depth); still read, with a deprecation warning. */
      tailwaterLevel: nonNegative(`${u.length} above the channel bed just downstream of the structure`).optional(),
      ratingTable: z
        .array(z.tuple([nonNegative(`level above the crest, ${u.length}`), nonNegative(u.discharge)], { error: 'must be a [level, discharge] pair' }))
        .min(2, { error: 'must list at least two [level, discharge] pairs' })
        .max(MAX_RATING_TABLE_ROWS, { error: atMost(MAX_RATING_TABLE_ROWS, 'in one rating table') })
        .superRefine((rows, ctx) => {
          rows.forEach(([level, q], i) => {
            if (i > 0 && (level <= rows[i - 1][0] || q <= rows[i - 1][1])) {
              ctx.addIssue({ code: 'custom', path: [i], message: 'levels and discharges must both increase strictly down the table' });
            }
          });
        })
        .optional(),
    })
    .superRefine((v, ctx) => {
      if (v.kind === 'rating-table' && v.ratingTable === undefined) ctx.addIssue({ code: 'custom', path: ['ratingTable'], message: 'is required for a rating-table control' });
      if (v.kind !== 'rating-table' && v.crestLength === undefined) ctx.addIssue({ code: 'custom', path: ['crestLength'], message: 'is required' });
      if (v.kind !== 'rating-table' && v.sillHeight <= 0) ctx.addIssue({ code: 'custom', path: ['sillHeight'], message: `must be greater than 0 ${u.length}` });
      if (v.tailwaterDepth !== undefined && v.tailwaterLevel !== undefined && v.tailwaterDepth !== v.tailwaterLevel) {
        ctx.addIssue({ code: 'custom', path: ['tailwaterLevel'], message: 'is the old name of tailwaterDepth; give only tailwaterDepth' });
      }
    });
}

export function depthControlSchema(u: UnitLabels) {
  return z.object({ type: z.literal('depth'), depth: positive(u.length) });
}

