import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { AuditEvent, Certificate, Review, User, database } from '@/lib/db';

const ACTIONS: Record<string, string> = {
  'revision.submitted': 'Submitted for check',
  'review.started': 'Check started',
  'review.commented': 'Checker commented',
  'revision.returned': 'Returned to the designer',
  'revision.countersigned': 'Countersigned',
  'certificate.issued': 'Certificate issued',
  'certificate.superseded': 'Certificate superseded',
  'certificate.downloaded': 'Certificate downloaded',
  'certificate.revoked': 'Certificate revoked',
};

/** Events of other parts of the portal, in words: "revision.step-saved" reads "Revision step saved". */
function humanised(action: string): string {
  const words = action.replace(/[.-]/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function detailOf(details: Record<string, unknown>): { what: string; hash: string | null } {
  const parts: string[] = [];
  if (typeof details.number === 'string') parts.push(details.number);
  else if (typeof details.number === 'number') parts.push(`revision ${details.number}`);
  if (typeof details.part === 'string') parts.push(`on ${details.part}`);
  if (typeof details.reason === 'string') parts.push(`reason: ${details.reason}`);
  if (typeof details.supersededBy === 'string') parts.push(`by ${details.supersededBy}`);
  const hash = [details.pdfSha256, details.revisionSha256].find((h): h is string => typeof h === 'string') ?? null;
  return { what: parts.join(' '), hash };
}

/** Events about these revisions only: their own, their reviews' and their certificates'. */
async function aboutRevisions(revisionIds: string[]): Promise<WhereOptions<AuditEvent>> {
  const reviews = await Review.findAll({ where: { revisionId: revisionIds }, attributes: ['id'] });
  const certificates = await Certificate.findAll({ where: { revisionId: revisionIds }, attributes: ['id'] });
  return {
    [Op.or]: [
      { entityType: 'revision', entityId: revisionIds },
      { entityType: 'review', entityId: reviews.map((r) => r.id) },
      { entityType: 'certificate', entityId: certificates.map((c) => c.id) },
    ],
  };
}

/**
 * The scheme's audit events (who, when, what, hash), newest first, with the actions in words. With `onlyRevisionIds`
 * (what a planning officer may read), nothing about any other revision, nor about the scheme's other work, is listed.
 */
export async function listSchemeHistory(schemeId: string, { limit = 200, onlyRevisionIds = null }: { limit?: number; onlyRevisionIds?: string[] | null } = {}) {
  database();
  const only = onlyRevisionIds ? await aboutRevisions(onlyRevisionIds) : {};
  const events = await AuditEvent.findAll({ where: { schemeId, ...only }, order: [['id', 'DESC']], limit });
  const actors = new Map((await User.findAll({ where: { id: events.flatMap((e) => (e.actorId ? [e.actorId] : [])) }, attributes: ['id', 'name', 'role'] })).map((u) => [u.id, u]));
  return events.map((e) => {
    const actor = e.actorId ? actors.get(e.actorId) : undefined;
    const { what, hash } = detailOf(JSON.parse(e.detailsJson) as Record<string, unknown>);
    return { id: e.id, at: e.at, who: actor ? `${actor.name} (${actor.role})` : 'system', action: ACTIONS[e.action] ?? humanised(e.action), what, hash, eventHash: e.hash };
  });
}
export type SchemeHistoryEntry = Awaited<ReturnType<typeof listSchemeHistory>>[number];
