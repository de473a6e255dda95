// The network address of the client behind a request, for the sign-in throttle (src/lib/http/client-address.ts).
// It is the socket's peer, unless that peer is listed in TRUSTED_PROXIES: then it is the right-most X-Forwarded-For
// entry that is not itself a trusted proxy, since entries further left are whatever the client chose to write.

export function normaliseAddress(address) {
  const plain = (address ?? '').trim();
  return plain.startsWith('::ffff:') ? plain.slice('::ffff:'.length) : plain;
}

export function trustedProxiesFrom(list) {
  return new Set((list ?? '').split(',').map(normaliseAddress).filter(Boolean));
}

/** @param {string | undefined} socketAddress @param {string | string[] | undefined} forwardedFor @param {Set<string>} trustedProxies */
export function requestClientAddress(socketAddress, forwardedFor, trustedProxies) {
  const peer = normaliseAddress(socketAddress) || 'unknown';
  if (!trustedProxies.has(peer)) return peer;
  const hops = [forwardedFor ?? []].flat().join(',').split(',').map(normaliseAddress).filter(Boolean);
  for (let i = hops.length - 1; i >= 0; i--) if (!trustedProxies.has(hops[i])) return hops[i];
  return peer;
}
