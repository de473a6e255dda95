import 'server-only';
import { Scheme, User, database } from '@/lib/db';
import type { AuditNames } from './describe-audit-event';

export interface AuditDirectory {
  people: { id: string; name: string; email: string }[];
  schemes: { id: string; reference: string; name: string }[];
  names: AuditNames;
}

/**
 * Everyone and every scheme the trail can name, from the users and schemes tables: the trail's words, its filter
 * lists and its search all read them. Both tables stay small beside the trail itself.
 */
export async function loadAuditDirectory(): Promise<AuditDirectory> {
  database();
  const people = (await User.findAll({ attributes: ['id', 'name', 'email'], order: [['name', 'ASC'], ['email', 'ASC']] })).map((u) => ({ id: u.id, name: u.name, email: u.email }));
  const schemes = (await Scheme.findAll({ attributes: ['id', 'reference', 'name'], order: [['reference', 'ASC']] })).map((s) => ({ id: s.id, reference: s.reference, name: s.name }));
  const personById = new Map(people.map((p) => [p.id, p.name]));
  const schemeById = new Map(schemes.map((s) => [s.id, `${s.reference} ${s.name}`]));
  return {
    people,
    schemes,
    names: {
      person: (id) => (id ? (personById.get(id) ?? 'a person no longer on record') : 'no one'),
      scheme: (id) => (id ? (schemeById.get(id) ?? 'a scheme no longer on record') : null),
    },
  };
}
