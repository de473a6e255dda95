// The bank level along a reach, read from the case without building its sections: the results sheet, the parcels'
// impact and the wizard want only the banks, and tabulating every surveyed section for them (up to 500 sections of
// 500 points, some 100 ms) belongs to the engine's worker, not to a page's request.
import type { CaseInput } from '@/lib/validation/case-schema';
import type { Metres } from './units';

export type BankLevelAt = (distanceUpstream: Metres) => Metres;

/** Linear between stations (listed by increasing distance), level beyond the ends. */
export function interpolatedAlong(stations: readonly { distanceUpstream: Metres; value: Metres }[]): BankLevelAt {
  return (d) => {
    if (d <= stations[0].distanceUpstream) return stations[0].value;
    const i = stations.findIndex((s) => s.distanceUpstream >= d);
    if (i < 0) return stations[stations.length - 1].value;
    const a = stations[i - 1];
    const b = stations[i];
    return a.value + ((d - a.distanceUpstream) / (b.distanceUpstream - a.distanceUpstream)) * (b.value - a.value);
  };
}

export function prismaticBankLevelAt(reach: Extract<CaseInput['reach'], { kind: 'prismatic' }>): BankLevelAt | null {
  const { bankHeight } = reach;
  return bankHeight === undefined ? null : (d) => reach.bedLevelAtControl + reach.bedSlope * d + bankHeight;
}

type SurveyedCaseSection = Extract<CaseInput['reach'], { kind: 'surveyed' }>['sections'][number];

/**
 * The ground level at a station across the section, as the engine's section has it: the highest point there (the
 * ground may step up or down at a bank), else on the line between the points either side. Points run by station.
 */
function groundLevelAt(points: SurveyedCaseSection['points'], station: Metres): Metres {
  let i = 0;
  while (i < points.length && points[i][0] < station) i++;
  let highest = -Infinity;
  for (let j = i; j < points.length && points[j][0] === station; j++) highest = Math.max(highest, points[j][1]);
  if (highest > -Infinity) return highest;
  // Outside the survey (a case the engine refuses): its nearest end.
  if (i === 0 || i === points.length) return points[Math.min(i, points.length - 1)][1];
  const [[s0, e0], [s1, e1]] = [points[i - 1], points[i]];
  return e0 + ((station - s0) * (e1 - e0)) / (s1 - s0);
}

/** A section's bank level: as given, or the lower of the ground levels at its bank stations (its ends without them). */
export function surveyedBankLevel(section: SurveyedCaseSection): Metres {
  if (section.bankLevel !== undefined) return section.bankLevel;
  const { points } = section;
  const [left, right] = section.bankStations ?? [points[0][0], points[points.length - 1][0]];
  return Math.min(groundLevelAt(points, left), groundLevelAt(points, right));
}

/** The bank level at a distance upstream, for a case in SI units; null when the case gives nothing to judge it by. */
export function bankLevelAlong(reach: CaseInput['reach']): BankLevelAt | null {
  if (reach.kind === 'prismatic') return prismaticBankLevelAt(reach);
  return interpolatedAlong(reach.sections.map((s) => ({ distanceUpstream: s.distanceUpstream, value: surveyedBankLevel(s) })));
}

/** The reach's length: a prismatic reach's own, a surveyed one's furthest section. */
export function reachLengthOf(reach: CaseInput['reach']): Metres {
  return reach.kind === 'prismatic' ? reach.length : reach.sections[reach.sections.length - 1].distanceUpstream;
}
