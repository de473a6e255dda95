import { ANY_ROLE } from '@/lib/auth/authorize';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { exportCaseFile } from '@/lib/schemes/export-case-file';
import { revisionNumberParam } from '@/lib/schemes/revision-number-param';

/** GET ?revision=N (default the latest): the revision as a case file, as a download. */
export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (request, user, { id }) => {
  const { fileName, json } = await exportCaseFile({ schemeId: id, revisionNumber: revisionNumberParam(request), user });
  return new Response(json, { headers: { 'content-type': 'application/json; charset=utf-8', 'content-disposition': `attachment; filename="${fileName}"` } });
});
