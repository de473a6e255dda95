import 'server-only';
import type { z } from 'zod';
import { AppError, InvalidRequestError } from './app-errors';
import { readBoundedBody } from './read-bounded-body';
import { MAX_JSON_BYTES } from '@/lib/validation/input-limits';
import { safeParseUntrusted } from '@/lib/validation/safe-parse-untrusted';
import { fieldIssuesFromZod } from './zod-issues';

export { MAX_JSON_BYTES };

const tooLarge = (maxBytes: number) => new AppError(`The request body is larger than ${Math.round(maxBytes / 1024)} KiB.`, 413);

/** Reads a JSON body of bounded size and parses it with the shared schema; every failure is a 400 with field paths. */
export async function readJsonBody<S extends z.ZodType>(request: Request, schema: S, maxBytes = MAX_JSON_BYTES): Promise<z.infer<S>> {
  // As Request.text() does: UTF-8, a leading byte-order mark dropped, malformed bytes replaced.
  const text = new TextDecoder('utf-8').decode(await readBoundedBody(request, maxBytes, () => tooLarge(maxBytes)));
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new InvalidRequestError([{ path: '', message: 'The request body is not valid JSON.' }], 'The request body is not valid JSON.');
  }
  const parsed = safeParseUntrusted(schema, json);
  if (!parsed.success) throw new InvalidRequestError(fieldIssuesFromZod(parsed.error));
  return parsed.data;
}
