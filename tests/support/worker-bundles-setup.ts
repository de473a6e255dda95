// vitest's global set-up: bundles the engine and PDF workers from the current sources once per run, to the paths the
// projects pass to the portal in SILLMARK_ENGINE_WORKER and SILLMARK_PDF_WORKER (see tests/vitest.config.ts).
import { fileURLToPath } from 'node:url';
// @ts-expect-error -- plain ESM helper shared with `npm run build`
import { buildEngineWorker } from '../../src/cli/build-engine-worker.mjs';
// @ts-expect-error -- plain ESM helper shared with `npm run build`
import { buildPdfWorker } from '../../src/cli/build-pdf-worker.mjs';

export const ENGINE_WORKER_FOR_TESTS = fileURLToPath(new URL('../.artifacts/engine-worker.mjs', import.meta.url));
export const PDF_WORKER_FOR_TESTS = fileURLToPath(new URL('../.artifacts/pdf-worker.mjs', import.meta.url));

export default function setup(): void {
  buildEngineWorker({ outfile: ENGINE_WORKER_FOR_TESTS });
  buildPdfWorker({ outfile: PDF_WORKER_FOR_TESTS });
}
