import 'server-only';
import { readdir, rm, stat } from 'node:fs/promises';
import path from 'node:path';
import { Certificate, Letter, OutboxMessage, ParcelPlan, Upload, database } from '@/lib/db';
import { dataDirectory } from '@/lib/db/database-path';

// A stored file is written before the transaction that records it; a server killed in between leaves a file no
// row points to. Such files are never served (every download goes through its row), but letters carry landowners'
// names and addresses, so they are not kept either. Files younger than the grace period are left alone: they may
// belong to a transaction that is still running in another process.

export const SWEEP_GRACE_MS = 60 * 60 * 1000;

type Folder = 'letters' | 'certificates' | 'uploads' | 'outbox' | 'plans';

const referencedNames: Record<Folder, () => Promise<string[]>> = {
  letters: async () => (await Letter.findAll({ attributes: ['pdfPath'] })).flatMap((l) => (l.pdfPath ? [path.basename(l.pdfPath)] : [])),
  certificates: async () => (await Certificate.findAll({ attributes: ['pdfPath'] })).map((c) => path.basename(c.pdfPath)),
  uploads: async () => (await Upload.findAll({ attributes: ['storedName'] })).map((u) => u.storedName),
  outbox: async () => (await OutboxMessage.findAll({ attributes: ['rawPath'] })).map((m) => path.basename(m.rawPath)),
  plans: async () => (await ParcelPlan.findAll({ attributes: ['storedName'] })).map((p) => p.storedName),
};

export type SweepReport = Record<Folder, string[]>;

/** Removes the files in the data folders that no row refers to and that are older than `graceMs`; returns what it removed. */
export async function sweepUnreferencedFiles({ now = Date.now(), graceMs = SWEEP_GRACE_MS }: { now?: number; graceMs?: number } = {}): Promise<SweepReport> {
  database();
  const report: SweepReport = { letters: [], certificates: [], uploads: [], outbox: [], plans: [] };
  for (const folder of Object.keys(referencedNames) as Folder[]) {
    const directory = dataDirectory(folder);
    const names = await readdir(directory).catch(() => [] as string[]);
    if (names.length === 0) continue;
    const referenced = new Set(await referencedNames[folder]());
    for (const name of names) {
      if (referenced.has(name)) continue;
      const file = path.join(directory, name);
      const info = await stat(file).catch(() => null);
      if (!info?.isFile() || now - info.mtimeMs < graceMs) continue;
      await rm(file, { force: true });
      report[folder].push(name);
    }
  }
  return report;
}
