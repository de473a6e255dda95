import 'server-only';
import { AppError } from '@/lib/http/app-errors';
import { readBoundedBody } from '@/lib/http/read-bounded-body';
import { describeBytes } from './upload-limits';

function tooLarge(what: string, size: number | null, limit: number): AppError {
  const found = size === null ? 'larger than that' : describeBytes(size);
  return new AppError(`The file is ${found}; ${what} may be at most ${describeBytes(limit)}. Nothing was stored.`, 413);
}

/** The raw upload, refused with 413 (naming the limit) as soon as it passes it; see readBoundedBody. */
export function readUploadBody(request: Request, limit: number, what: string): Promise<Buffer> {
  return readBoundedBody(request, limit, (declared) => tooLarge(what, declared, limit));
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
