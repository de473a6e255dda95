// `npm start`: migrate, seed the demo on an empty database, build when needed, then serve on PORT (default 3000).
import { spawn } from 'node:child_process';
import { buildIfNeeded } from './build-if-needed.mjs';
import { TSX, runStep } from './run-step.mjs';

runStep('Migrating the database', 'npx', [...TSX, 'db/migrate.ts']);
runStep('Seeding the demo scenario if the database is empty', 'npx', [...TSX, 'db/seed.ts']);
runStep('Removing stored files that no record refers to', 'npx', [...TSX, 'db/sweep-files.ts']);
buildIfNeeded();
const port = process.env.PORT ?? '3000';
console.log(`\n▶ Serving Sillmark on http://localhost:${port}`);
const server = spawn('npx', ['next', 'start', '-p', port], { stdio: 'inherit', env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1' } });
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code) => process.exit(code ?? 0));
