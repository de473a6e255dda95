// The portal's own address, from configuration only. Links in e-mails, certificates and QR codes, the sign-in
// redirect and the cross-origin check all use it; request headers such as Host or X-Forwarded-Host are never trusted
// for this, because any client can set them. No 'server-only' here: src/proxy.ts reads it too.

export class PublicUrlError extends Error {}

function parsed(name: string, value: string): URL {
  let url: URL;
  try {
    url = new URL(value);
  } catch {
    throw new PublicUrlError(`${name} must be a full web address such as https://sillmark.example.org (it is "${value}").`);
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:') throw new PublicUrlError(`${name} must start with http:// or https:// (it is "${value}").`);
  return url;
}

/** PUBLIC_URL, or the loopback address `npm start` and `npm run dev` serve on when it is not set. */
export function publicUrl(): URL {
  return parsed('PUBLIC_URL', process.env.PUBLIC_URL || `http://localhost:${process.env.PORT || '3000'}`);
}

/** The base for links: PUBLIC_URL without a trailing slash (it may include a path prefix). */
export function publicBaseUrl(): string {
  return publicUrl().href.replace(/\/+$/, '');
}

/** Origins whose pages may send changes: the portal's own, plus any listed in TRUSTED_ORIGINS (comma-separated). */
export function trustedOrigins(): Set<string> {
  const extra = (process.env.TRUSTED_ORIGINS ?? '').split(',').map((s) => s.trim()).filter(Boolean);
  return new Set([publicUrl().origin, ...extra.map((value) => parsed('TRUSTED_ORIGINS', value).origin)]);
}
