import 'server-only';
import { randomBytes } from 'node:crypto';
import { open, rename, rm } from 'node:fs/promises';

/**
 * Writes the file under a temporary name, flushes it to disk and then renames it: a crash mid-write leaves a `.tmp`
 * file that the file sweep removes, never a truncated file under the final name that looks whole.
 */
export async function writeDurably(finalPath: string, bytes: Uint8Array): Promise<void> {
  const temporary = `${finalPath}.${process.pid}.${randomBytes(4).toString('hex')}.tmp`;
  const file = await open(temporary, 'wx');
  try {
    await file.writeFile(bytes);
    await file.sync();
  } catch (error) {
    await file.close();
    await rm(temporary, { force: true });
    throw error;
  }
  await file.close();
  await rename(temporary, finalPath);
}
