const HOME = '/home';

/**
 * Where to send the browser after sign-in: `next` only when it resolves to a page of the portal itself, else home.
 * Resolving against the portal's origin is what the browser will do, so backslashes, tabs and `/.//` tricks that a
 * prefix check misses show up here as another origin or a path that starts with `//`.
 */
export function sameOriginPath(next: string | undefined | null, portalOrigin: string): string {
  if (!next) return HOME;
  let url: URL;
  try {
    url = new URL(next, portalOrigin);
  } catch {
    return HOME;
  }
  if (url.origin !== new URL(portalOrigin).origin) return HOME;
  const path = `${url.pathname}${url.search}${url.hash}`;
  return path.startsWith('/') && !path.startsWith('//') ? path : HOME;
}
