// The reach of a case file as the engine sees it: the control section, the bed, the stations, the banks.
import type { CaseInput } from '@/lib/validation/case-schema';
import { InvalidInputError } from './errors';
import { meanBedSlope } from './profiles/reach-geometry';
import { type ReachStation, surveyedReach } from './profiles/reach-sections';
import { type PrismaticSection, prismaticSection } from './prismatic-sections';
import { interpolatedAlong, prismaticBankLevelAt } from './reach-banks';
import type { FlowSection } from './section';
import type { SurveyedSection, SurveyedSectionSpec } from './surveyed-section';
import type { Metres, Slope } from './units';

export interface ReachModel {
  kind: 'prismatic' | 'surveyed';
  /** The section at the control, distance 0: the weir's approach section. */
  controlSection: FlowSection;
  /** Bed level (lowest point) at the control. */
  bedLevelAtControl: Metres;
  /** The prismatic bed slope, or the mean slope of a surveyed reach. */
  bedSlope: Slope;
  length: Metres;
  prismatic: { section: PrismaticSection } | null;
  /** Surveyed stations from the control upstream; null for a prismatic reach. */
  stations: ReachStation[] | null;
  /** Bank level at a distance upstream, or null when the case gives nothing to judge inundation by. */
  bankLevelAt: ((distanceUpstream: Metres) => Metres) | null;
  bankLevelSource: string | null;
}

type SurveyRoughness = SurveyedSectionSpec['manningN'];

function scaledRoughness(n: SurveyRoughness, factor: number): SurveyRoughness {
  if (typeof n === 'number') return n * factor;
  return { left: n.left * factor, channel: n.channel * factor, right: n.right * factor };
}


function prismaticModel(reach: Extract<CaseInput['reach'], { kind: 'prismatic' }>, manningFactor: number): ReachModel {
  const section = prismaticSection(reach.section, reach.manningN * manningFactor, { energyCoefficient: reach.energyCoefficient });
  const bankHeight = reach.bankHeight;
  return {
    kind: 'prismatic',
    controlSection: section,
    bedLevelAtControl: reach.bedLevelAtControl,
    bedSlope: reach.bedSlope,
    length: reach.length,
    prismatic: { section },
    stations: null,
    bankLevelAt: prismaticBankLevelAt(reach),
    bankLevelSource: bankHeight === undefined ? null : 'reach.bankHeight above the bed',
  };
}

function isSurveyed(section: FlowSection): section is SurveyedSection {
  return section.shape === 'surveyed' && 'bankLevels' in section;
}

/** Bank level of a station: as given, or the lower of the ground levels at its bank stations. */
function stationBankLevel(station: ReachStation): Metres {
  if (station.bankLevel !== undefined) return station.bankLevel;
  if (!isSurveyed(station.section)) throw new InvalidInputError('reach.sections', 'a surveyed station lost its survey');
  return Math.min(station.section.bankLevels.left, station.section.bankLevels.right);
}

function surveyedModel(reach: Extract<CaseInput['reach'], { kind: 'surveyed' }>, manningFactor: number): ReachModel {
  const stations = surveyedReach(
    reach.sections.map((s) => ({
      distanceUpstream: s.distanceUpstream,
      survey: { points: s.points, manningN: scaledRoughness(s.manningN, manningFactor), ...(s.bankStations ? { bankStations: s.bankStations } : {}) },
      ...(s.bankLevel !== undefined ? { bankLevel: s.bankLevel } : {}),
    })),
    'reach.sections',
  );
  const banks = stations.map((s) => ({ distanceUpstream: s.distanceUpstream, value: stationBankLevel(s) }));
  return {
    kind: 'surveyed',
    controlSection: stations[0].section,
    bedLevelAtControl: stations[0].bedLevel,
    bedSlope: meanBedSlope(stations),
    length: stations[stations.length - 1].distanceUpstream,
    prismatic: null,
    stations,
    bankLevelAt: interpolatedAlong(banks),
    bankLevelSource: 'bankLevel of each section, else the lower ground level at its bank stations',
  };
}

/** The reach, with Manning's n scaled by `manningFactor` (1 except in sensitivity runs). */
export function reachModel(reach: CaseInput['reach'], manningFactor = 1): ReachModel {
  return reach.kind === 'prismatic' ? prismaticModel(reach, manningFactor) : surveyedModel(reach, manningFactor);
}
