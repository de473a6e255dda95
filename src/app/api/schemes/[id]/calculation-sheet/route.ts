import { ANY_ROLE } from '@/lib/auth/authorize';
import { User } from '@/lib/db';
import { UnprocessableError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { renderCalculationSheet } from '@/lib/pdf/calculation-sheet';
import { evaluateDraft } from '@/lib/revisions/evaluate-draft';
import { findSchemeRevision } from '@/lib/schemes/find-scheme-revision';
import { revisionNumberParam } from '@/lib/schemes/revision-number-param';

/** GET ?revision=N: the revision's printable calculation sheet, watermarked DRAFT (certificates are made elsewhere, from countersigned revisions). */
export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (request, user, { id }) => {
  const { scheme, revision } = await findSchemeRevision({ schemeId: id, number: revisionNumberParam(request), user });
  const evaluation = await evaluateDraft({ revisionId: revision.id, user });
  if (evaluation.status !== 'evaluated') throw new UnprocessableError('This revision cannot be evaluated yet, so there is no calculation sheet.', evaluation.issues);
  const designer = await User.findByPk(scheme.designerId, { attributes: ['name'] });
  const pdf = await renderCalculationSheet({
    scheme, revision: { number: revision.number, status: revision.status }, designer: designer?.name ?? 'unknown',
    datum: evaluation.draft.wizard?.datum ?? null, input: evaluation.input, result: evaluation.result, generatedAt: new Date(),
  });
  return new Response(new Uint8Array(pdf), { headers: { 'content-type': 'application/pdf', 'content-disposition': `inline; filename="${scheme.reference}-rev${revision.number}-draft-calculation-sheet.pdf"` } });
});
