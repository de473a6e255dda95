import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { User } from '@/lib/db';
import { listRevisionHistory } from '@/lib/revisions/list-revision-history';
import { findReadableScheme } from './scheme-access';

/** A scheme's page: its register entry, its designer, and every revision with its history. */
export async function loadScheme({ schemeId, user }: { schemeId: string; user: SessionUser }) {
  const scheme = await findReadableScheme(user, schemeId);
  const designer = await User.findByPk(scheme.designerId, { attributes: ['name', 'organisation'] });
  const revisions = await listRevisionHistory(scheme.id, user);
  const isOwner = user.role === 'designer' && scheme.designerId === user.id;
  return {
    scheme: { id: scheme.id, reference: scheme.reference, name: scheme.name, watercourse: scheme.watercourse, site: scheme.site, description: scheme.description, createdAt: scheme.createdAt },
    designer: { name: designer?.name ?? 'unknown', organisation: designer?.organisation ?? null },
    isOwner,
    openDraft: revisions.find((r) => r.status === 'draft') ?? null,
    revisions,
  };
}
export type LoadedScheme = Awaited<ReturnType<typeof loadScheme>>;
