import path from 'node:path';

/** The SQLite file every part of Sillmark shares (Sequelize, Lucia's adapter, the CLI). */
export function databasePath(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.env.DATABASE_PATH ?? path.join('db', 'data', 'sillmark.sqlite'));
}

/** Files the portal keeps beside its database: uploads, certificates, letters, mail. Never under public/. */
export function dataDirectory(...parts: string[]): string {
  return path.join(/*turbopackIgnore: true*/ path.dirname(databasePath()), ...parts);
}
