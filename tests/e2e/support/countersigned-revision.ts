import { createHash, randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import Database from 'better-sqlite3';
import { evaluateCase } from '@/lib/hydraulics/evaluate-case';
import { parseCase } from '@/lib/validation/parse-case';

const CASE = path.resolve('db', 'seeds', 'cases', 'wendle-harrowfield-broad-crested.json');
const sha256 = (b: string) => createHash('sha256').update(b).digest('hex');

/** The checker's countersigning belongs to another part of the portal: here the demo scheme gets a countersigned revision directly. */
export function addCountersignedRevision(databasePath: string): string {
  const db = new Database(databasePath);
  try {
    const scheme = db.prepare("SELECT id, designer_id FROM schemes WHERE reference = 'SM-0001'").get() as { id: string; designer_id: string };
    const checker = db.prepare("SELECT id FROM users WHERE role = 'checker' LIMIT 1").get() as { id: string };
    const inputsJson = readFileSync(CASE, 'utf8');
    const parsed = parseCase(JSON.parse(inputsJson));
    if (!parsed.ok) throw new Error('the demo case does not parse');
    const resultsJson = JSON.stringify(evaluateCase(parsed.value));
    const engineVersion = (JSON.parse(resultsJson) as { engineVersion: string }).engineVersion;
    const number = ((db.prepare('SELECT MAX(number) AS n FROM revisions WHERE scheme_id = ?').get(scheme.id) as { n: number | null }).n ?? 0) + 1;
    const now = new Date().toISOString();
    db.prepare(
      `INSERT INTO revisions (id, scheme_id, number, status, wizard_step, inputs_json, results_json, inputs_sha256, results_sha256, revision_sha256, engine_version, author_id, checker_id, submitted_at, countersigned_at, created_at, updated_at)
       VALUES (?, ?, ?, 'countersigned', 'results', ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
    ).run(randomUUID(), scheme.id, number, inputsJson, resultsJson, sha256(inputsJson), sha256(resultsJson), sha256(inputsJson + resultsJson), engineVersion, scheme.designer_id, checker.id, now, now, now, now);
    return scheme.id;
  } finally {
    db.close();
  }
}

/** Moves a letter's response deadline into the past, as if its 28 days had gone by. */
export function makeLetterOverdue(databasePath: string, parcelReference: string): void {
  const db = new Database(databasePath);
  try {
    db.prepare("UPDATE letters SET response_due_on = '2020-01-01' WHERE status IN ('sent', 'posted') AND parcel_id IN (SELECT id FROM parcels WHERE reference = ?)").run(parcelReference);
  } finally {
    db.close();
  }
}
