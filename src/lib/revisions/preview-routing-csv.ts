import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { InvalidRequestError } from '@/lib/http/app-errors';
import { findEditableRevision } from '@/lib/schemes/scheme-access';
import { textOfUpload } from '@/lib/uploads/sniff-upload';
import type { CsvIssue } from '@/lib/validation/csv-records';
import { parseHydrographCsv } from '@/lib/validation/hydrograph-csv';
import { parseStorageCsv } from '@/lib/validation/storage-csv';
import { decodeDraft } from './draft-inputs';

export type RoutingCsvTable = 'hydrograph' | 'storage';

export type RoutingCsvPreview =
  | { table: 'hydrograph'; rows: { time: number; discharge: number }[] }
  | { table: 'storage'; kind: 'level-area'; rows: { level: number; area: number }[] }
  | { table: 'storage'; kind: 'level-volume'; rows: { level: number; volume: number }[] };

const WHAT: Record<RoutingCsvTable, string> = { hydrograph: 'a hydrograph CSV file', storage: 'a storage CSV file' };

function csvIssues(table: RoutingCsvTable, issues: CsvIssue[]) {
  return new InvalidRequestError(
    issues.map((i) => ({ path: i.line > 0 ? `line ${i.line}` : 'file', message: i.message })),
    `The ${table === 'hydrograph' ? 'hydrograph' : 'storage table'} has ${issues.length} problem${issues.length === 1 ? '' : 's'}; the table on the page is unchanged.`,
  );
}

/**
 * Reads a hydrograph or storage CSV for the reservoir step, in the draft's units, and returns its rows for the form
 * (the designer saves them with the step). Reading only: nothing is stored, so no audit entry is written.
 */
export async function previewRoutingCsv({ revisionId, table, bytes, user }: { revisionId: string; table: RoutingCsvTable; bytes: Buffer; user: SessionUser }): Promise<RoutingCsvPreview> {
  const { revision } = await findEditableRevision(user, revisionId);
  const units = decodeDraft(revision.inputsJson).units;
  const text = textOfUpload(bytes, WHAT[table]);
  if (table === 'hydrograph') {
    const parsed = parseHydrographCsv(text, units);
    if (!parsed.ok) throw csvIssues(table, parsed.issues);
    return { table, rows: parsed.points };
  }
  const parsed = parseStorageCsv(text, units);
  if (!parsed.ok) throw csvIssues(table, parsed.issues);
  return parsed.storage.kind === 'level-area' ? { table, kind: 'level-area', rows: parsed.storage.rows } : { table, kind: 'level-volume', rows: parsed.storage.rows };
}
