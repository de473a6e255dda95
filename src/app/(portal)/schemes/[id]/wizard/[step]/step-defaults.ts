import 'server-only';
import { surveyedBankLevel } from '@/lib/hydraulics/reach-banks';
import type { DraftInputs, SurveyedReach } from '@/lib/revisions/draft-inputs';
import type { SchemeStepInput } from '@/lib/validation/scheme-schemas';
import type { SurveyedSectionBank } from '@/components/forms/wizard/limits-step-form';
import type { StructureForm } from '@/components/forms/wizard/structure-values';

// What each step's form opens with: the draft's saved values, so leaving and coming back restores them.

export function schemeDefaults(scheme: { name: string; watercourse: string; site: string; description: string | null }, draft: DraftInputs): Partial<SchemeStepInput> {
  const reach = draft.reach?.kind === 'prismatic' ? draft.reach : undefined;
  return {
    name: scheme.name,
    watercourse: scheme.watercourse,
    site: scheme.site,
    description: scheme.description ?? '',
    datum: draft.wizard?.datum ?? '',
    units: draft.units,
    bedLevelAtControl: draft.wizard?.site?.bedLevelAtControl ?? reach?.bedLevelAtControl,
    reachLength: draft.wizard?.site?.reachLength ?? reach?.length,
  };
}

export function structureDefaults(draft: DraftInputs): { defaults?: StructureForm; foreign: string | null } {
  const control = draft.control;
  if (!control) return { foreign: null };
  if (control.type === 'depth') return { foreign: `a fixed depth of ${control.depth} at the structure` };
  if (control.kind === 'rating-table') return { foreign: 'a rating table of levels and discharges' };
  const { type: _type, ...fields } = control;
  return { defaults: { control: fields, ...(draft.existingControl ? { existingControl: { depth: draft.existingControl.depth } } : {}) }, foreign: null };
}

/** Each surveyed section's own bank top, as the engine's reach model reads it from the survey (no bankLevel given). */
export function surveyedBanks(reach: SurveyedReach): SurveyedSectionBank[] {
  try {
    return reach.sections.map(({ bankLevel: _given, ...s }) => ({ distanceUpstream: s.distanceUpstream, surveyedBankLevel: surveyedBankLevel(s) }));
  } catch {
    return reach.sections.map((s) => ({ distanceUpstream: s.distanceUpstream, surveyedBankLevel: Number.NaN }));
  }
}
