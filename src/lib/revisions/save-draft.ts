import 'server-only';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import type { SessionUser } from '@/lib/auth/current-session';
import { stepFieldLabel } from '@/lib/case-words/step-field-words';
import { database } from '@/lib/db';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { fieldIssuesFromZod } from '@/lib/http/zod-issues';
import { findEditableRevision } from '@/lib/schemes/scheme-access';
import { type EditableStep, STEP_SCHEMAS, type SaveStepRequest, type WizardStep, WIZARD_STEPS, newSchemeSchema } from '@/lib/validation/scheme-schemas';
import type { CaseUnits } from '@/lib/validation/case-schema';
import { type StepValues, applyWizardStep } from './apply-wizard-step';
import { changedFields } from './changed-fields';
import { limitsBeyondReach } from './limits-within-reach';
import { type DraftInputs, caseFileOf, decodeDraft, encodeDraft } from './draft-inputs';

function nextStep(step: EditableStep): WizardStep {
  return WIZARD_STEPS[WIZARD_STEPS.indexOf(step) + 1];
}

/** The step's values checked with the same schema as the browser's form, for the draft's units. */
function checkedValues(request: SaveStepRequest, draft: DraftInputs): StepValues {
  const { step, values } = request;
  const parse = <T>(result: { success: true; data: T } | { success: false; error: import('zod').ZodError }): T => {
    if (!result.success) throw new InvalidRequestError(fieldIssuesFromZod(result.error).map((issue) => ({ ...issue, label: stepFieldLabel(step, issue.path, { ...draft, ...values }) })));
    return result.data;
  };
  if (step === 'scheme') {
    const v = parse(newSchemeSchema.safeParse(values));
    if (v.units !== draft.units && (draft.reach || draft.events || draft.control)) {
      const held = draft.units === 'US' ? 'ft and ft³/s' : 'm and m³/s';
      throw new InvalidRequestError([{ path: 'units', message: `cannot change once the channel, flows or structure are entered: their numbers are in ${held}. Start a new scheme to work in the other units.` }]);
    }
    return { step, values: v };
  }
  const units: CaseUnits = draft.units;
  switch (step) {
    case 'channel':
      return { step, values: parse(STEP_SCHEMAS.channel(units).safeParse(values)) };
    case 'flows':
      return { step, values: parse(STEP_SCHEMAS.flows(units).safeParse(values)) };
    case 'structure':
      return { step, values: parse(STEP_SCHEMAS.structure(units).safeParse(values)) };
    case 'reservoir': {
      const v = parse(STEP_SCHEMAS.reservoir(units).safeParse(values));
      const events = draft.events?.length ?? 0;
      if (v.hydrographs.length !== events) throw new InvalidRequestError([{ path: 'hydrographs', message: `must give one inflow (or none) for each of the ${events} design events` }]);
      const control = draft.control;
      const holdsStorage = control?.type === 'weir';
      if (v.reservoir && !holdsStorage) throw new InvalidRequestError([{ path: 'reservoir', message: 'needs a weir, spillway or rating table at the structure: a fixed depth gives no outflow for each level' }]);
      return { step, values: v };
    }
    case 'limits': {
      const v = parse(STEP_SCHEMAS.limits(units).safeParse(values));
      const sections = draft.reach?.kind === 'surveyed' ? draft.reach.sections.length : 0;
      if (v.sectionBankLevels && v.sectionBankLevels.length !== sections) {
        throw new InvalidRequestError([{ path: 'sectionBankLevels', message: `must give one bank level (or none) for each of the ${sections} surveyed sections` }]);
      }
      const beyond = limitsBeyondReach(draft.reach, v.limits, units);
      if (beyond.length > 0) throw new InvalidRequestError(beyond);
      return { step, values: v };
    }
  }
}

/** Saves one wizard step into the open draft; the stored results are cleared because the inputs changed. */
export async function saveDraft({ revisionId, request, user }: { revisionId: string; request: SaveStepRequest; user: SessionUser }) {
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const { scheme, revision } = await findEditableRevision(user, revisionId, transaction);
    const before = decodeDraft(revision.inputsJson);
    const checked = checkedValues(request, before);
    const after = applyWizardStep(before, checked);
    const changed = changedFields(caseFileOf(before), caseFileOf(after));
    const notesChanged = before.wizard?.datum !== after.wizard?.datum || before.wizard?.governing !== after.wizard?.governing;
    const now = new Date().toISOString();
    const schemeChanged: string[] = [];
    if (checked.step === 'scheme') {
      const v = checked.values;
      const fields = { name: v.name, watercourse: v.watercourse, site: v.site, description: v.description || null };
      for (const [key, value] of Object.entries(fields)) if (scheme.get(key) !== value) schemeChanged.push(`scheme.${key}`);
      if (before.wizard?.datum !== after.wizard?.datum) schemeChanged.push('scheme.datum');
      if (schemeChanged.length > 0) await scheme.update({ ...fields, updatedAt: now }, { transaction });
    }
    if (checked.step === 'flows' && before.wizard?.governing !== after.wizard?.governing) changed.push('governing event');
    const inputsChanged = changed.length > 0 || notesChanged;
    await revision.update({ inputsJson: encodeDraft(after), wizardStep: nextStep(checked.step), ...(inputsChanged ? { resultsJson: null, engineVersion: null } : {}), updatedAt: now }, { transaction });
    const allChanged = [...schemeChanged, ...changed];
    if (allChanged.length > 0) {
      await recordAuditEvent({ actorId: user.id, action: 'revision.step-saved', entityType: 'revision', entityId: revision.id, schemeId: scheme.id, details: { number: revision.number, step: checked.step, changed: allChanged } }, transaction);
    }
    return { revisionId: revision.id, step: checked.step, nextStep: nextStep(checked.step), changed: allChanged };
  });
}
