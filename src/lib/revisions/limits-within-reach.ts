import { excerpt } from '@/lib/case-words/excerpt';
import type { FieldIssue } from '@/lib/http/app-errors';
import type { CaseUnits } from '@/lib/validation/case-schema';
import type { LimitsStepValues } from '@/lib/validation/scheme-schemas';
import type { DraftReach } from './draft-inputs';

function reachLengthOf(reach: DraftReach | undefined): number | undefined {
  if (reach?.kind === 'surveyed') return reach.sections.at(-1)?.distanceUpstream;
  return reach?.length;
}

/** Each limit upstream of the reach's end, refused on the limits step with its own name and both distances. */
export function limitsBeyondReach(reach: DraftReach | undefined, limits: LimitsStepValues['limits'], units: CaseUnits): FieldIssue[] {
  const length = reachLengthOf(reach);
  if (length === undefined) return [];
  const u = units === 'US' ? 'ft' : 'm';
  return limits.flatMap((limit, i) =>
    limit.distanceUpstream > length
      ? [{ path: `limits[${i}].distanceUpstream`, message: `"${excerpt(limit.label, 60)}" is ${limit.distanceUpstream} ${u} upstream, beyond the upstream end of the reach (${length} ${u} from the structure); lengthen the reach or move the limit` }]
      : [],
  );
}
