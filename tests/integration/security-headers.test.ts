import { NextRequest } from 'next/server';
import { afterEach, describe, expect, it } from 'vitest';
import { proxy } from '@/proxy';

// Issue 14 §9, the headers the proxy sets, for the settings an end-to-end run on loopback HTTP cannot reach.

const saved = process.env.PUBLIC_URL;
afterEach(async () => {
  if (saved === undefined) delete process.env.PUBLIC_URL;
  else process.env.PUBLIC_URL = saved;
});

const answer = (url: string, cookie = true) => proxy(new NextRequest(url, { headers: cookie ? { cookie: 'sillmark_session=x' } : {} }));

describe('the proxy’s headers', async () => {
  it('pins HTTPS with Strict-Transport-Security only when the portal’s address is HTTPS', async () => {
    process.env.PUBLIC_URL = 'https://sillmark.example.org';
    expect((await answer('https://sillmark.example.org/home')).headers.get('strict-transport-security')).toMatch(/^max-age=\d{8}; includeSubDomains$/);
    expect((await answer('https://sillmark.example.org/home', false)).headers.get('strict-transport-security')).toMatch(/^max-age=/);
    process.env.PUBLIC_URL = 'http://127.0.0.1:3000';
    expect((await answer('http://127.0.0.1:3000/home')).headers.get('strict-transport-security')).toBeNull();
  });

  it('marks personal and admin data no-store, and leaves other answers to Next', async () => {
    process.env.PUBLIC_URL = 'http://127.0.0.1:3000';
    for (const path of ['/api/parcels/abc', '/api/parcels/abc/impact', '/api/admin/users', '/api/letters/abc', '/liaison/abc/register', '/admin/users']) {
      expect((await answer(`http://127.0.0.1:3000${path}`)).headers.get('cache-control'), path).toBe('private, no-store');
    }
    expect((await answer('http://127.0.0.1:3000/api/health')).headers.get('cache-control')).toBeNull();
    expect((await answer('http://127.0.0.1:3000/administrative')).headers.get('cache-control')).toBeNull();
  });

  it('hands Next the same nonce in the request’s policy as in the answer’s, fresh for each request', async () => {
    process.env.PUBLIC_URL = 'http://127.0.0.1:3000';
    const one = await answer('http://127.0.0.1:3000/home');
    const policy = one.headers.get('content-security-policy') ?? '';
    expect(policy).toMatch(/script-src 'self' 'nonce-[A-Za-z0-9+/=]{24}' 'strict-dynamic'/);
    expect(one.headers.get('x-middleware-request-content-security-policy')).toBe(policy);
    expect((await answer('http://127.0.0.1:3000/home')).headers.get('content-security-policy')).not.toBe(policy);
  });

  it('gives API answers one fixed policy that runs no script, and passes their requests on untouched', async () => {
    process.env.PUBLIC_URL = 'http://127.0.0.1:3000';
    const health = await answer('http://127.0.0.1:3000/api/health');
    const policy = health.headers.get('content-security-policy') ?? '';
    expect(policy).toMatch(/script-src 'none'/);
    expect(policy).toMatch(/frame-ancestors 'none'/);
    expect(policy).not.toMatch(/nonce-/);
    expect((await answer('http://127.0.0.1:3000/api/schemes')).headers.get('content-security-policy')).toBe(policy);
    expect(health.headers.get('x-middleware-request-content-security-policy')).toBeNull();
    expect(health.headers.get('permissions-policy')).toMatch(/camera=\(\)/);
    process.env.PUBLIC_URL = 'https://sillmark.example.org';
    expect((await answer('https://sillmark.example.org/api/schemes')).headers.get('strict-transport-security')).toMatch(/^max-age=/);
  });
});
