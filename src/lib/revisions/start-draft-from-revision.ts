import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision, database } from '@/lib/db';
import { ConflictError, ForbiddenError } from '@/lib/http/app-errors';
import { findReadableRevision } from '@/lib/schemes/scheme-access';
import { createDraft } from './create-draft';
import { decodeDraft } from './draft-inputs';

/** A new draft whose inputs are a copy of an earlier revision (a submitted one stays frozen as it was). */
export async function startDraftFromRevision({ revisionId, user }: { revisionId: string; user: SessionUser }) {
  if (user.role !== 'designer') throw new ForbiddenError('Only the scheme’s designer starts drafts.');
  const sequelize = database();
  return sequelize.transaction(async (transaction) => {
    const { scheme, revision } = await findReadableRevision(user, revisionId, transaction);
    const open = await Revision.findOne({ where: { schemeId: scheme.id, status: 'draft' }, transaction });
    if (open) throw new ConflictError(`Revision ${open.number} is already a draft of this scheme. Continue it, or have it withdrawn, before starting another.`);
    const inputs = decodeDraft(revision.inputsJson);
    const draft = await createDraft({ schemeId: scheme.id, authorId: user.id, inputs, wizardStep: 'scheme', basedOn: revision, origin: `from revision ${revision.number}`, transaction });
    return { schemeId: scheme.id, revisionId: draft.id, revisionNumber: draft.number };
  });
}
