import 'server-only';

/**
 * The raw request body, refused through `tooLarge()` as soon as it passes the limit: a declared Content-Length over
 * the limit is refused before reading, and a body without one is counted while it streams, never buffered whole.
 */
export async function readBoundedBody(request: Request, limit: number, tooLarge: (declaredBytes: number | null) => Error): Promise<Buffer> {
  const declared = Number(request.headers.get('content-length') ?? 'NaN');
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(declared);
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
      throw tooLarge(null);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}
