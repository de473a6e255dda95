import type { UploadKind } from '@/lib/db/models/upload';

// Largest file accepted for each kind. A surveyed reach of a few hundred sections is well under 1 MB of CSV.
export const UPLOAD_LIMIT_BYTES: Record<UploadKind, number> = {
  'survey-csv': 2 * 1024 * 1024,
  'parcels-csv': 2 * 1024 * 1024,
  'case-json': 1024 * 1024,
  'certificate-pdf': 10 * 1024 * 1024,
};

export function describeBytes(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
  if (bytes >= 1024) return `${Math.ceil(bytes / 1024)} KB`;
  return `${bytes} bytes`;
}

/**
 * A hydrograph or storage-table CSV, read for the reservoir step and never stored. Its rows are capped on their own
 * (MAX_HYDROGRAPH_POINTS, MAX_STORAGE_ROWS); this bounds the reading, with room for comments and wide number columns.
 */
export const ROUTING_CSV_LIMIT_BYTES = 1024 * 1024;
