import type { ReservoirStepValues } from '@/lib/validation/reservoir-step-schema';
import type { ChannelStepValues, EditableStep, FlowsStepValues, LimitsStepValues, SchemeStepValues, StructureStepValues } from '@/lib/validation/scheme-schemas';
import type { SurveySection } from '@/lib/validation/survey-csv';
import type { DraftInputs, DraftReach, WizardNotes } from './draft-inputs';

// How each wizard step's checked values land in the draft case file. Pure: the use cases store the result.

export type StepValues =
  | { step: 'scheme'; values: SchemeStepValues }
  | { step: 'channel'; values: ChannelStepValues }
  | { step: 'flows'; values: FlowsStepValues }
  | { step: 'structure'; values: StructureStepValues }
  | { step: 'reservoir'; values: ReservoirStepValues }
  | { step: 'limits'; values: LimitsStepValues };

function withCompleted(wizard: WizardNotes | undefined, step: EditableStep): WizardNotes {
  const completed = wizard?.completed ?? [];
  return { ...wizard, completed: completed.includes(step) ? completed : [...completed, step] };
}

function defined<T extends object>(value: T): Partial<T> {
  return Object.fromEntries(Object.entries(value).filter(([, v]) => v !== undefined)) as Partial<T>;
}

function siteIntoReach(reach: DraftReach | undefined, site: WizardNotes['site']): DraftReach | undefined {
  if (reach?.kind === 'surveyed') return reach;
  if (!reach && site?.bedLevelAtControl === undefined && site?.reachLength === undefined) return reach;
  const { bedLevelAtControl: _b, length: _l, ...rest } = reach ?? { kind: 'prismatic' as const };
  return { ...rest, kind: 'prismatic', ...defined({ bedLevelAtControl: site?.bedLevelAtControl, length: site?.reachLength }) };
}

function limitsIntoReach(reach: DraftReach | undefined, values: LimitsStepValues): DraftReach | undefined {
  if (reach?.kind === 'surveyed') {
    const levels = values.sectionBankLevels ?? [];
    return { ...reach, sections: reach.sections.map(({ bankLevel: _old, ...s }, i) => ({ ...s, ...(levels[i] !== undefined && levels[i] !== null ? { bankLevel: levels[i] } : {}) })) };
  }
  const { bankHeight: _old, ...rest } = reach ?? { kind: 'prismatic' as const };
  return { ...rest, kind: 'prismatic', ...(values.bankHeight !== undefined ? { bankHeight: values.bankHeight } : {}) };
}

/** The flows step does not show the inflow hydrographs: an event keeps its own while its name stays the same. */
function withHydrographsKept(before: DraftInputs['events'], after: NonNullable<DraftInputs['events']>): NonNullable<DraftInputs['events']> {
  return after.map((event) => {
    const hydrograph = before?.find((old) => old.name === event.name)?.hydrograph;
    return hydrograph ? { ...event, hydrograph } : event;
  });
}

export function applyWizardStep(draft: DraftInputs, input: StepValues): DraftInputs {
  const wizard = withCompleted(draft.wizard, input.step);
  switch (input.step) {
    case 'scheme': {
      const v = input.values;
      const site = defined({ bedLevelAtControl: v.bedLevelAtControl, reachLength: v.reachLength });
      return { ...draft, units: v.units, title: v.name, reach: siteIntoReach(draft.reach, site), wizard: { ...wizard, datum: v.datum, site } };
    }
    case 'channel': {
      const previous = draft.reach?.kind === 'prismatic' ? draft.reach : undefined;
      const { survey: _survey, ...notes } = wizard;
      const reach: DraftReach = { kind: 'prismatic', ...defined(input.values), ...(previous?.bankHeight !== undefined ? { bankHeight: previous.bankHeight } : {}) };
      return { ...draft, reach: siteIntoReach(reach, wizard.site), wizard: notes };
    }
    case 'flows':
      return { ...draft, events: withHydrographsKept(draft.events, input.values.events), wizard: { ...wizard, governing: input.values.governing } };
    case 'reservoir': {
      const { reservoir: _old, ...rest } = draft;
      const events = (draft.events ?? []).map(({ hydrograph: _h, ...event }, i) => {
        const hydrograph = input.values.hydrographs[i];
        return hydrograph ? { ...event, hydrograph } : event;
      });
      return { ...rest, events, ...(input.values.reservoir ? { reservoir: input.values.reservoir } : {}), wizard };
    }
    case 'structure': {
      const { existingControl: _old, ...rest } = draft;
      return { ...rest, control: input.values.control, ...(input.values.existingControl ? { existingControl: input.values.existingControl } : {}), wizard };
    }
    case 'limits': {
      const { sizing: _s, sensitivity: _t, impactThreshold: _i, minimumMargin: _m, ...rest } = draft;
      const v = input.values;
      return { ...rest, reach: limitsIntoReach(draft.reach, v), limits: v.limits, ...defined({ impactThreshold: v.impactThreshold, minimumMargin: v.minimumMargin, sizing: v.sizing, sensitivity: v.sensitivity }), wizard };
    }
  }
}

/** A checked survey replaces the reach; bank levels and the step's completion start again from the new sections. */
export function applySurvey(draft: DraftInputs, sections: SurveySection[], survey: NonNullable<WizardNotes['survey']>): DraftInputs {
  const energyCoefficient = draft.reach?.energyCoefficient;
  const reach: DraftReach = {
    kind: 'surveyed',
    sections: sections.map(({ lines: _lines, ...s }) => s),
    ...(energyCoefficient !== undefined ? { energyCoefficient } : {}),
  };
  return { ...draft, reach, wizard: { ...withCompleted(draft.wizard, 'channel'), survey } };
}
