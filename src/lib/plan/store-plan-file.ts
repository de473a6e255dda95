import 'server-only';
import { createHash, randomUUID } from 'node:crypto';
import { mkdir, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { dataDirectory } from '@/lib/db/database-path';

/** Folder of the uploaded plan files, beside the database (never under public/). */
export function plansDirectory(): string {
  return dataDirectory('plans');
}

/**
 * Writes the plan file under a random name of ours before the transaction that records it, and removes it again if
 * that transaction fails, so nothing is left behind (a server killed in between leaves a file the sweep removes).
 */
export async function withStoredPlanFile<T>(bytes: Buffer, extension: 'geojson' | 'csv', work: (file: { storedName: string; sha256: string }) => Promise<T>): Promise<T> {
  const storedName = `${randomUUID()}.${extension}`;
  const file = path.join(/*turbopackIgnore: true*/ plansDirectory(), storedName);
  await mkdir(plansDirectory(), { recursive: true });
  await writeFile(file, bytes, { flag: 'wx' });
  try {
    return await work({ storedName, sha256: createHash('sha256').update(bytes).digest('hex') });
  } catch (error) {
    await rm(file, { force: true });
    throw error;
  }
}
