// `npm run load`: the production build on loopback under 50 concurrent connections per endpoint, bounded in count and
// time. Each endpoint alone; then POST /api/evaluate saturated again while other users' requests (a paced health
// probe) are timed. Latency percentiles are computed from every response's latency; each target is printed with PASS
// or MISSED. LOAD_CROWDED=1 adds, outside the targets, 50 health clients and 50 evaluate clients at once.
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { execFile } from 'node:child_process';
import type autocannon from 'autocannon';
import { lucia } from '@/lib/auth/lucia';
import { User, closeSequelize, database } from '@/lib/db';
import { startApp } from '../e2e/support/app-server';
import { type LoadRow, check, loadRow, readmeTableRows } from './load-stats';

const CONNECTIONS = 50;
// The other users while the engine is saturated: 10 connections asking 100 times a second in all. Fifty health
// clients asking as fast as they are answered would not time other requests: they take the request thread from
// evaluate (see the information row), so evaluate would no longer be saturated.
const PROBE = { connections: 10, overallRate: 100 };
// The probe counts as taken while evaluate was saturated only if evaluate kept this share of its rate alone.
const SATURATED_SHARE = 0.8;
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

/** One run in its own process (tests/load/autocannon-child.mjs): two runs at once must not share an event loop. */
function run(name: string, options: autocannon.Options): Promise<LoadRow> {
  const settings = { connections: CONNECTIONS, duration: DURATION_S, maxConnectionRequests: MAX_REQUESTS_PER_CONNECTION, ...options };
  console.log(`▶ ${name}: ${settings.connections} connections${settings.overallRate ? ` at ${settings.overallRate} requests/s in all` : ''} for ${DURATION_S} s`);
  return new Promise((resolve, reject) => {
    execFile(process.execPath, ['tests/load/autocannon-child.mjs', JSON.stringify(settings)], { maxBuffer: 256 * 2 ** 20 }, (error, stdout) => {
      if (error) return reject(error);
      const outcome = JSON.parse(stdout) as { latencies: number[]; seconds: number; errors: number; non2xx: number };
      // autocannon counts a time-out among its errors too: adding its time-outs would count them twice.
      resolve(loadRow(name, outcome.latencies, outcome.seconds, { errors: outcome.errors, non2xx: outcome.non2xx }));
    });
  });
}

const app = await startApp();
try {
  const cookie = await designerCookie(app.databasePath);
  console.log(`Serving ${app.baseUrl}; signed in as the demo designer.`);
  // The Harrowfield demo case (two events, with and without the scheme), without crest sizing: one design check.
  const { sizing: _sizing, ...oneCheck } = JSON.parse(readFileSync('db/seeds/cases/wendle-harrowfield-broad-crested.json', 'utf8'));
  const healthRun = { url: `${app.baseUrl}/api/health` };
  const evaluateRun = { url: `${app.baseUrl}/api/evaluate`, method: 'POST' as const, headers: { cookie, 'content-type': 'application/json', origin: app.baseUrl }, body: JSON.stringify(oneCheck) };
  const health = await run('GET /api/health', healthRun);
  const schemes = await run('GET /api/schemes', { url: `${app.baseUrl}/api/schemes`, headers: { cookie } });
  const evaluate = await run('POST /api/evaluate', evaluateRun);
  const [evaluateBusy, healthBusy] = await Promise.all([
    run('POST /api/evaluate (with the probe below)', evaluateRun),
    run(`GET /api/health, ${PROBE.overallRate} requests/s, while evaluate is saturated`, { ...healthRun, ...PROBE }),
  ]);
  const rows = [health, schemes, evaluate, evaluateBusy, healthBusy];
  const crowded = process.env.LOAD_CROWDED === '1'
    ? await Promise.all([run('(information) POST /api/evaluate beside 50 health clients', evaluateRun), run('(information) GET /api/health, 50 clients beside 50 evaluate clients', healthRun)])
    : [];

  const share = (row: LoadRow) => `${row.requestsPerSecond} req/s = ${Math.round((100 * row.requestsPerSecond) / health.requestsPerSecond)} % of health's ${health.requestsPerSecond}`;
  const failures = rows.reduce((n, r) => n + r.errors + r.non2xx, 0);
  rows.push(...crowded);
  const probeShortfall = healthBusy.requests < 0.9 * PROBE.overallRate * DURATION_S;
  const targets = [
    check('POST /api/evaluate ≥ 25 % of GET /api/health throughput', share(evaluate), evaluate.requestsPerSecond >= 0.25 * health.requestsPerSecond),
    check('GET /api/schemes ≥ 50 % of GET /api/health throughput', share(schemes), schemes.requestsPerSecond >= 0.5 * health.requestsPerSecond),
    check(
      'GET /api/health p99 ≤ 100 ms while evaluate is saturated',
      `p99 ${healthBusy.p99Ms} ms (p95 ${healthBusy.p95Ms} ms), evaluate meanwhile at ${Math.round((100 * evaluateBusy.requestsPerSecond) / evaluate.requestsPerSecond)} % of its rate alone`,
      healthBusy.p99Ms <= 100 && evaluateBusy.requestsPerSecond >= SATURATED_SHARE * evaluate.requestsPerSecond,
    ),
    check('no errors, time-outs or non-2xx answers in any run', `${failures}`, failures === 0),
  ];
  const machine = `${os.cpus().length} × ${os.cpus()[0]?.model ?? 'CPU'}, ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}`;
  mkdirSync('tests/.artifacts', { recursive: true });
  writeFileSync('tests/.artifacts/load.json', JSON.stringify({ machine, connections: CONNECTIONS, durationSeconds: DURATION_S, rows, targets }, null, 2));
  console.log(`Load test on ${machine}: ${CONNECTIONS} connections, ${DURATION_S} s per run`);
  console.table(rows);
  console.table(targets);
  console.log(['For the README:', '| Endpoint | Requests/s | p50 | p95 | p99 | Errors |', '| --- | --- | --- | --- | --- | --- |', ...readmeTableRows(rows, health)].join('\n'));
  if (probeShortfall) console.log(`The probe made ${healthBusy.requests} requests of the ${PROBE.overallRate * DURATION_S} it asked for: its connections waited on slow answers.`);
  for (const t of targets) console.log(`${t.verdict === 'PASS' ? '✔ PASS  ' : '✖ MISSED'} ${t.target}: ${t.measured}`);
  if (targets.some((t) => t.verdict === 'MISSED')) process.exitCode = 1;
} finally {
  await closeSequelize();
  await app.stop();
}
