import { authorizedRoute } from '@/lib/http/authorized-route';
import { readJsonBody } from '@/lib/http/read-json-body';
import { sendLetterBatch } from '@/lib/letters/send-letter-batch';
import { LIAISON_MANAGERS } from '@/lib/parcels/liaison-roles';
import { sendBatchSchema } from '@/lib/validation/letter-schemas';

/** POST { max, retryFailed }: sends the next letters of the batch and returns the progress; repeat until none is queued. */
export const POST = authorizedRoute<{ id: string }>(LIAISON_MANAGERS, async (request, user, { id }) => {
  const input = await readJsonBody(request, sendBatchSchema);
  return Response.json(await sendLetterBatch({ user, batchId: id, input }));
});
