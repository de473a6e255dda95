import Link from 'next/link';
import type { LoadedWizard } from '@/lib/schemes/load-wizard';
import type { EditableStep } from '@/lib/validation/scheme-schemas';
import { ChannelStep } from '@/components/forms/wizard/channel-step';
import { FlowsStepForm } from '@/components/forms/wizard/flows-step-form';
import { LimitsStepForm } from '@/components/forms/wizard/limits-step-form';
import { ReservoirStepForm } from '@/components/forms/wizard/reservoir/reservoir-step-form';
import { SchemeStepForm } from '@/components/forms/wizard/scheme-step-form';
import { StructureStepForm } from '@/components/forms/wizard/structure-step-form';
import { stepHref } from '@/components/forms/wizard/wizard-progress';
import { CautionNote } from '@/components/ui/caution-note';
import { reservoirDefaults } from './reservoir-defaults';
import { schemeDefaults, structureDefaults, surveyedBanks } from './step-defaults';

const PREVIOUS: Record<EditableStep, EditableStep | null> = { scheme: null, channel: 'scheme', flows: 'channel', structure: 'flows', reservoir: 'structure', limits: 'reservoir' };

/** The form of one step, opened on the draft's saved values. */
export function WizardStepBody({ step, loaded }: { step: EditableStep; loaded: LoadedWizard }) {
  const { scheme, revision, inputs } = loaded;
  const ids = { schemeId: scheme.id, revisionId: revision.id };
  const previous = PREVIOUS[step];
  const backHref = previous ? stepHref(scheme.id, previous) : `/schemes/${scheme.id}`;
  const reach = inputs.reach;
  switch (step) {
    case 'scheme':
      return <SchemeStepForm defaults={schemeDefaults(scheme, inputs)} unitsLocked={Boolean(inputs.reach?.kind === 'surveyed' || inputs.reach?.section || inputs.events || inputs.control)} target={ids} />;
    case 'channel': {
      const prismatic = reach?.kind === 'prismatic' && reach.section ? { section: reach.section, manningN: reach.manningN, bedSlope: reach.bedSlope, energyCoefficient: reach.energyCoefficient } : undefined;
      const survey = reach?.kind === 'surveyed' ? { originalName: inputs.wizard?.survey?.originalName ?? 'an imported case file', sections: reach.sections.length } : null;
      return (
        <>
          <ChannelStep {...ids} units={inputs.units} reachKind={reach?.kind === 'surveyed' ? 'surveyed' : reach?.section ? 'prismatic' : null} prismatic={prismatic} bankHeight={reach?.kind === 'prismatic' ? reach.bankHeight : undefined} survey={survey} backHref={backHref} />
          {survey ? <p className="mt-6 text-sm"><Link className="text-accent underline" href={stepHref(scheme.id, 'flows')}>Keep the surveyed sections in use and go on to the design flows →</Link></p> : null}
        </>
      );
    }
    case 'flows':
      return <FlowsStepForm {...ids} units={inputs.units} defaults={inputs.events ? { events: inputs.events, governing: inputs.wizard?.governing ?? 'all' } : undefined} backHref={backHref} />;
    case 'structure': {
      const { defaults, foreign } = structureDefaults(inputs);
      return (
        <>
          {foreign ? <p role="note" className="mb-4 border-l-4 border-verdict-caution bg-paper-deep px-4 py-3 text-sm">The draft’s structure is {foreign}, from a case file. The wizard enters weirs and spillways: saving this step replaces it. To keep it, go on to <Link className="text-accent underline" href={stepHref(scheme.id, 'limits')}>thresholds and limits</Link>.</p> : null}
          <StructureStepForm {...ids} units={inputs.units} defaults={defaults} backHref={backHref} />
        </>
      );
    }
    case 'reservoir': {
      const r = reservoirDefaults(inputs);
      if (r.unavailable) {
        return (
          <p role="note" className="border-l-4 border-verdict-caution bg-paper-deep px-4 py-3 text-sm">
            {r.unavailable.reason} <Link className="text-accent underline" href={stepHref(scheme.id, r.unavailable.go.step)}>{r.unavailable.go.label} →</Link>
          </p>
        );
      }
      return <ReservoirStepForm {...ids} units={inputs.units} datum={inputs.wizard?.datum ?? null} events={r.events} crestLevel={r.crestLevel} defaults={r.defaults} backHref={backHref} />;
    }
    case 'limits':
      return (
        <>
          <LimitsStepForm
            {...ids}
            units={inputs.units}
            sections={reach?.kind === 'surveyed' ? surveyedBanks(reach) : null}
            defaults={{
              ...(reach?.kind === 'prismatic' && reach.bankHeight !== undefined ? { bankHeight: reach.bankHeight } : {}),
              ...(reach?.kind === 'surveyed' ? { sectionBankLevels: reach.sections.map((s) => s.bankLevel ?? null) } : {}),
              ...(inputs.impactThreshold !== undefined ? { impactThreshold: inputs.impactThreshold } : {}),
              ...(inputs.limits ? { limits: inputs.limits } : {}),
              ...(inputs.sizing ? { sizing: inputs.sizing } : {}),
              ...(inputs.sensitivity ? { sensitivity: inputs.sensitivity } : {}),
            }}
            backHref={backHref}
          />
          <CautionNote className="mt-8" />
        </>
      );
  }
}
