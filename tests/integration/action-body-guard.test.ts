import { NextRequest } from 'next/server';
import { describe, expect, it } from 'vitest';
import { proxy } from '@/proxy';

// Issue 14 §6: Next 16.4 answers 500 to these server-action bodies (checked on `next start`, see the README); the
// proxy refuses them first. The served build is exercised by tests/e2e/bad-requests.test.ts.

const ACTION_ID = '7f0000000000000000000000000000000000000000';

function actionRequest(body: BodyInit | null, headers: Record<string, string> = {}): NextRequest {
  const init = { method: 'POST', headers: { 'next-action': ACTION_ID, 'content-type': 'text/plain;charset=UTF-8', ...headers }, body, ...(body instanceof ReadableStream ? { duplex: 'half' } : {}) };
  return new NextRequest('http://localhost:3000/sign-in', init as ConstructorParameters<typeof NextRequest>[1]);
}

async function refusal(request: NextRequest): Promise<{ status: number; error: string } | null> {
  const response = await proxy(request);
  if (response.headers.get('x-middleware-next') === '1') return null;
  return { status: response.status, error: ((await response.json()) as { error: string }).error };
}

describe('the proxy’s guard on server-action bodies', () => {
  it('lets a well-formed call through with its body still readable by the action', async () => {
    const body = JSON.stringify([{ email: 'nobody@example.test', password: 'wrong' }]);
    const request = actionRequest(body);
    expect(await refusal(request)).toBeNull();
    expect(await request.text()).toBe(body);
  });

  it.each([
    { what: 'not JSON', body: 'this is not json', status: 400, reason: /not JSON/ },
    { what: 'empty', body: '', status: 400, reason: /empty/ },
    { what: 'only spaces', body: '   ', status: 400, reason: /empty/ },
    { what: 'nested a hundred thousand brackets deep', body: `${'['.repeat(100_000)}${']'.repeat(100_000)}`, status: 400, reason: /nests brackets more than 64 deep/ },
    { what: 'over 2 MiB', body: JSON.stringify(['a'.repeat(3 * 1024 * 1024)]), status: 413, reason: /larger than 2 MiB/ },
  ])('refuses a body that is $what with $status and says why', async ({ body, status, reason }) => {
    const refused = await refusal(actionRequest(body));
    expect(refused?.status).toBe(status);
    expect(refused?.error).toMatch(reason);
  });

  it('refuses an over-limit body without a declared length once 2 MiB have streamed', async () => {
    const chunk = new TextEncoder().encode('a'.repeat(512 * 1024));
    let sent = 0;
    const stream = new ReadableStream<Uint8Array>({ pull: (c) => (sent++ < 8 ? c.enqueue(chunk) : c.close()) });
    expect((await refusal(actionRequest(stream)))?.status).toBe(413);
  });

  it('refuses a declared length over the limit before reading', async () => {
    expect((await refusal(actionRequest('[]', { 'content-length': String(5 * 1024 * 1024) })))?.status).toBe(413);
  });

  it('does not count brackets inside strings, and leaves other requests alone', async () => {
    expect(await refusal(actionRequest(JSON.stringify([{ note: '['.repeat(500) }])))).toBeNull();
    expect(await refusal(new NextRequest('http://localhost:3000/api/schemes', { method: 'POST', headers: { 'content-type': 'application/json' }, body: 'not json' }))).toBeNull();
  });
});
