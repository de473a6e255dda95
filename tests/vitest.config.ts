import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// This file lives in tests/; the project root (one folder up) is vitest's root, so every path below is from there.
const root = fileURLToPath(new URL('..', import.meta.url));
// The integration tests run the engine and the PDFs on worker threads, from bundles that their global set-up builds;
// the benchmarks (run under the unit project) make certificates and letters through the same PDF pool.
const workers = ['tests/support/worker-bundles-setup.ts'];
const workerEnv = {
  SILLMARK_ENGINE_WORKER: fileURLToPath(new URL('./.artifacts/engine-worker.mjs', import.meta.url)),
  SILLMARK_PDF_WORKER: fileURLToPath(new URL('./.artifacts/pdf-worker.mjs', import.meta.url)),
};
const alias = {
  '@': fileURLToPath(new URL('../src', import.meta.url)),
  'server-only': fileURLToPath(new URL('./support/server-only-stub.ts', import.meta.url)),
};

export default defineConfig({
  root,
  resolve: { alias },
  test: {
    projects: [
      // Property tests run hundreds of cases; on a two-core CI machine shared with the integration project, 5 s is too tight.
      { root, resolve: { alias }, test: { name: 'unit', include: ['tests/unit/**/*.test.ts', 'tests/unit/**/*.test.tsx'], globalSetup: workers, env: workerEnv, environment: 'node', testTimeout: 30_000 } },
      {
        root,
        resolve: { alias },
        test: { name: 'integration', include: ['tests/integration/**/*.test.ts'], globalSetup: workers, env: workerEnv, setupFiles: ['tests/integration/support/session-double.ts'], environment: 'node', pool: 'forks', testTimeout: 60_000, hookTimeout: 120_000 },
      },
      {
        root,
        resolve: { alias },
        test: { name: 'e2e', include: ['tests/e2e/**/*.test.ts'], environment: 'node', fileParallelism: false, testTimeout: 120_000, hookTimeout: 300_000 },
      },
    ],
    benchmark: { include: ['tests/bench/**/*.bench.ts'] },
  },
});
