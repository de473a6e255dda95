import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';
import { readableRevisionWhere } from './revision-visibility';
import { findReadableScheme } from './scheme-access';

/** A scheme's revision by number (null: the latest this user may read), for a user allowed to read the scheme. */
export async function findSchemeRevision({ schemeId, number, user }: { schemeId: string; number: number | null; user: SessionUser }) {
  const scheme = await findReadableScheme(user, schemeId);
  const visible = { schemeId, ...readableRevisionWhere(user) };
  const revision = await Revision.findOne({ where: number === null ? visible : { ...visible, number }, order: [['number', 'DESC']] });
  if (!revision) throw new NotFoundError(number === null ? `Scheme ${scheme.reference} has no revision yet.` : `Scheme ${scheme.reference} has no revision ${number}.`);
  return { scheme, revision };
}
