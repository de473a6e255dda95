import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { Revision } from '@/lib/db';
import { NotFoundError } from '@/lib/http/app-errors';
import { caseFileOf, decodeDraft } from '@/lib/revisions/draft-inputs';
import { readableRevisionWhere } from './revision-visibility';
import { findReadableScheme } from './scheme-access';

/**
 * One revision as a case file to keep or share: the case the engine reads, with a "scheme" block beside it
 * (name, watercourse, site, datum, governing event) that import reads back and the engine ignores.
 */
export async function exportCaseFile({ schemeId, revisionNumber, user }: { schemeId: string; revisionNumber: number | null; user: SessionUser }) {
  const scheme = await findReadableScheme(user, schemeId);
  const certifiedOnly = readableRevisionWhere(user);
  const revision = revisionNumber === null
    ? await Revision.findOne({ where: { schemeId, ...certifiedOnly }, order: [['number', 'DESC']] })
    : await Revision.findOne({ where: { schemeId, number: revisionNumber, ...certifiedOnly } });
  if (!revision) throw new NotFoundError(`Scheme ${scheme.reference} has no revision ${revisionNumber ?? ''}.`.replace(' .', '.'));
  const draft = decodeDraft(revision.inputsJson);
  const caseFile = {
    ...caseFileOf(draft),
    title: draft.title ?? scheme.name,
    scheme: {
      reference: scheme.reference,
      revision: revision.number,
      status: revision.status,
      name: scheme.name,
      watercourse: scheme.watercourse,
      site: scheme.site,
      ...(scheme.description ? { description: scheme.description } : {}),
      ...(draft.wizard?.datum ? { datum: draft.wizard.datum } : {}),
      governing: draft.wizard?.governing ?? 'all',
    },
  };
  return { fileName: `${scheme.reference}-rev${revision.number}.sillmark.json`, json: `${JSON.stringify(caseFile, null, 2)}\n` };
}
