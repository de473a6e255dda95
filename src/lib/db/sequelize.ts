import { Sequelize, Transaction } from 'sequelize';
import { databasePath } from './database-path';
import { sqliteDriver } from './sqlite-driver';

const cache = globalThis as unknown as { sillmarkSequelize?: Sequelize; sillmarkSequelizePath?: string };

function createSequelize(storage: string): Sequelize {
  return new Sequelize({
    dialect: 'sqlite',
    dialectModule: sqliteDriver,
    storage,
    logging: false,
    // IMMEDIATE takes the write lock at BEGIN, so two writers queue on the busy timeout instead of deadlocking on upgrade.
    transactionType: Transaction.TYPES.IMMEDIATE,
    define: { underscored: true, timestamps: false },
    // A busy database is retried, not lost: up to 30 tries over about fifteen seconds, with jitter so writers spread out.
    retry: { max: 30, match: [/SQLITE_BUSY/], backoffBase: 20, backoffExponent: 1.15, backoffJitter: 20 },
  });
}

/** One Sequelize per process (and per database file), kept on globalThis so dev reloads don't leak connections. */
export function getSequelize(): Sequelize {
  const storage = databasePath();
  if (!cache.sillmarkSequelize || cache.sillmarkSequelizePath !== storage) {
    cache.sillmarkSequelize = createSequelize(storage);
    cache.sillmarkSequelizePath = storage;
  }
  return cache.sillmarkSequelize;
}

export async function closeSequelize(): Promise<void> {
  await cache.sillmarkSequelize?.close();
  cache.sillmarkSequelize = undefined;
  cache.sillmarkSequelizePath = undefined;
}
