import 'server-only';
import { mkdir, readFile, readdir, rm } from 'node:fs/promises';
import path from 'node:path';
import { dataDirectory } from '@/lib/db/database-path';
import { writeDurably } from '@/lib/storage/write-durably';

// Certificates are stored by their id under the data directory, never under public/ and never by a user-given name.
// The database keeps the path relative to the data directory, so a moved or restored data folder still works.

export function certificateRelativePath(certificateId: string): string {
  if (!/^[0-9a-f-]{36}$/.test(certificateId)) throw new Error('A certificate id is a UUID.');
  return path.join('certificates', `${certificateId}.pdf`);
}

/** Written under a temporary name and renamed, so a `.pdf` in the folder is always a whole file. */
export async function writeCertificateFile(certificateId: string, pdf: Buffer): Promise<string> {
  const relative = certificateRelativePath(certificateId);
  await mkdir(dataDirectory('certificates'), { recursive: true });
  await writeDurably(dataDirectory(relative), pdf);
  return relative;
}

export function readCertificateFile(relative: string): Promise<Buffer> {
  return readFile(dataDirectory(relative));
}

export async function removeCertificateFile(relative: string): Promise<void> {
  await rm(dataDirectory(relative), { force: true });
}

/** The stored certificate files, as paths relative to the data directory. */
export async function listCertificateFiles(): Promise<string[]> {
  const names = await readdir(dataDirectory('certificates')).catch(() => [] as string[]);
  return names.filter((name) => name.endsWith('.pdf')).map((name) => path.join('certificates', name));
}
