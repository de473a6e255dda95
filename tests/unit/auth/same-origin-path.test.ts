import { describe, expect, it } from 'vitest';
import { sameOriginPath } from '@/lib/auth/same-origin-path';

const PORTAL = 'https://sillmark.example.org';

describe('the page to go to after sign-in', () => {
  // The page reads `next` from the query string already decoded: `next=/%5Cevil.example` arrives as `/\evil.example`.
  it.each(['/\\evil.example/landed', '/\t/evil.example/landed', '/\n/evil.example/landed', '/.//evil.example/landed', '//evil.example/landed', '\\\\evil.example/landed', 'https://evil.example/landed', 'http://sillmark.example.org/home', 'javascript:alert(1)', ''])('is home for %j', (next) => {
    expect(sameOriginPath(next, PORTAL)).toBe('/home');
  });

  it('leaves a still-encoded backslash inside the path, where the browser does not read it as a slash', () => {
    const target = sameOriginPath('/%5Cevil.example/landed', PORTAL);
    expect(new URL(target, PORTAL).origin).toBe(PORTAL);
    expect(target).toBe('/%5Cevil.example/landed');
  });

  it('keeps a path of the portal with its query and fragment', () => {
    expect(sameOriginPath('/schemes/abc?tab=checks#comments', PORTAL)).toBe('/schemes/abc?tab=checks#comments');
    expect(sameOriginPath(`${PORTAL}/checks/1`, PORTAL)).toBe('/checks/1');
  });
});
