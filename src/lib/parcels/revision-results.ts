import 'server-only';
import type { CaseResult, EventResult } from '@/lib/hydraulics/case-result';
import { caseToSI } from '@/lib/hydraulics/case-units';
import { bankLevelAlong, reachLengthOf } from '@/lib/hydraulics/reach-banks';
import { DEFAULT_IMPACT_THRESHOLD } from '@/lib/hydraulics/event-impact';
import type { ProfilePoint } from '@/lib/hydraulics/profiles/profile-point';
import { METRES_PER_FOOT, type Metres } from '@/lib/hydraulics/units';
import type { Revision } from '@/lib/db';
import { evaluateCaseOffThread } from '@/lib/engine-pool/engine-pool';
import { UnprocessableError } from '@/lib/http/app-errors';
import type { CaseInput } from '@/lib/validation/case-schema';
import { parseCase } from '@/lib/validation/parse-case';

export interface RevisionEventProfiles {
  name: string;
  discharge: number;
  withScheme: ProfilePoint[];
  withoutScheme: ProfilePoint[];
}

/** What the parcel impact needs from a revision, in SI: its events' two profiles, the bank level and the threshold. */
export interface RevisionResults {
  caseInput: CaseInput;
  engineVersion: string;
  /** True when the results were stored with the revision (frozen), false when the engine ran now on a draft's inputs. */
  stored: boolean;
  events: RevisionEventProfiles[];
  bankLevelAt: ((d: Metres) => Metres) | null;
  impactThreshold: Metres;
  reachLength: Metres;
}

function inMetres(points: readonly ProfilePoint[], units: CaseResult['units']): ProfilePoint[] {
  if (units === 'SI') return [...points];
  const m = METRES_PER_FOOT;
  return points.map((p) => ({ ...p, distanceUpstream: p.distanceUpstream * m, depth: p.depth * m, waterLevel: p.waterLevel * m, bedLevel: p.bedLevel * m, velocity: p.velocity * m, energyLevel: p.energyLevel * m }));
}

function eventProfiles(e: EventResult, units: CaseResult['units']): RevisionEventProfiles {
  return { name: e.name, discharge: units === 'SI' ? e.discharge : e.discharge * METRES_PER_FOOT ** 3, withScheme: inMetres(e.profile, units), withoutScheme: inMetres(e.withoutScheme.profile, units) };
}

/**
 * The revision's with- and without-scheme profiles. A countersigned revision's stored (frozen) results are used as
 * they are; a draft without stored results is evaluated by the engine now, on the server.
 */
export async function revisionResults(revision: Revision): Promise<RevisionResults> {
  const parsed = parseCase(JSON.parse(revision.inputsJson));
  if (!parsed.ok) throw new UnprocessableError(`Revision ${revision.number} has case inputs the engine cannot read: ${parsed.issues[0]?.path} ${parsed.issues[0]?.message}`);
  if (revision.status === 'countersigned' && !revision.resultsJson) throw new UnprocessableError(`Revision ${revision.number} is countersigned but has no stored results.`);
  const stored = revision.resultsJson !== null;
  const result: CaseResult = stored ? (JSON.parse(revision.resultsJson as string) as CaseResult) : await evaluateCaseOffThread(parsed.value);
  const si = caseToSI(parsed.value);
  return {
    caseInput: parsed.value,
    engineVersion: result.engineVersion ?? revision.engineVersion ?? 'unknown',
    stored,
    events: result.events.map((e) => eventProfiles(e, result.units)),
    bankLevelAt: bankLevelAlong(si.reach),
    impactThreshold: si.impactThreshold ?? DEFAULT_IMPACT_THRESHOLD,
    reachLength: reachLengthOf(si.reach),
  };
}
