// The control of a case file: a fixed depth, or a weir rated with the approach section at the control.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { WeirDetails } from './case-result';
import type { FlowSection } from './section';
import type { CubicMetresPerSecond, Metres } from './units';
import { weirHead, type WeirSpec } from './weirs';

type CaseControl = CaseInput['control'];
export type WeirControl = Extract<CaseControl, { type: 'weir' }>;

export interface ControlAdjustments {
  /** Multiplies the weir coefficient (sensitivity runs); default 1. */
  coefficientMultiplier?: number;
  sillHeight?: Metres;
  crestLength?: Metres;
  /** Ogee design head when the case gives none: the head at the governing discharge. */
  designHead?: Metres;
}

/** The downstream depth the case gives at the structure: `tailwaterDepth`, or the key it replaced in version 1 files. */
export function givenTailwaterDepth(control: WeirControl): Metres | undefined {
  return control.tailwaterDepth ?? control.tailwaterLevel;
}

export function weirSpecOf(control: WeirControl, adjust: ControlAdjustments = {}, downstreamDepth?: Metres): WeirSpec {
  const { type: _type, tailwaterLevel: _deprecated, tailwaterDepth: _given, ...fields } = control;
  const tailwaterDepth = downstreamDepth ?? givenTailwaterDepth(control);
  return {
    ...fields,
    ...(tailwaterDepth !== undefined ? { tailwaterDepth } : {}),
    crestLength: adjust.crestLength ?? control.crestLength ?? 0,
    sillHeight: adjust.sillHeight ?? control.sillHeight,
    ...(control.designHead === undefined && adjust.designHead !== undefined ? { designHead: adjust.designHead } : {}),
    ...(adjust.coefficientMultiplier !== undefined && adjust.coefficientMultiplier !== 1 ? { coefficientMultiplier: adjust.coefficientMultiplier } : {}),
  };
}

export interface StructureOutcome {
  /** Head over the crest (0 for a depth control). */
  head: Metres;
  /** Depth the structure holds above the bed: sill + head, or the given depth. */
  depth: Metres;
  weir: WeirDetails | null;
  warnings: string[];
}

/**
 * What the structure does at this discharge against the water downstream of it (`downstreamDepth` above the bed, the
 * case's own tailwater when it gives one): the upstream head for which it passes the discharge, submerged or free.
 */
export function structureOutcome(
  control: CaseControl,
  approach: FlowSection,
  discharge: CubicMetresPerSecond,
  adjust: ControlAdjustments = {},
  downstreamDepth?: Metres,
): StructureOutcome {
  if (control.type === 'depth') return { head: 0, depth: control.depth, weir: null, warnings: [] };
  const spec = weirSpecOf(control, adjust, downstreamDepth);
  const result = weirHead(spec, discharge, approach, { field: 'control' });
  const weir: WeirDetails = {
    kind: spec.kind,
    sillHeight: spec.sillHeight,
    head: result.head,
    energyHead: result.energyHead,
    approachVelocity: result.approachVelocity,
    coefficient: result.coefficient,
    coefficientSource: result.coefficientSource,
    coefficientIsDefault: result.coefficientIsDefault,
    coefficientForm: result.coefficientForm,
    tailwaterDepth: spec.tailwaterDepth ?? null,
    submergence: result.submergence,
    validity: result.validity,
    designHead: spec.kind === 'ogee' ? (spec.designHead ?? result.energyHead) : null,
  };
  return { head: result.head, depth: spec.sillHeight + result.head, weir, warnings: result.warnings };
}

/**
 * The ogee design head when the case gives none: the energy head at the governing (largest) discharge, so that
 * He/Hd = 1 there and below 1 for the smaller events (USBR, Design of Small Dams, 1987, ch. 9 — common practice).
 */
export function defaultDesignHead(control: CaseControl, approach: FlowSection, governingDischarge: CubicMetresPerSecond, adjust: ControlAdjustments = {}): Metres | undefined {
  if (control.type !== 'weir' || control.kind !== 'ogee' || control.designHead !== undefined) return undefined;
  const spec = weirSpecOf(control, { ...adjust, designHead: undefined });
  return weirHead(spec, governingDischarge, approach, { field: 'control' }).energyHead;
}
