import { authorizedRoute } from '@/lib/http/authorized-route';
import { batchProgress } from '@/lib/letters/batch-progress';
import { LIAISON_READERS } from '@/lib/parcels/liaison-roles';

/** GET: how far a batch of letters has been sent, letter by letter (for the progress display, polled by SWR). */
export const GET = authorizedRoute<{ id: string }>(LIAISON_READERS, async (_request, user, { id }) => Response.json(await batchProgress({ user, batchId: id })));
