import 'server-only';
import { Op, type WhereOptions, fn, col, where as sqlWhere } from 'sequelize';
import type { AuditEvent } from '@/lib/db';
import { InvalidRequestError } from '@/lib/http/app-errors';
import type { AuditFilter } from '@/lib/validation/audit-filter-schema';
import { AUDIT_ACTIONS } from './audit-actions';
import type { AuditDirectory } from './audit-directory';

const nextDay = (isoDate: string) => new Date(Date.parse(`${isoDate}T00:00:00Z`) + 86_400_000).toISOString();
const contains = (haystack: string, needle: string) => haystack.toLowerCase().includes(needle);

/**
 * The SQL conditions for a filter. A person or scheme that is not on record is a mistake in the address, reported
 * by field, rather than an empty trail. The search matches people's and schemes' names, kinds of event and details.
 */
export function auditEventWhere(filter: AuditFilter, directory: AuditDirectory): WhereOptions<AuditEvent> {
  if (filter.person && !directory.people.some((p) => p.id === filter.person)) throw new InvalidRequestError([{ path: 'person', message: 'That person is not on record: choose one from the list.' }]);
  if (filter.scheme && !directory.schemes.some((s) => s.id === filter.scheme)) throw new InvalidRequestError([{ path: 'scheme', message: 'That scheme is not on record: choose one from the list.' }]);
  const conditions: WhereOptions<AuditEvent>[] = [];
  if (filter.person) conditions.push({ [Op.or]: [{ actorId: filter.person }, { entityType: 'user', entityId: filter.person }] });
  if (filter.action) conditions.push({ action: filter.action });
  if (filter.scheme) conditions.push({ schemeId: filter.scheme });
  if (filter.from) conditions.push({ at: { [Op.gte]: `${filter.from}T00:00:00.000Z` } });
  if (filter.to) conditions.push({ at: { [Op.lt]: nextDay(filter.to) } });
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
