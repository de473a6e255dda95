import 'server-only';
import { AppError } from '@/lib/http/app-errors';
import { describeBytes } from './upload-limits';

function tooLarge(what: string, size: number | null, limit: number): AppError {
  const found = size === null ? 'larger than that' : describeBytes(size);
  return new AppError(`The file is ${found}; ${what} may be at most ${describeBytes(limit)}. Nothing was stored.`, 413);
}

/**
 * The raw request body, refused with 413 as soon as it passes the limit: a declared Content-Length over the
 * limit is refused before reading, and a body without one is counted while it streams, never buffered whole.
 */
export async function readUploadBody(request: Request, limit: number, what: string): Promise<Buffer> {
  const declared = Number(request.headers.get('content-length') ?? 'NaN');
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(what, declared, limit);
  if (!request.body) return Buffer.alloc(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge(what, null, limit);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/** The file's own name, from the X-File-Name header (URI-encoded); kept as a label only, never used as a path. */
export function uploadedFileName(request: Request, fallback: string): string {
  const raw = request.headers.get('x-file-name');
  if (!raw) return fallback;
  let name: string;
  try {
    name = decodeURIComponent(raw);
  } catch {
    name = raw;
  }
  const label = name.replace(/[\u0000-\u001f\u007f]/g, '').split(/[\\/]/).pop()?.trim().slice(0, 200);
  return label || fallback;
}
