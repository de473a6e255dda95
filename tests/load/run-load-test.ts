// `npm run load`: the production build on loopback under 50 concurrent connections for 20 s per endpoint,
// bounded in count and time; reports requests per second and latency percentiles, fails on any error.
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import autocannon from 'autocannon';
import { lucia } from '@/lib/auth/lucia';
import { User, closeSequelize, database } from '@/lib/db';
import { startApp } from '../e2e/support/app-server';

const CONNECTIONS = 50;
const DURATION_S = Number(process.env.LOAD_DURATION_S ?? 20);
// autocannon ignores `duration` when `amount` is set, so the count is capped per connection instead.
const MAX_REQUESTS_PER_CONNECTION = 20_000;

async function designerCookie(databasePath: string): Promise<string> {
  process.env.DATABASE_PATH = databasePath;
  database();
  const designer = await User.findOne({ where: { role: 'designer' } });
  const session = await lucia().createSession(designer!.id, {});
  return `${lucia().sessionCookieName}=${session.id}`;
}

function run(name: string, options: autocannon.Options) {
  console.log(`▶ ${name}: ${CONNECTIONS} connections for ${DURATION_S} s`);
  return new Promise<{ name: string; result: autocannon.Result }>((resolve, reject) => {
    autocannon({ ...options, connections: CONNECTIONS, duration: DURATION_S, maxConnectionRequests: MAX_REQUESTS_PER_CONNECTION }, (error, result) => (error ? reject(error) : resolve({ name, result })));
  });
}

const app = await startApp();
try {
  const cookie = await designerCookie(app.databasePath);
  console.log(`Serving ${app.baseUrl}; signed in as the demo designer.`);
  // The Harrowfield demo case (two events, with and without the scheme), without crest sizing: one design check.
  const { sizing: _sizing, ...oneCheck } = JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-broad-crested.json', 'utf8'));
  const demoCase = JSON.stringify(oneCheck);
  const runs = [
    await run('GET /api/schemes', { url: `${app.baseUrl}/api/schemes`, headers: { cookie } }),
    await run('POST /api/evaluate', { url: `${app.baseUrl}/api/evaluate`, method: 'POST', headers: { cookie, 'content-type': 'application/json', origin: app.baseUrl }, body: demoCase }),
  ];
  const rows = runs.map(({ name, result }) => ({
    endpoint: name,
    requests: result.requests.total,
    requestsPerSecond: Math.round(result.requests.average),
    p50Ms: result.latency.p50,
    // autocannon's histogram gives p90 and p97.5, not p95; p97.5 is reported as the (stricter) upper bound of p95.
    p90Ms: result.latency.p90,
    p97_5Ms: result.latency.p97_5,
    p99Ms: result.latency.p99,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
  }));
  const machine = `${os.cpus().length} × ${os.cpus()[0]?.model ?? 'CPU'}, ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}`;
  mkdirSync('tests/.artifacts', { recursive: true });
  writeFileSync('tests/.artifacts/load.json', JSON.stringify({ machine, connections: CONNECTIONS, durationSeconds: DURATION_S, rows }, null, 2));
  console.log(`Load test on ${machine}: ${CONNECTIONS} connections, ${DURATION_S} s per endpoint`);
  console.table(rows);
  if (rows.some((r) => r.errors > 0 || r.non2xx > 0)) {
    console.error('✖ Some requests failed.');
    process.exitCode = 1;
  }
} finally {
  await closeSequelize();
  await app.stop();
}
