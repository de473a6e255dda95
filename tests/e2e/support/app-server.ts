import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
// @ts-expect-error -- plain ESM helper shared with `npm start`
import { buildIfNeeded } from '../../../src/cli/build-if-needed.mjs';

const TSX = ['tsx', '--conditions=react-server', '--tsconfig', 'tsconfig.json'];

/** A loopback port nobody is listening on (for the app, or a test's own mail server). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

export interface RunningApp {
  baseUrl: string;
  databasePath: string;
  stop(): Promise<void>;
}

/** The production build served by src/cli/serve.mjs on a free loopback port, over its own migrated and seeded database. */
export async function startApp(): Promise<RunningApp> {
  const databasePath = path.join(mkdtempSync(path.join(tmpdir(), 'sillmark-e2e-')), 'sillmark.sqlite');
  const env = { ...process.env, DATABASE_PATH: databasePath, NEXT_TELEMETRY_DISABLED: '1' };
  for (const script of ['db/migrate.ts', 'db/seed.ts']) {
    const r = spawnSync('npx', [...TSX, script], { env, encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`${script} failed: ${r.stderr}`);
  }
  buildIfNeeded({ log: () => {} });
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  // Served as `npm start` serves it; PUBLIC_URL is the fixture's own origin, so links and the Origin check match it.
  const server: ChildProcess = spawn('node', ['src/cli/serve.mjs'], { env: { ...env, PORT: String(port), BIND_ADDRESS: '127.0.0.1', PUBLIC_URL: baseUrl }, stdio: ['ignore', 'pipe', 'pipe'], detached: true });
  let output = '';
  server.stdout?.on('data', (d) => (output += d));
  server.stderr?.on('data', (d) => (output += d));
  for (let i = 0; i < 120; i++) {
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) break;
    } catch {
      /* not up yet */
    }
    if (server.exitCode !== null) throw new Error(`the portal server exited: ${output}`);
    await new Promise((r) => setTimeout(r, 250));
  }
  return {
    baseUrl,
    databasePath,
    stop: async () => {
      if (server.pid) process.kill(-server.pid, 'SIGTERM');
      await new Promise((r) => setTimeout(r, 300));
    },
  };
}
