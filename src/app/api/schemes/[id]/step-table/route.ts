import { z } from 'zod';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { InvalidRequestError, UnprocessableError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { indexQuery, queryOrThrow } from '@/lib/http/query-params';
import { evaluateDraft } from '@/lib/revisions/evaluate-draft';
import { stepTableCsv } from '@/lib/revisions/step-table-csv';
import { findSchemeRevision } from '@/lib/schemes/find-scheme-revision';
import { revisionNumberParam } from '@/lib/schemes/revision-number-param';

const eventQuery = z.object({ event: indexQuery('the event, counted from 0').optional() });

/** GET ?revision=N&event=i: the step table of one event's with-scheme profile, as CSV. */
export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (request, user, { id }) => {
  const { scheme, revision } = await findSchemeRevision({ schemeId: id, number: revisionNumberParam(request), user });
  const evaluation = await evaluateDraft({ revisionId: revision.id, user });
  if (evaluation.status !== 'evaluated') throw new UnprocessableError('This revision cannot be evaluated yet, so it has no step table.', evaluation.issues);
  const index = queryOrThrow(eventQuery, request).event ?? 0;
  const event = evaluation.result.events[index];
  if (!event) throw new InvalidRequestError([{ path: 'event', message: `must be the number of one of the ${evaluation.result.events.length} events, from 0` }]);
  const fileName = `${scheme.reference}-rev${revision.number}-event${index + 1}-step-table.csv`;
  const csv = stepTableCsv({ scheme, revisionNumber: revision.number, datum: evaluation.draft.wizard?.datum ?? null, event, units: evaluation.result.units, engineVersion: evaluation.result.engineVersion });
  return new Response(csv, { headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${fileName}"` } });
});
