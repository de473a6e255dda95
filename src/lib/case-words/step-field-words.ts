import type { EditableStep } from '@/lib/validation/scheme-schemas';
import { describeCaseField, segmentsOf } from './describe-case-field';

// The wizard's forms hold a few fields of their own (the register's) and name some case fields differently;
// everything else is the case file's own path.

const WIZARD_ONLY: Record<string, string> = {
  name: 'name of the scheme',
  watercourse: 'river or stream',
  site: 'site of the structure',
  description: 'description',
  datum: 'level datum',
  governing: 'flood event that governs',
  units: 'units',
};

const RENAMED: Partial<Record<EditableStep, Record<string, string>>> = {
  scheme: { bedLevelAtControl: 'reach.bedLevelAtControl', reachLength: 'reach.length' },
  limits: { bankHeight: 'reach.bankHeight', sectionBankLevels: 'reach.sections' },
  reservoir: { hydrographs: 'events' },
};

/** A step form's field path as the case file's (the channel step's `section.width` is `reach.section.width`). */
export function casePathOfStepField(step: EditableStep, path: string): string {
  const [first, ...rest] = segmentsOf(path);
  if (first === undefined) return path;
  const renamed = RENAMED[step]?.[String(first)];
  const prefix = renamed ?? (step === 'channel' ? `reach.${String(first)}` : String(first));
  const inserted = step === 'limits' && first === 'sectionBankLevels' ? 'bankLevel' : step === 'reservoir' && first === 'hydrographs' ? 'hydrograph' : null;
  const tail = inserted && typeof rest[0] === 'number' ? [rest[0], inserted, ...rest.slice(1)] : rest;
  return [prefix, ...tail].reduce<string>((acc, s) => (typeof s === 'number' ? `${acc}[${s}]` : `${acc}.${s}`), '').replace(/^\./, '');
}

/** A field named in a saved step's history: the register's `scheme.name`, a case-file path, or "… and 3 more". */
export function changedFieldLabel(path: string, caseFile?: unknown): string {
  if (path.startsWith('…')) return path;
  if (path.startsWith('scheme.')) return WIZARD_ONLY[path.slice('scheme.'.length)] ?? path.slice('scheme.'.length);
  return describeCaseField(path, caseFile).label;
}

/** A step form's field in words, list items by their own name when the draft is given. */
export function stepFieldLabel(step: EditableStep, path: string, draft?: unknown): string {
  const wizardOnly = WIZARD_ONLY[path];
  if (wizardOnly) return wizardOnly;
  return describeCaseField(casePathOfStepField(step, path), draft).label;
}
