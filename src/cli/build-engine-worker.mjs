// Bundles the engine's worker-thread entry (src/lib/engine-pool/engine-worker.ts) into one plain ES module (see
// bundle-worker.mjs). `npm run build` and `npm start` run it after `next build` (which empties the build folder);
// vitest's global set-up runs it for the integration tests.
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { bundleWorker } from './bundle-worker.mjs';

const ENTRY = 'src/lib/engine-pool/engine-worker.ts';

/** Where the portal looks for the worker: SILLMARK_ENGINE_WORKER, or engine-worker.mjs in the Next build folder. */
export function engineWorkerPath(env = process.env, cwd = process.cwd()) {
  return env.SILLMARK_ENGINE_WORKER || path.join(cwd, env.NEXT_DIST_DIR ?? '.next', 'engine-worker.mjs');
}

export function buildEngineWorker({ outfile = engineWorkerPath(), cwd = process.cwd() } = {}) {
  bundleWorker({ entry: ENTRY, outfile, cwd });
  return outfile;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  console.log(`Engine worker bundled to ${path.relative(process.cwd(), buildEngineWorker())}`);
}
