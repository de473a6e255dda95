import { spawn } from 'node:child_process';
import path from 'node:path';
import type { FaultJob } from './fault-job';

export interface FaultRun {
  /** The point the child stopped at before it was killed, or null when it ran to the end. */
  stoppedAt: string | null;
  signal: NodeJS.Signals | null;
  result: unknown;
  error: { name: string; message: string; status: number | null } | null;
  output: string;
}

const CHILD = path.resolve('tests', 'integration', 'support', 'fault-child.ts');
// Only a guard against a child that hangs where it should not; no test asserts on time.
const HANG_GUARD_MS = 90_000;

/**
 * Runs the job in a child process over the given database file, as a separate server process would. When the child
 * reports that it stopped at its chosen point, it is killed with SIGKILL there: no clean-up code of ours runs.
 */
export function runInChildProcess(job: FaultJob, databaseFile: string): Promise<FaultRun> {
  const env: NodeJS.ProcessEnv = { ...process.env, DATABASE_PATH: databaseFile, NODE_ENV: 'test', TSX_TSCONFIG_PATH: 'tsconfig.json' };
  delete env.SMTP_URL;
  delete env.SMTP_PORT;
  // Node itself with tsx's loader, not the tsx command: that runs the script in a grandchild, which SIGKILL would miss.
  const child = spawn(process.execPath, ['--conditions=react-server', '--import', 'tsx', CHILD, JSON.stringify(job)], { env, stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  let stoppedAt: string | null = null;
  const guard = setTimeout(() => child.kill('SIGKILL'), HANG_GUARD_MS);
  child.stdout.on('data', (chunk: Buffer) => {
    output += chunk.toString();
    const stopped = /^STOPPED (.+)$/m.exec(output);
    if (stopped && stoppedAt === null) {
      stoppedAt = stopped[1];
      child.kill('SIGKILL');
    }
  });
  child.stderr.on('data', (chunk: Buffer) => (output += chunk.toString()));
  return new Promise((resolve, reject) => {
    child.once('error', reject);
    child.once('exit', (_code, signal) => {
      clearTimeout(guard);
      const line = (tag: string) => new RegExp(`^${tag} (.+)$`, 'm').exec(output)?.[1];
      const result = line('RESULT');
      const error = line('ERROR');
      resolve({ stoppedAt, signal, result: result ? JSON.parse(result) : null, error: error ? JSON.parse(error) : null, output });
    });
  });
}
