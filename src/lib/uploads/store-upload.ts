import 'server-only';
import { createHash, randomUUID } from 'node:crypto';
import { mkdir, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { Transaction } from 'sequelize';
import { Upload, database } from '@/lib/db';
import { dataDirectory } from '@/lib/db/database-path';
import type { UploadKind } from '@/lib/db/models/upload';

const EXTENSIONS: Record<UploadKind, string> = { 'survey-csv': 'csv', 'parcels-csv': 'csv', 'case-json': 'json', 'certificate-pdf': 'pdf' };

export interface UploadMeta {
  kind: UploadKind;
  originalName: string;
  mediaType: string;
  schemeId: string | null;
  uploadedBy: string;
}

/** Folder of the stored files, beside the database (never under public/). */
export function uploadsDirectory(): string {
  return dataDirectory('uploads');
}

/**
 * Stores an upload: the bytes under a random name in the uploads folder (the user's file name is only a label),
 * and its row when `work` calls `record()` (after it has made the scheme the row points to), all in one
 * transaction. If the transaction fails the file is removed, so nothing is left behind.
 */
export async function withStoredUpload<T>(bytes: Buffer, meta: UploadMeta, work: (transaction: Transaction, record: () => Promise<Upload>) => Promise<T>): Promise<T> {
  const sequelize = database();
  const storedName = `${randomUUID()}.${EXTENSIONS[meta.kind]}`;
  const file = path.join(/*turbopackIgnore: true*/ uploadsDirectory(), storedName);
  await mkdir(uploadsDirectory(), { recursive: true });
  await writeFile(file, bytes, { flag: 'wx' });
  try {
    const sha256 = createHash('sha256').update(bytes).digest('hex');
    return await sequelize.transaction((transaction) => work(transaction, () => Upload.create({ id: randomUUID(), ...meta, storedName, sizeBytes: bytes.byteLength, sha256 }, { transaction })));
  } catch (error) {
    await rm(file, { force: true });
    throw error;
  }
}
