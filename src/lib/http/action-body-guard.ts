import { NextResponse, type NextRequest } from 'next/server';

// next.config.mjs sets serverActions.bodySizeLimit to '2mb', which Next reads as 2 MiB.
const ACTION_BODY_LIMIT = 2 * 1024 * 1024;
// The deepest our own forms send is about ten levels; React's reply decoder recurses once per level and overflows
// the stack on a hundred thousand, which Next then answers with 500.
const MAX_NESTING = 64;

const refuse = (status: 400 | 413, reason: string) => NextResponse.json({ error: `The request to the server was refused: ${reason}` }, { status });

/** How deep brackets nest outside JSON strings, stopping once past `limit`. */
function nestingDepth(text: string, limit: number): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (inString) {
      if (c === 0x5c) i++;
      else if (c === 0x22) inString = false;
    } else if (c === 0x22) inString = true;
    else if (c === 0x5b || c === 0x7b) {
      depth++;
      if (depth > deepest && (deepest = depth) > limit) return deepest;
    } else if (c === 0x5d || c === 0x7d) depth--;
  }
  return deepest;
}

async function boundedText(request: NextRequest): Promise<string | null> {
  const reader = request.clone().body?.getReader();
  if (!reader) return '';
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > ACTION_BODY_LIMIT) {
      // Not awaited: the cancel of one branch of a cloned body settles only when the other branch is cancelled too.
      reader.cancel().catch(() => undefined);
      return null;
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.byteLength;
  }
  return new TextDecoder().decode(bytes);
}

/**
 * Server actions are POSTs with a `Next-Action` header. Next answers 500 to a body that is empty, not JSON, over the
 * size limit or nested deep enough to overflow its decoder; these are refused here with 400 or 413 before Next reads
 * them. Multipart bodies (an action called with a form or a file) are left to Next: none of our actions takes one.
 */
export async function refuseBadActionBody(request: NextRequest): Promise<NextResponse | null> {
  if (request.method !== 'POST' || !request.headers.has('next-action')) return null;
  const declared = Number(request.headers.get('content-length') ?? 'NaN');
  if (Number.isFinite(declared) && declared > ACTION_BODY_LIMIT) return refuse(413, 'the body is larger than 2 MiB.');
  const type = request.headers.get('content-type') ?? '';
  if (/^(multipart\/form-data|application\/x-www-form-urlencoded)/i.test(type)) return null;
  const text = await boundedText(request);
  if (text === null) return refuse(413, 'the body is larger than 2 MiB.');
  if (text.trim() === '') return refuse(400, 'the body is empty.');
  if (nestingDepth(text, MAX_NESTING) > MAX_NESTING) return refuse(400, `the body nests brackets more than ${MAX_NESTING} deep.`);
  try {
    JSON.parse(text);
  } catch {
    return refuse(400, 'the body is not JSON.');
  }
  return null;
}
