import 'server-only';
import type { z } from 'zod';
import { AppError, InvalidRequestError } from './app-errors';
import { fieldIssuesFromZod } from './zod-issues';

export const MAX_JSON_BYTES = 1024 * 1024;

const tooLarge = (maxBytes: number) => new AppError(`The request body is larger than ${Math.round(maxBytes / 1024)} KiB.`, 413);

/** The body as text, refused as soon as it passes the limit: a body without a declared length is counted while it streams, never buffered whole. */
async function boundedText(request: Request, maxBytes: number): Promise<string> {
  if (!request.body) return '';
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(maxBytes);
    }
    chunks.push(value);
  }
  // As Request.text() does: UTF-8, a leading byte-order mark dropped, malformed bytes replaced.
  return new TextDecoder('utf-8').decode(Buffer.concat(chunks));
}

/** Reads a JSON body of bounded size and parses it with the shared schema; every failure is a 400 with field paths. */
export async function readJsonBody<S extends z.ZodType>(request: Request, schema: S, maxBytes = MAX_JSON_BYTES): Promise<z.infer<S>> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > maxBytes) throw tooLarge(maxBytes);
  const text = await boundedText(request, maxBytes);
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new InvalidRequestError([{ path: '', message: 'The request body is not valid JSON.' }], 'The request body is not valid JSON.');
  }
  const parsed = schema.safeParse(json);
  if (!parsed.success) throw new InvalidRequestError(fieldIssuesFromZod(parsed.error));
  return parsed.data;
}
