import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { database } from '@/lib/db';
import { migrator } from '@/lib/db/migrator';
import { useTestDatabase } from './support/test-database';

// Migration 0006 rebuilds the letters tables; going down and up again keeps every table's foreign keys intact.
let db: Awaited<ReturnType<typeof useTestDatabase>>;
beforeAll(async () => (db = await useTestDatabase()));
afterAll(async () => db.cleanup());

const columns = async (table: string) => ((await database().query(`PRAGMA table_info(${table})`))[0] as { name: string }[]).map((c) => c.name);

describe('migration 0006 (letter casework)', () => {
  it('goes down to 0005 and up again, leaving the schema as before and no foreign key broken', async () => {
    const before = await columns('letters');
    expect(before).toEqual(expect.arrayContaining(['response_due_on', 'posted_on', 'document_json']));
    await migrator().down({ to: '0006-letter-casework' });
    expect(await columns('letters')).not.toContain('response_due_on');
    expect(await columns('letter_responses')).not.toContain('response_type');
    await migrator().up();
    expect(await columns('letters')).toEqual(before);
    expect((await database().query('PRAGMA foreign_key_check'))[0]).toEqual([]);
  });
});
