import 'server-only';
import { headers } from 'next/headers';

/** The portal's address for links in certificates and e-mails: PUBLIC_URL when set, else the request's own origin. */
export async function portalBaseUrl(): Promise<string> {
  if (process.env.PUBLIC_URL) return process.env.PUBLIC_URL.replace(/\/$/, '');
  const h = await headers();
  return `${h.get('x-forwarded-proto') ?? 'http'}://${h.get('x-forwarded-host') ?? h.get('host') ?? 'localhost:3000'}`;
}
