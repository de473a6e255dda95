import 'server-only';
import { Op, type WhereOptions, fn, col, where as sqlWhere } from 'sequelize';
import { portalTimeZone } from '@/lib/config/portal-time-zone';
import type { AuditEvent } from '@/lib/db';
import { addDays } from '@/lib/dates/calendar-dates';
import { startOfDayIn } from '@/lib/dates/zone-day-range';
import { InvalidRequestError } from '@/lib/http/app-errors';
import type { AuditFilter } from '@/lib/validation/audit-filter-schema';
import { AUDIT_ACTIONS } from './audit-actions';
import type { AuditDirectory } from './audit-directory';

const contains = (haystack: string, needle: string) => haystack.toLowerCase().includes(needle);

/**
 * The SQL conditions for a filter. A person or scheme that is not on record is a mistake in the address, reported
 * by field, rather than an empty trail. The search matches people's and schemes' names, kinds of event and details.
 * The days are days in the portal's time zone (as the trail shows its times), queried as the UTC instants they span.
 */
export function auditEventWhere(filter: AuditFilter, directory: AuditDirectory): WhereOptions<AuditEvent> {
  if (filter.person && !directory.people.some((p) => p.id === filter.person)) throw new InvalidRequestError([{ path: 'person', message: 'That person is not on record: choose one from the list.' }]);
  if (filter.scheme && !directory.schemes.some((s) => s.id === filter.scheme)) throw new InvalidRequestError([{ path: 'scheme', message: 'That scheme is not on record: choose one from the list.' }]);
  const conditions: WhereOptions<AuditEvent>[] = [];
  if (filter.person) conditions.push({ [Op.or]: [{ actorId: filter.person }, { entityType: 'user', entityId: filter.person }] });
  if (filter.action) conditions.push({ action: filter.action });
  if (filter.scheme) conditions.push({ schemeId: filter.scheme });
  const timeZone = portalTimeZone();
  if (filter.from) conditions.push({ at: { [Op.gte]: startOfDayIn(timeZone, filter.from).toISOString() } });
  if (filter.to) conditions.push({ at: { [Op.lt]: startOfDayIn(timeZone, addDays(filter.to, 1)).toISOString() } });
  if (filter.before !== null) conditions.push({ id: { [Op.lt]: filter.before } });
  if (filter.q) conditions.push(searchCondition(filter.q.toLowerCase(), directory));
  return { [Op.and]: conditions };
}

function searchCondition(needle: string, directory: AuditDirectory): WhereOptions<AuditEvent> {
  const people = directory.people.filter((p) => contains(p.name, needle) || contains(p.email, needle)).map((p) => p.id);
  const schemes = directory.schemes.filter((s) => contains(`${s.reference} ${s.name}`, needle)).map((s) => s.id);
  const actions = Object.entries(AUDIT_ACTIONS).filter(([, label]) => contains(label, needle)).map(([code]) => code);
  // instr() rather than LIKE, so that % and _ in the search are plain characters.
  const inDetails = sqlWhere(fn('instr', fn('lower', col('details_json')), needle), Op.gt, 0);
  return {
    [Op.or]: [
      inDetails,
      ...(people.length ? [{ actorId: { [Op.in]: people } }, { entityType: 'user', entityId: { [Op.in]: people } }] : []),
      ...(schemes.length ? [{ schemeId: { [Op.in]: schemes } }] : []),
      ...(actions.length ? [{ action: { [Op.in]: actions } }] : []),
    ],
  };
}
