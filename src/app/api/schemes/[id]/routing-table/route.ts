import { z } from 'zod';
import { ANY_ROLE } from '@/lib/auth/authorize';
import { InvalidRequestError, UnprocessableError } from '@/lib/http/app-errors';
import { authorizedRoute } from '@/lib/http/authorized-route';
import { indexQuery, queryOrThrow } from '@/lib/http/query-params';
import { evaluateDraft } from '@/lib/revisions/evaluate-draft';
import { eventRouting } from '@/lib/routing-sheet/event-routing';
import { routingTableCsv } from '@/lib/routing-sheet/routing-table-csv';
import { findSchemeRevision } from '@/lib/schemes/find-scheme-revision';
import { revisionNumberParam } from '@/lib/schemes/revision-number-param';

const eventQuery = z.object({ event: indexQuery('the event, counted from 0').optional() });

/** GET ?revision=N&event=i: one event's flood routed through the reservoir, step by step, as CSV (times in hours). */
export const GET = authorizedRoute<{ id: string }>(ANY_ROLE, async (request, user, { id }) => {
  const { scheme, revision } = await findSchemeRevision({ schemeId: id, number: revisionNumberParam(request), user });
  const evaluation = await evaluateDraft({ revisionId: revision.id, user });
  if (evaluation.status !== 'evaluated') throw new UnprocessableError('This revision cannot be evaluated yet, so it has no routing table.', evaluation.issues);
  const index = queryOrThrow(eventQuery, request).event ?? 0;
  const event = evaluation.result.events[index];
  if (!event) throw new InvalidRequestError([{ path: 'event', message: `must be the number of one of the ${evaluation.result.events.length} events, from 0` }]);
  const routing = eventRouting(event);
  if (!routing) throw new UnprocessableError(`The event “${event.name}” has no inflow hydrograph routed through a reservoir, so it has no routing table.`, [{ path: 'event', message: 'is not routed through a reservoir' }]);
  const csv = routingTableCsv({ scheme, revision: revision.number, eventName: event.name, routing, units: evaluation.result.units, datum: evaluation.draft.wizard?.datum ?? null, engineVersion: evaluation.result.engineVersion });
  const fileName = `${scheme.reference}-rev${revision.number}-event${index + 1}-routing-table.csv`;
  return new Response(csv, { headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${fileName}"` } });
});
