// Serves the production build as `next start` would, and stamps every request with its client's network address.
// Next alone keeps a client-written X-Forwarded-For, so the app could not tell a forged address from a real one
// (src/lib/http/client-address.ts trusts the stamp only because this process says it set it).
// Settings: PORT (3000), BIND_ADDRESS (all interfaces), TRUSTED_PROXIES (comma-separated proxy addresses).
import { createServer } from 'node:http';
import { requestClientAddress, trustedProxiesFrom } from './request-client-address.mjs';

process.env.NODE_ENV = 'production';
process.env.SILLMARK_CLIENT_ADDRESS_FROM_SERVER = '1';
const { default: next } = await import('next');

const port = Number(process.env.PORT || 3000);
const bindAddress = process.env.BIND_ADDRESS || undefined;
const trustedProxies = trustedProxiesFrom(process.env.TRUSTED_PROXIES);

const app = next({ dev: false, dir: process.cwd(), hostname: bindAddress ?? 'localhost', port });
await app.prepare();
const handle = app.getRequestHandler();

createServer((request, response) => {
  request.headers['x-sillmark-client-address'] = requestClientAddress(request.socket.remoteAddress, request.headers['x-forwarded-for'], trustedProxies);
  handle(request, response);
}).listen(port, bindAddress, () => console.log(`  Listening on ${bindAddress ?? 'all interfaces'}, port ${port}.`));
