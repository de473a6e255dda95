import { NextResponse, type NextRequest } from 'next/server';
import { trustedOrigins } from '@/lib/config/public-url';
import { nextWithSecurityHeaders, withSecurityHeaders } from '@/lib/http/security-headers';
import { refuseBadActionBody } from '@/lib/http/action-body-guard';

const SESSION_COOKIE = 'sillmark_session';
// The app's icons and manifest are public: a browser asks for them on the sign-in page too.
const PUBLIC_PAGES = ['/sign-in', '/invitation', '/verify', '/robots.txt', '/icon.svg', '/apple-icon.png', '/icons/', '/manifest.webmanifest'];
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cheap checks only: cross-origin writes are refused, anonymous page visits go to sign-in.
 * Every page, handler and action still checks the session and role itself on the server.
 */
export async function proxy(request: NextRequest) {
  if (!SAFE_METHODS.has(request.method)) {
    // Compared with the configured origin, never with Host or X-Forwarded-Host, which the client controls.
    const origin = request.headers.get('origin');
    if (origin && !trustedOrigins().has(origin)) {
      return withSecurityHeaders(request, NextResponse.json({ error: 'Cross-origin requests that change data are refused.' }, { status: 403 }));
    }
  }
  const refusedBody = await refuseBadActionBody(request);
  if (refusedBody) return withSecurityHeaders(request, refusedBody);
  const { pathname } = request.nextUrl;
  const isPage = !pathname.startsWith('/api/') && !pathname.startsWith('/_next/');
  if (isPage && request.method === 'GET' && !request.cookies.has(SESSION_COOKIE) && pathname !== '/' && !PUBLIC_PAGES.some((p) => pathname.startsWith(p))) {
    const url = request.nextUrl.clone();
    url.pathname = '/sign-in';
    url.search = `?next=${encodeURIComponent(pathname)}`;
    return withSecurityHeaders(request, NextResponse.redirect(url));
  }
  return nextWithSecurityHeaders(request);
}

export const config = { matcher: ['/((?!_next/static|_next/image|favicon.ico).*)'] };
