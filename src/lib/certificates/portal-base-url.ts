import 'server-only';
import { publicBaseUrl } from '@/lib/config/public-url';

/** The portal's address for links in certificates, QR codes and e-mails: configured, never read from the request. */
export function portalBaseUrl(): string {
  return publicBaseUrl();
}
