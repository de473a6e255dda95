import 'server-only';
import { AuditEvent, User, database } from '@/lib/db';

export async function listAuditEvents({ limit = 100, schemeId }: { limit?: number; schemeId?: string } = {}) {
  database();
  const events = await AuditEvent.findAll({ where: schemeId ? { schemeId } : {}, order: [['id', 'DESC']], limit });
  const actors = new Map((await User.findAll({ where: { id: events.map((e) => e.actorId).filter((id): id is string => !!id) } })).map((u) => [u.id, u.name]));
  return events.map((e) => ({ id: e.id, at: e.at, actor: e.actorId ? (actors.get(e.actorId) ?? e.actorId) : 'system', action: e.action, entity: `${e.entityType}${e.entityId ? ` ${e.entityId.slice(0, 8)}` : ''}`, details: e.detailsJson, hash: e.hash }));
}
