import 'server-only';
import type { SessionUser } from '@/lib/auth/current-session';
import { textOfUpload } from '@/lib/uploads/sniff-upload';
import { parseParcelsCsv } from './parcels-csv';
import { requireSchemeLiaisonAccess } from './scheme-liaison-access';

const PREVIEW_ROWS = 500;

/** Checks a parcels CSV and returns its rows with line-numbered issues, for the upload preview; stores nothing. */
export async function previewParcelsCsv({ user, schemeId, bytes }: { user: SessionUser; schemeId: string; bytes: Buffer }) {
  await requireSchemeLiaisonAccess({ user, schemeId, manage: true });
  const parsed = parseParcelsCsv(textOfUpload(bytes, 'a parcels CSV file'));
  return { ok: parsed.ok, rowCount: parsed.rows.length, rows: parsed.rows.slice(0, PREVIEW_ROWS), issues: parsed.issues, truncated: parsed.rows.length > PREVIEW_ROWS };
}
export type ParcelsCsvPreview = Awaited<ReturnType<typeof previewParcelsCsv>>;
