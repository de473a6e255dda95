import 'server-only';
import { headers } from 'next/headers';

/** Set on every request by the portal server (src/cli/serve.mjs), which overwrites whatever the client sent. */
export const CLIENT_ADDRESS_HEADER = 'x-sillmark-client-address';

/**
 * The client's network address, for throttling sign-ins. Next alone cannot tell the socket's address from a forged
 * X-Forwarded-For, so the header is believed only when our own server, in this process, says it set it.
 * Under `next dev` every client is "unknown" and shares one per-client budget.
 */
export async function clientAddress(): Promise<string> {
  if (process.env.SILLMARK_CLIENT_ADDRESS_FROM_SERVER !== '1') return 'unknown';
  return (await headers()).get(CLIENT_ADDRESS_HEADER) || 'unknown';
}
