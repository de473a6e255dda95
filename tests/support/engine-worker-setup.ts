// vitest's global set-up: bundles the engine worker from the current sources once per run, to the path the
// integration project passes to the portal in SILLMARK_ENGINE_WORKER (see tests/vitest.config.ts).
import { fileURLToPath } from 'node:url';
// @ts-expect-error -- plain ESM helper shared with `npm run build`
import { buildEngineWorker } from '../../src/cli/build-engine-worker.mjs';

const ENGINE_WORKER_FOR_TESTS = fileURLToPath(new URL('../.artifacts/engine-worker.mjs', import.meta.url));

export default function setup(): void {
  buildEngineWorker({ outfile: ENGINE_WORKER_FOR_TESTS });
}
