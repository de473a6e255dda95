// Builds the production bundle only when the sources changed since the last build (a content hash in .next/).
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { buildEngineWorker, engineWorkerPath } from './build-engine-worker.mjs';
import { buildPdfWorker, pdfWorkerPath } from './build-pdf-worker.mjs';

const INPUTS = ['src', 'fonts', 'public', 'next.config.mjs', 'tailwind.config.ts', 'tsconfig.json', 'package-lock.json', '.postcssrc.json'];
const DIST = process.env.NEXT_DIST_DIR ?? '.next';
const STAMP = path.join(DIST, 'sillmark-build-stamp');

function* files(entry) {
  if (!existsSync(entry)) return;
  if (statSync(entry).isDirectory()) for (const name of readdirSync(entry).sort()) yield* files(path.join(entry, name));
  else yield entry;
}

export function sourceHash() {
  const hash = createHash('sha256');
  for (const input of INPUTS) for (const file of files(input)) hash.update(file).update(readFileSync(file));
  return hash.digest('hex');
}

export function buildIfNeeded({ log = console.log } = {}) {
  const wanted = sourceHash();
  const built = existsSync(STAMP) && existsSync(path.join(DIST, 'BUILD_ID')) ? readFileSync(STAMP, 'utf8') : '';
  if (built === wanted) {
    if (!existsSync(engineWorkerPath())) buildEngineWorker();
    if (!existsSync(pdfWorkerPath())) buildPdfWorker();
    return log('Production build is up to date.');
  }
  log('Building the production bundle (next build)…');
  const result = spawnSync('npx', ['next', 'build'], { stdio: 'inherit', env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1' } });
  if (result.status !== 0) throw new Error('next build failed');
  buildEngineWorker();
  buildPdfWorker();
  writeFileSync(STAMP, wanted);
}
