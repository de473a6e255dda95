import 'server-only';
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { dataDirectory } from '@/lib/db/database-path';

// Letter PDFs live beside the database, named by the letter's id only (never by anything a user typed).

export function letterPdfPath(letterId: string): string {
  if (!/^[0-9a-f-]{36}$/.test(letterId)) throw new Error('A letter id is a UUID.');
  return path.join(dataDirectory('letters'), `${letterId}.pdf`);
}

export async function writeLetterPdf(letterId: string, pdf: Buffer): Promise<string> {
  const file = letterPdfPath(letterId);
  await mkdir(path.dirname(file), { recursive: true });
  await writeFile(file, pdf, { flag: 'wx' });
  return file;
}

export function readLetterPdf(file: string): Promise<Buffer> {
  return readFile(file);
}
