import { expect } from 'vitest';
import { relatedPaths } from '../../support/hostile-json';
import { databaseDigest } from './database-digest';

export interface Refusal {
  status: number;
  issues?: unknown;
  error?: unknown;
}

/** A 400 (or another refusal among `statuses`) whose issues each have a path and a message, one naming `field` if given. */
export function expectRefusal(refusal: Refusal, options: { statuses?: number[]; field?: string; label: string }): void {
  const statuses = options.statuses ?? [400];
  expect(statuses, `${options.label}: status ${refusal.status} (${JSON.stringify(refusal).slice(0, 300)})`).toContain(refusal.status);
  expect(typeof refusal.error === 'string' && refusal.error.length > 0, `${options.label}: an error message`).toBe(true);
  if (refusal.status !== 400) return;
  const issues = refusal.issues as { path: unknown; message: unknown }[];
  expect(Array.isArray(issues) && issues.length > 0, `${options.label}: a list of issues`).toBe(true);
  for (const issue of issues) {
    expect(typeof issue.path, `${options.label}: issue path`).toBe('string');
    expect(typeof issue.message === 'string' && issue.message.length > 0, `${options.label}: issue message`).toBe(true);
  }
  if (options.field !== undefined) {
    const field = options.field;
    expect(issues.some((i) => relatedPaths(String(i.path), field)), `${options.label}: an issue naming ${field}, got ${JSON.stringify(issues).slice(0, 300)}`).toBe(true);
  }
}

/** A preview's answer to a bad file: not ok, with each problem's line and message. */
export function expectPreviewIssues(answer: Refusal & { ok?: unknown }, label: string): void {
  expect(answer.ok, `${label}: a preview of a bad file is not ok`).toBe(false);
  const issues = answer.issues as { line: unknown; message: unknown }[];
  expect(Array.isArray(issues) && issues.length > 0, `${label}: the problems are listed`).toBe(true);
  for (const issue of issues) expect(typeof issue.line === 'number' && typeof issue.message === 'string' && issue.message.length > 0, `${label}: line and message`).toBe(true);
}

/** Runs one hostile call and proves that it changed no row of any table and polluted no prototype. */
export async function withoutChange<T>(call: () => Promise<T>): Promise<T> {
  const before = await databaseDigest();
  const result = await call();
  expect(await databaseDigest(), 'the database changed').toBe(before);
  expect(({} as Record<string, unknown>).polluted, 'Object.prototype was polluted').toBeUndefined();
  return result;
}

export async function refusalOf(response: Response): Promise<Refusal> {
  const text = await response.text();
  try {
    return { status: response.status, ...(JSON.parse(text) as object) };
  } catch {
    return { status: response.status, error: `(not JSON) ${text.slice(0, 200)}` };
  }
}
