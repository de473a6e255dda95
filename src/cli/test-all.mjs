// `npm test`: everything, in order of cost. Load tests and benchmarks have their own commands.
import { ensureSystemPackages } from './system-requirements.mjs';
import { runStep } from './run-step.mjs';

ensureSystemPackages();
runStep('Typecheck (tsc)', 'npx', ['tsc', '--noEmit', '-p', 'tsconfig.json']);
runStep('Unit and integration tests (vitest)', 'npx', ['vitest', 'run', '--config', 'tests/vitest.config.ts', '--project', 'unit', '--project', 'integration']);
runStep('End-to-end tests in Chromium (vitest + playwright-core)', 'npx', ['vitest', 'run', '--config', 'tests/vitest.config.ts', '--project', 'e2e']);
console.log('\n✔ All test stages passed.');
