import 'server-only';
import type { z } from 'zod';
import { AppError, InvalidRequestError } from './app-errors';
import { fieldIssuesFromZod } from './zod-issues';

export const MAX_JSON_BYTES = 1024 * 1024;

/** Reads a JSON body of bounded size and parses it with the shared schema; every failure is a 400 with field paths. */
export async function readJsonBody<S extends z.ZodType>(request: Request, schema: S, maxBytes = MAX_JSON_BYTES): Promise<z.infer<S>> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > maxBytes) throw new AppError(`The request body is larger than ${Math.round(maxBytes / 1024)} KiB.`, 413);
  const text = await request.text();
  if (Buffer.byteLength(text) > maxBytes) throw new AppError(`The request body is larger than ${Math.round(maxBytes / 1024)} KiB.`, 413);
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
