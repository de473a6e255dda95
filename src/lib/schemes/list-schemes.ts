import 'server-only';
import { QueryTypes } from 'sequelize';
import type { SessionUser } from '@/lib/auth/current-session';
import type { Revision } from '@/lib/db';
import { database } from '@/lib/db';
import { readableRevisionWhere } from './revision-visibility';

interface ListedSchemeRow {
  id: string;
  reference: string;
  name: string;
  watercourse: string;
  site: string;
  latest_number: number | null;
  latest_status: Revision['status'] | null;
}

/**
 * Schemes the user may see, each with its latest revision the user may read: designers their own schemes, planning
 * officers certified ones with their countersigned revisions only, the other roles all. One SQL statement: the register
 * is read on every visit, and two model queries cost some five times as much on the request thread.
 */
export async function listSchemes(user: SessionUser) {
  const statuses = readableRevisionWhere(user).status;
  const readable = statuses ? `AND r2.status IN (${statuses.map(() => '?').join(', ')})` : '';
  const who = user.role === 'designer' ? 'WHERE s.designer_id = ?' : user.role === 'planning' ? 'WHERE s.id IN (SELECT scheme_id FROM certificates)' : '';
  const rows = await database().query<ListedSchemeRow>(
    `SELECT s.id, s.reference, s.name, s.watercourse, s.site, r.number AS latest_number, r.status AS latest_status
       FROM schemes s
       LEFT JOIN revisions r ON r.scheme_id = s.id
        AND r.number = (SELECT MAX(r2.number) FROM revisions r2 WHERE r2.scheme_id = s.id ${readable})
       ${who}
      ORDER BY s.reference ASC`,
    { replacements: [...(statuses ?? []), ...(user.role === 'designer' ? [user.id] : [])], type: QueryTypes.SELECT },
  );
  return rows.map((row) => ({
    id: row.id,
    reference: row.reference,
    name: row.name,
    watercourse: row.watercourse,
    site: row.site,
    latestRevision: row.latest_number === null ? null : { number: row.latest_number, status: row.latest_status as Revision['status'] },
  }));
}
export type ListedScheme = Awaited<ReturnType<typeof listSchemes>>[number];
