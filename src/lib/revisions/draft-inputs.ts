import { CASE_FORMAT, CASE_VERSION, type CaseInput, type CaseUnits } from '@/lib/validation/case-schema';
import type { EditableStep, Governing } from '@/lib/validation/scheme-schemas';

// A draft revision's inputs_json: the case file as far as the designer has got, plus the wizard's own notes
// under "wizard" (the engine ignores unknown keys, so a finished draft is itself a valid case file).

type Reach = CaseInput['reach'];
export type PrismaticReach = Extract<Reach, { kind: 'prismatic' }>;
export type SurveyedReach = Extract<Reach, { kind: 'surveyed' }>;
export type DraftReach = (Partial<PrismaticReach> & { kind: 'prismatic' }) | SurveyedReach;

export interface WizardNotes {
  datum?: string;
  /** Step 1's site levels; copied into a prismatic reach, shown beside a surveyed one. */
  site?: { bedLevelAtControl?: number; reachLength?: number };
  governing?: Governing;
  completed?: EditableStep[];
  survey?: { uploadId: string; originalName: string; rowCount: number };
}

export interface DraftInputs {
  format: typeof CASE_FORMAT;
  version: typeof CASE_VERSION;
  units: CaseUnits;
  title?: string;
  reach?: DraftReach;
  events?: CaseInput['events'];
  control?: CaseInput['control'];
  existingControl?: CaseInput['existingControl'];
  reservoir?: CaseInput['reservoir'];
  profile?: CaseInput['profile'];
  impactThreshold?: number;
  minimumMargin?: number;
  limits?: CaseInput['limits'];
  sizing?: CaseInput['sizing'];
  sensitivity?: CaseInput['sensitivity'];
  wizard?: WizardNotes;
}

export function emptyDraft(units: CaseUnits, title?: string): DraftInputs {
  return { format: CASE_FORMAT, version: CASE_VERSION, units, ...(title ? { title } : {}), wizard: { completed: [] } };
}

/** Reads a stored inputs_json (written by Sillmark itself, or an imported case that passed parseCase). */
export function decodeDraft(json: string): DraftInputs {
  const raw: unknown = JSON.parse(json);
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) throw new Error('inputs_json is not an object');
  const record = raw as Partial<DraftInputs>;
  return { ...(record as DraftInputs), format: CASE_FORMAT, version: CASE_VERSION, units: record.units === 'US' ? 'US' : 'SI' };
}

export function encodeDraft(draft: DraftInputs): string {
  return JSON.stringify(draft);
}

/** The case file part, without the wizard's notes: what parseCase and the engine read. */
export function caseFileOf(draft: DraftInputs): Omit<DraftInputs, 'wizard'> {
  const { wizard: _wizard, ...caseFile } = draft;
  return caseFile;
}

/** Steps saved in the wizard; for a case that did not come through it (the demo seed), the parts it already holds. */
export function completedSteps(draft: DraftInputs): EditableStep[] {
  if (draft.wizard?.completed) return draft.wizard.completed;
  const held: [EditableStep, unknown][] = [['scheme', draft.title], ['channel', draft.reach], ['flows', draft.events], ['structure', draft.control], ['reservoir', draft.reservoir], ['limits', draft.limits]];
  return held.filter(([, part]) => part !== undefined).map(([step]) => step);
}

/** Short unit words for labels: the case's own units, never converted for display. */
export function unitWords(units: CaseUnits): { length: string; discharge: string; velocity: string } {
  return units === 'US' ? { length: 'ft', discharge: 'ft³/s', velocity: 'ft/s' } : { length: 'm', discharge: 'm³/s', velocity: 'm/s' };
}
