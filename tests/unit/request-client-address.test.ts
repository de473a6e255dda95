import { describe, expect, it } from 'vitest';
// @ts-expect-error -- plain ESM helper of the portal server
import { requestClientAddress, trustedProxiesFrom } from '../../src/cli/request-client-address.mjs';

const none = trustedProxiesFrom(undefined);
const proxies = trustedProxiesFrom('10.0.0.5, 10.0.0.6');

describe('the client address the sign-in limits count under', () => {
  it('is the connection’s address, whatever X-Forwarded-For says, when no proxy is trusted', () => {
    expect(requestClientAddress('::ffff:203.0.113.7', '192.0.2.1', none)).toBe('203.0.113.7');
    expect(requestClientAddress('2001:db8::1', undefined, none)).toBe('2001:db8::1');
  });

  it('is the right-most address a trusted proxy did not write itself', () => {
    expect(requestClientAddress('10.0.0.5', '192.0.2.1, 203.0.113.7', proxies)).toBe('203.0.113.7');
    expect(requestClientAddress('10.0.0.5', ['192.0.2.1, 203.0.113.7', '10.0.0.6'], proxies)).toBe('203.0.113.7');
  });

  it('ignores X-Forwarded-For from a connection that is not a trusted proxy', () => {
    expect(requestClientAddress('203.0.113.7', '10.0.0.5', proxies)).toBe('203.0.113.7');
  });
});
