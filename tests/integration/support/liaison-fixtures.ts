import { createHash, randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { ENGINE_VERSION } from '@/lib/hydraulics/version';
import { Revision, Scheme, database } from '@/lib/db';
import type { RevisionStatus } from '@/lib/db/models/revision';
import { parseCase } from '@/lib/validation/parse-case';

// Test data for the liaison side: a scheme and a revision made directly, as the wizard and the checker would leave them.

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

export const DEMO_PARCELS_CSV = path.resolve('db', 'seeds', 'parcels', 'harrowfield-parcels.csv');
export const demoParcelsCsv = (): Buffer => readFileSync(DEMO_PARCELS_CSV);

export function caseFileText(name = 'wendle-harrowfield-broad-crested.json'): string {
  return readFileSync(path.resolve('db', 'seeds', 'cases', name), 'utf8');
}

export async function createTestScheme(designerId: string): Promise<Scheme> {
  database();
  const id = randomUUID();
  return Scheme.create({ id, reference: `T-${id.slice(0, 8)}`, name: 'Harrowfield Mill weir renewal (test)', watercourse: 'River Wendle', site: 'Harrowfield Mill', description: null, designerId });
}

/**
 * A revision of the scheme from a demo case file. 'countersigned' stores the engine's results and the hashes as a
 * countersigning would (a checker other than the author is required); 'draft' stores no results unless asked.
 */
export async function createTestRevision(options: { schemeId: string; authorId: string; checkerId?: string; status: RevisionStatus; caseFile?: string; storeResults?: boolean }): Promise<Revision> {
  database();
  const inputsJson = caseFileText(options.caseFile);
  const parsed = parseCase(JSON.parse(inputsJson));
  if (!parsed.ok) throw new Error(`demo case does not parse: ${JSON.stringify(parsed.issues)}`);
  const store = options.status === 'countersigned' || options.storeResults === true;
  const resultsJson = store ? JSON.stringify(evaluateCase(parsed.value)) : null;
  const number = ((await Revision.max<number, Revision>('number', { where: { schemeId: options.schemeId } })) ?? 0) + 1;
  const certified = options.status === 'countersigned';
  const now = new Date().toISOString();
  return Revision.create({
    id: randomUUID(),
    schemeId: options.schemeId,
    number,
    status: options.status,
    wizardStep: 'results',
    inputsJson,
    resultsJson,
    inputsSha256: store ? sha256(inputsJson) : null,
    resultsSha256: resultsJson ? sha256(resultsJson) : null,
    revisionSha256: certified ? sha256(`${inputsJson}${resultsJson}`) : null,
    engineVersion: store ? ENGINE_VERSION : null,
    authorId: options.authorId,
    checkerId: options.checkerId ?? null,
    basedOnRevisionId: null,
    submittedAt: certified ? now : null,
    countersignedAt: certified ? now : null,
  });
}

/** A register of `count` invented holdings of 20 m frontage each along the Harrowfield Mill reach; without e-mail, their letters go by post. */
export function inventedHoldingsCsv(count: number, { withEmail = true } = {}): Buffer {
  const rows = Array.from({ length: count }, (_, i) => {
    const n = String(i + 1).padStart(3, '0');
    const from = 20 + i * 20;
    return `WH-${n},Wendle holding ${n},"${n} Mill Lane, Harrowfield, HF3 2WD",${withEmail ? `holding-${n}@harrowfield.test` : ''},${from},${from + 20},${i % 2 ? 'left' : 'right'},,grazing pasture`;
  });
  return Buffer.from(['parcel_reference,owner_name,postal_address,email,distance_from_m,distance_to_m,bank_side,ground_level_m,land_use', ...rows].join('\n'));
}
