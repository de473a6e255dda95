// The depth the scheme holds at the control in one event: a given depth, or a structure against the water below it.
import type { CaseInput } from '@/lib/validation/case-schema';
import { type ControlAdjustments, givenTailwaterDepth, type StructureOutcome, structureOutcome } from './case-control';
import { controlDepth } from './control-depth';
import { NoPhysicalSolutionError } from './errors';
import type { FlowSection } from './section';
import type { CubicMetresPerSecond, Metres } from './units';

export interface HeldControl {
  structure: StructureOutcome;
  /** Depth above the bed at the control that the with-scheme profile starts from. */
  startDepth: Metres;
  /** False when a crest is too low to control this flow: the level there is then the channel's own. */
  controls: boolean;
  explanation: string | null;
  warnings: string[];
}

const m = (x: Metres) => `${x.toFixed(3)} m`;

/**
 * The depth just downstream of a structure: the case's tailwater depth when it gives one, or else the level the channel
 * holds there without the scheme (normal depth, or the existing control), which is what the structure discharges into.
 * A supercritical flow downstream cannot back up over the crest (Chow, Open-Channel Hydraulics, 1959, §9-2 — from
 * memory), so then the structure is rated in free flow.
 */
function downstreamDepth(control: CaseInput['control'], withoutDepth: Metres, criticalDepth: Metres): Metres | undefined {
  if (control.type !== 'weir') return undefined;
  const given = givenTailwaterDepth(control);
  if (given !== undefined) return given;
  return withoutDepth >= criticalDepth ? withoutDepth : undefined;
}

/** The channel's own level, when a crest too low to control this discharge leaves the flow as it was. */
function notControlling(structure: StructureOutcome, withoutDepth: Metres, reason: string): HeldControl {
  return {
    structure,
    startDepth: withoutDepth,
    controls: false,
    explanation: `${reason} The level at the structure is the channel's own (${m(withoutDepth)} deep), so the structure raises nothing in this event.`,
    warnings: [],
  };
}

export function heldControl(
  input: CaseInput,
  section: FlowSection,
  discharge: CubicMetresPerSecond,
  adjust: ControlAdjustments,
  withoutDepth: Metres,
  criticalDepth: Metres,
  normalDepth: Metres | null,
): HeldControl {
  const control = input.control;
  const tailwater = downstreamDepth(control, withoutDepth, criticalDepth);
  let structure: StructureOutcome;
  try {
    structure = structureOutcome(control, section, discharge, adjust, tailwater);
  } catch (error) {
    if (!(error instanceof NoPhysicalSolutionError) || error.code !== 'weir-no-control') throw error;
    const empty: StructureOutcome = { head: 0, depth: withoutDepth, weir: null, warnings: [] };
    return notControlling(empty, withoutDepth, 'The crest is too low for this discharge: the flow would pass critical depth before reaching it.');
  }
  const held = controlDepth({ sillHeight: structure.depth - structure.head, head: structure.head, criticalDepth, normalDepth });
  if (!held.controls) {
    if (control.type === 'depth') throw new NoPhysicalSolutionError('control.depth', 'control-below-critical', held.explanation ?? 'the depth is below critical depth');
    return { ...notControlling(structure, withoutDepth, held.explanation ?? ''), warnings: structure.warnings };
  }
  const warnings = [...structure.warnings];
  if (control.type === 'weir' && tailwater !== undefined && givenTailwaterDepth(control) === undefined && tailwater > structure.depth - structure.head) {
    warnings.push(`No tailwater depth was given, so the structure was rated against the level the channel holds there without the scheme (${m(tailwater)} deep).`);
  }
  if (control.type === 'weir' && structure.depth < withoutDepth) {
    warnings.push(`The structure holds ${m(structure.depth)}, below the level without the scheme (${m(withoutDepth)}): the tailwater depth given is lower than the channel's own level at the structure; check it.`);
  }
  return { structure, startDepth: structure.depth, controls: true, explanation: held.explanation, warnings };
}
