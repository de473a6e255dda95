// Seeds the demo scenario when the database has no users yet. Run as `npm run db:seed` (and by `npm start`).
import { closeSequelize } from '@/lib/db';
import { seedDemoScenario } from './seeds/demo-scenario';

const result = await seedDemoScenario();
if (result.seeded) {
  console.log('Demo scenario seeded: the River Wendle at Harrowfield Mill. Demo sign-ins:');
  for (const u of result.users) console.log(`  ${u.role.padEnd(9)} ${u.email.padEnd(30)} password: ${u.password}`);
} else {
  console.log('Database already has users; demo scenario not seeded.');
}
await closeSequelize();
