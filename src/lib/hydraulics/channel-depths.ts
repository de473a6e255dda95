// The channel's own depths at the control for a discharge: critical, normal, and the level without the scheme.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { ReachModel } from './case-reach';
import type { WithoutSchemeResult } from './case-result';
import { criticalDepth } from './critical-depth';
import { InvalidInputError, NoPhysicalSolutionError } from './errors';
import { normalDepth } from './normal-depth';
import type { CubicMetresPerSecond, Metres } from './units';

export interface ChannelDepths {
  critical: Metres;
  /** Null on a horizontal or adverse bed, which has none. */
  normal: Metres | null;
  /** The depth at the control without the scheme, and what sets it. */
  without: { depth: Metres; by: WithoutSchemeResult['controlBy'] };
}

const m = (x: Metres) => `${x.toFixed(3)} m`;

function withoutSchemeStart(input: CaseInput, yn: Metres | null, yc: Metres): ChannelDepths['without'] {
  const existing = input.existingControl?.depth;
  if (existing !== undefined) {
    if (existing < yc) {
      throw new NoPhysicalSolutionError('existingControl.depth', 'control-below-critical', `the existing control depth ${m(existing)} is below the critical depth ${m(yc)}; a downstream control cannot hold the water there`);
    }
    return { depth: existing, by: 'existing-control' };
  }
  if (yn === null) {
    throw new InvalidInputError('existingControl', 'is required on a horizontal or adverse reach: without normal depth there is no default level without the scheme; give the existing depth at the control');
  }
  return { depth: yn, by: 'normal-depth' };
}

export function channelDepths(input: CaseInput, model: ReachModel, discharge: CubicMetresPerSecond, dischargeField: string): ChannelDepths {
  const section = model.controlSection;
  const critical = criticalDepth(section, discharge, { dischargeField, field: model.kind === 'prismatic' ? 'reach.section' : 'reach.sections[0]' });
  const normal = model.bedSlope > 0 ? normalDepth(section, discharge, model.bedSlope, { dischargeField, field: 'reach.bedSlope' }) : null;
  return { critical, normal, without: withoutSchemeStart(input, normal, critical) };
}
