import { createHash, randomUUID } from 'node:crypto';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { recordAuditEvent } from '@/lib/audit/record-audit-event';
import { hashPassword } from '@/lib/auth/password';
import { ParcelPlan, Revision, Scheme, User, database } from '@/lib/db';
import { parsePlanGeoJson } from '@/lib/plan/outlines-geojson';
import { plansDirectory } from '@/lib/plan/store-plan-file';
import { DEMO_USERS } from './demo-users';

const DEMO_CASE = path.resolve('db', 'seeds', 'cases', 'wendle-harrowfield-broad-crested.json');
const ROUTED_DEMO_CASE = path.resolve('db', 'seeds', 'cases', 'wendle-harrowfield-reservoir-spillway.json');
const DEMO_PLAN = path.resolve('db', 'seeds', 'parcels', 'harrowfield-plan.geojson');

/** The invented plan of the Harrowfield parcels, its file copied to the plans folder as an upload would be. */
async function demoPlan(schemeId: string) {
  const bytes = await readFile(DEMO_PLAN).catch(() => null);
  const parsed = bytes ? parsePlanGeoJson(bytes.toString('utf8')) : null;
  if (!bytes || !parsed?.ok) return null;
  const storedName = `${randomUUID()}.geojson`;
  await mkdir(plansDirectory(), { recursive: true });
  await writeFile(path.join(plansDirectory(), storedName), bytes);
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  return { id: randomUUID(), schemeId, version: 1, coordinateSystem: 'Harrowfield site grid (invented, metres)', geometryJson: JSON.stringify(parsed.plan), sourceFormat: 'geojson' as const, originalName: path.basename(DEMO_PLAN), storedName, sha256, createdBy: null };
}

/**
 * The demo: five users, one per role, the Harrowfield Mill weir scheme and the Harrowfield Upper Pond spillway scheme
 * (a flood routed through a reservoir), each with a draft revision. Idempotent.
 */
export async function seedDemoScenario() {
  const sequelize = database();
  if ((await User.count()) > 0) return { seeded: false, users: [] };
  const hashes = await Promise.all(DEMO_USERS.map((u) => hashPassword(u.password)));
  const inputsJson = await readFile(DEMO_CASE, 'utf8').catch(() => null);
  const routedInputsJson = await readFile(ROUTED_DEMO_CASE, 'utf8').catch(() => null);
  const schemeId = randomUUID();
  const plan = await demoPlan(schemeId);
  await sequelize.transaction(async (transaction) => {
    const ids = new Map<string, string>();
    for (const [i, u] of DEMO_USERS.entries()) {
      const id = randomUUID();
      ids.set(u.role, id);
      await User.create({ id, email: u.email, name: u.name, role: u.role, passwordHash: hashes[i], status: 'active', organisation: u.organisation }, { transaction });
    }
    const designerId = ids.get('designer')!;
    await Scheme.create(
      {
        id: schemeId,
        reference: 'SM-0001',
        name: 'Harrowfield Mill weir renewal',
        watercourse: 'River Wendle',
        site: 'Harrowfield Mill, Wendle Valley',
        description: 'Replacement of the derelict mill weir by a broad-crested weir to hold the mill pond level (demo scenario, invented).',
        designerId,
      },
      { transaction },
    );
    if (inputsJson) {
      await Revision.create(
        { id: randomUUID(), schemeId, number: 1, wizardStep: 'results', inputsJson, resultsJson: null, inputsSha256: null, resultsSha256: null, revisionSha256: null, engineVersion: null, authorId: designerId, checkerId: null, basedOnRevisionId: null, submittedAt: null, countersignedAt: null },
        { transaction },
      );
    }
    if (routedInputsJson) {
      const pondId = randomUUID();
      await Scheme.create(
        {
          id: pondId,
          reference: 'SM-0002',
          name: 'Harrowfield Upper Pond spillway',
          watercourse: 'River Wendle',
          site: 'Upper Pond dam, above Harrowfield',
          description: 'A flood-storage dam with an ogee spillway on the Wendle above Harrowfield: floods routed through the pond (demo scenario, invented).',
          designerId,
        },
        { transaction },
      );
      await Revision.create(
        { id: randomUUID(), schemeId: pondId, number: 1, wizardStep: 'results', inputsJson: routedInputsJson, resultsJson: null, inputsSha256: null, resultsSha256: null, revisionSha256: null, engineVersion: null, authorId: designerId, checkerId: null, basedOnRevisionId: null, submittedAt: null, countersignedAt: null },
        { transaction },
      );
    }
    if (plan) await ParcelPlan.create(plan, { transaction });
    await recordAuditEvent({ actorId: null, action: 'demo.seeded', entityType: 'scheme', entityId: schemeId, schemeId, details: { users: DEMO_USERS.map((u) => u.email) } }, transaction);
  });
  return { seeded: true, users: DEMO_USERS.map(({ role, email, password }) => ({ role, email, password })) };
}
