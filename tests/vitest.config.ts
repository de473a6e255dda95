import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// This file lives in tests/; the project root (one folder up) is vitest's root, so every path below is from there.
const root = fileURLToPath(new URL('..', import.meta.url));
// The integration tests run the engine on worker threads, from a bundle that their global set-up builds.
const engineWorker = fileURLToPath(new URL('./.artifacts/engine-worker.mjs', import.meta.url));
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
      { root, resolve: { alias }, test: { name: 'unit', include: ['tests/unit/**/*.test.ts', 'tests/unit/**/*.test.tsx'], environment: 'node', testTimeout: 30_000 } },
      {
        root,
        resolve: { alias },
        test: { name: 'integration', include: ['tests/integration/**/*.test.ts'], globalSetup: ['tests/support/engine-worker-setup.ts'], env: { SILLMARK_ENGINE_WORKER: engineWorker }, setupFiles: ['tests/integration/support/session-double.ts'], environment: 'node', pool: 'forks', testTimeout: 60_000, hookTimeout: 120_000 },
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
