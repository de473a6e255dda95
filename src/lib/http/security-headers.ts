import { NextResponse, type NextRequest } from 'next/server';
import { publicUrl } from '@/lib/config/public-url';

// The headers every page and handler answers with, set by src/proxy.ts. No 'server-only': the proxy imports it.

/** Paths whose answers carry personal data (owners' names and addresses, letters) or administration: never stored by a cache. */
const PRIVATE_PATHS = ['/api/parcels', '/api/admin', '/api/letters', '/api/session', '/liaison', '/admin'];

const PERMISSIONS_POLICY = ['camera=()', 'microphone=()', 'geolocation=()', 'payment=()', 'usb=()', 'serial=()', 'bluetooth=()', 'display-capture=()', 'browsing-topics=()'].join(', ');
const TWO_YEARS_S = 63_072_000;

/**
 * Scripts run only with this request's nonce (Next puts it on its own scripts when it finds it in the request's
 * policy; 'strict-dynamic' lets those load the page's chunks). Styles allow 'unsafe-inline' because React writes
 * style attributes into the server-rendered HTML, which a nonce cannot cover. Development needs 'unsafe-eval' for
 * Next's fast refresh; the served build does not.
 */
export function contentSecurityPolicy(nonce: string, { development = process.env.NODE_ENV === 'development' } = {}): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/**
 * The policy of an API answer (JSON, a PDF or a CSV, never a page of ours): it runs no script, so it needs no nonce,
 * and one fixed string serves every request. Why: a nonce per request costs random bytes, a policy string and a copy
 * of the request's headers for Next to read, on the most frequent requests, which never use it.
 */
const API_CONTENT_SECURITY_POLICY = ["default-src 'self'", "script-src 'none'", "object-src 'none'", "base-uri 'none'", "form-action 'none'", "frame-ancestors 'none'"].join('; ');

function isApiPath(pathname: string): boolean {
  return pathname.startsWith('/api/');
}

function newNonce(): string {
  return btoa(String.fromCharCode(...crypto.getRandomValues(new Uint8Array(16))));
}

function setResponseHeaders(request: NextRequest, response: NextResponse, policy: string): NextResponse {
  response.headers.set('Content-Security-Policy', policy);
  response.headers.set('Permissions-Policy', PERMISSIONS_POLICY);
  // Only when the portal's configured address is HTTPS: a browser ignores the header over plain HTTP anyway, and a
  // loopback or test server on HTTP must not pin itself to HTTPS.
  if (publicUrl().protocol === 'https:') response.headers.set('Strict-Transport-Security', `max-age=${TWO_YEARS_S}; includeSubDomains`);
  const { pathname } = request.nextUrl;
  if (PRIVATE_PATHS.some((p) => pathname === p || pathname.startsWith(`${p}/`))) response.headers.set('Cache-Control', 'private, no-store');
  return response;
}

/**
 * Passes the request on with a fresh nonce in its policy (for Next to put on its scripts), and the headers on the
 * answer. An API request is passed on as it is, with the fixed API policy on its answer.
 */
export function nextWithSecurityHeaders(request: NextRequest): NextResponse {
  if (isApiPath(request.nextUrl.pathname)) return setResponseHeaders(request, NextResponse.next(), API_CONTENT_SECURITY_POLICY);
  const policy = contentSecurityPolicy(newNonce());
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set('Content-Security-Policy', policy);
  return setResponseHeaders(request, NextResponse.next({ request: { headers: requestHeaders } }), policy);
}

/** The same headers on an answer the proxy gives itself (a refusal or a redirect), which runs no script. */
export function withSecurityHeaders(request: NextRequest, response: NextResponse): NextResponse {
  return setResponseHeaders(request, response, isApiPath(request.nextUrl.pathname) ? API_CONTENT_SECURITY_POLICY : contentSecurityPolicy(newNonce()));
}
