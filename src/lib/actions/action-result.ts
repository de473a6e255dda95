import type { FieldIssue } from '@/lib/http/app-errors';

/** What every server action returns to the browser: data, or a status with a message and field-level issues. */
export type ActionResult<T> = { ok: true; data: T } | { ok: false; status: number; error: string; issues: FieldIssue[] };
