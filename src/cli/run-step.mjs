import { spawnSync } from 'node:child_process';

/** Runs one command with inherited output; exits the process with its code when it fails. */
export function runStep(label, command, args, env = {}) {
  console.log(`\n▶ ${label}`);
  const result = spawnSync(command, args, { stdio: 'inherit', env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1', ...env } });
  if (result.status !== 0) {
    console.error(`✖ ${label} failed (exit ${result.status ?? result.signal}).`);
    process.exit(result.status || 1);
  }
}

export const TSX = ['tsx', '--conditions=react-server', '--tsconfig', 'tsconfig.json'];
