import { fieldIssuesFromZod } from '@/lib/http/zod-issues';
import type { FieldIssue } from '@/lib/http/app-errors';
import { type AuditFilter, auditFilterSchema } from '@/lib/validation/audit-filter-schema';

export type RawQuery = Record<string, string | string[] | undefined>;

export function rawQueryOf(params: URLSearchParams): RawQuery {
  const raw: Record<string, string | string[]> = {};
  for (const key of new Set(params.keys())) {
    const values = params.getAll(key);
    raw[key] = values.length === 1 ? values[0] : values;
  }
  return raw;
}

/** The filter from a query, or the fields at fault in words; a field given twice is a fault, not a guess. */
export function parseAuditFilter(raw: RawQuery): { ok: true; filter: AuditFilter } | { ok: false; issues: FieldIssue[] } {
  const repeated = Object.entries(raw).filter(([, v]) => Array.isArray(v)).map(([key]) => ({ path: key, message: 'Give this filter once only.' }));
  if (repeated.length) return { ok: false, issues: repeated };
  const parsed = auditFilterSchema.safeParse(raw);
  return parsed.success ? { ok: true, filter: parsed.data } : { ok: false, issues: fieldIssuesFromZod(parsed.error) };
}
