// What a prismatic reach does with a given control: its normal and critical depths, profile type and end depth.
import { criticalDepth } from '../critical-depth';
import { NoPhysicalSolutionError, requireFinite, requirePositive } from '../errors';
import { normalDepth } from '../normal-depth';
import type { FlowSection } from '../section';
import { sequentDepth } from '../sequent-depth';
import { classifySlope, type SlopeClass } from '../slope-class';
import type { CubicMetresPerSecond, Metres, Slope } from '../units';
import { type ProfileType, profileType } from './profile-type';

export interface BackwaterRegime {
  slopeClass: SlopeClass;
  profileType: ProfileType;
  criticalDepth: Metres;
  normalDepth: Metres | null;
  /** The control depth, lifted to critical depth when it lay a hair below it (root-finding noise). */
  controlDepth: Metres;
  /** Depth at which the profile ends before the reach does, or null when only the reach end stops it (H2, A2). */
  endDepth: Metres | null;
  /** Why the profile ends at endDepth. */
  endsBy: 'normal-depth' | 'hydraulic-jump' | null;
  /** The profile has no length: the control already lies at the end depth (or, on a steep reach, below the jump's sequent depth). */
  zeroLength: boolean;
}

/** A control this close below critical depth is taken as critical: closer than any root-finder's answer can be trusted. */
const CRITICAL_MATCH = 1e-6;

function controlBelowCritical(control: Metres, critical: Metres, slopeClass: SlopeClass): NoPhysicalSolutionError {
  const after =
    slopeClass === 'steep'
      ? 'a control below critical depth cannot raise the water on a steep reach: the flow upstream stays at its supercritical normal depth'
      : 'a downstream control cannot hold the water below critical depth; check the control level and the datum';
  return new NoPhysicalSolutionError('control', 'control-below-critical', `the control depth ${control.toFixed(3)} m is below the critical depth ${critical.toFixed(3)} m: ${after}`);
}

export function backwaterRegime(
  section: FlowSection,
  discharge: CubicMetresPerSecond,
  bedSlope: Slope,
  controlDepth: Metres,
  normalDepthTolerance: number,
): BackwaterRegime {
  requirePositive(discharge, 'discharge');
  requireFinite(bedSlope, 'reach.bedSlope');
  requirePositive(controlDepth, 'control.depth');
  if (controlDepth > section.maxDepth) {
    throw new NoPhysicalSolutionError('control', 'section-overtopped', `the control depth ${controlDepth.toFixed(3)} m is above the top of the section (${section.maxDepth.toFixed(3)} m deep)`);
  }
  const yc = criticalDepth(section, discharge);
  const yn = bedSlope > 0 ? normalDepth(section, discharge, bedSlope) : null;
  const slopeClass = classifySlope(bedSlope, yn, yc);
  if (controlDepth < yc * (1 - CRITICAL_MATCH)) throw controlBelowCritical(controlDepth, yc, slopeClass);
  const control = Math.max(controlDepth, yc);
  const type = profileType(slopeClass, control, yn, yc);
  const base = { slopeClass, profileType: type, criticalDepth: yc, normalDepth: yn, controlDepth: control };
  if (yn === null) return { ...base, endDepth: null, endsBy: null, zeroLength: false };
  if (type === 'S1') {
    // The jump stands where the S1 depth equals the depth sequent to the approaching normal flow
    // (Chow, Open-Channel Hydraulics, 1959, ch. 15, location of the jump — from memory); the jump's own length is neglected (common practice).
    const jumpDepth = sequentDepth(section, yn, discharge);
    return { ...base, endDepth: jumpDepth, endsBy: 'hydraulic-jump', zeroLength: control <= jumpDepth };
  }
  const endDepth = control >= yn ? yn * (1 + normalDepthTolerance) : yn * (1 - normalDepthTolerance);
  const zeroLength = control >= yn ? control <= endDepth : control >= endDepth;
  return { ...base, endDepth, endsBy: 'normal-depth', zeroLength };
}
