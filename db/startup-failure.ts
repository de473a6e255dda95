// A failure at start (unwritable folder, full disk, locked file) as one plain sentence, not a stack trace.
export function explainStartupFailure(error: unknown, file: string): string {
  const text = error instanceof Error ? `${error.message} ${(error as { parent?: Error }).parent?.message ?? ''}` : String(error);
  if (/SQLITE_CANTOPEN|EACCES|EPERM|unable to open/i.test(text)) return `Cannot open the database at ${file}: the folder is missing or not writable. Set DATABASE_PATH to a writable location. (${text.trim()})`;
  if (/SQLITE_FULL|ENOSPC|disk is full/i.test(text)) return `Cannot write the database at ${file}: the disk is full. Free some space and start again. (${text.trim()})`;
  if (/SQLITE_BUSY|database is locked/i.test(text)) return `The database at ${file} is locked by another process. Stop it and start again. (${text.trim()})`;
  if (/SQLITE_IOERR|EFBIG|disk I\/O error/i.test(text)) return `Cannot write the database at ${file}: the operating system refused the write (a file-size limit, a failing disk, or a network folder SQLite cannot lock). (${text.trim()})`;
  if (/SQLITE_READONLY|readonly/i.test(text)) return `The database at ${file} is read-only. Make it writable or set DATABASE_PATH elsewhere. (${text.trim()})`;
  return `Could not prepare the database at ${file}: ${text.trim()}`;
}
