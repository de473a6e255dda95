// `npm start`: migrate, seed the demo on an empty database, build when needed, then serve on PORT (default 3000).
import { spawn } from 'node:child_process';
import { buildIfNeeded } from './build-if-needed.mjs';
import { TSX, runStep } from './run-step.mjs';

runStep('Migrating the database', 'npx', [...TSX, 'db/migrate.ts']);
runStep('Seeding the demo scenario if the database is empty', 'npx', [...TSX, 'db/seed.ts']);
runStep('Removing stored files that no record refers to', 'npx', [...TSX, 'db/sweep-files.ts']);
buildIfNeeded();
const port = process.env.PORT ?? '3000';
if (!process.env.PUBLIC_URL) {
  process.env.PUBLIC_URL = `http://localhost:${port}`;
  console.log(`\nPUBLIC_URL is not set, so links in e-mails, certificates and QR codes will point at ${process.env.PUBLIC_URL},`);
  console.log('and only pages opened at that address may send changes. Set PUBLIC_URL to the address people use.');
}
console.log(`\n▶ Serving Sillmark at ${process.env.PUBLIC_URL}`);
const server = spawn('node', ['src/cli/serve.mjs'], { stdio: 'inherit', env: { ...process.env, PORT: port, NEXT_TELEMETRY_DISABLED: '1' } });
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => server.kill(signal));
server.on('exit', (code) => process.exit(code ?? 0));
