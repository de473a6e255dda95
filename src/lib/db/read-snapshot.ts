import 'server-only';
import { Transaction } from 'sequelize';
import { database } from './index';

/**
 * Runs reads in one DEFERRED transaction: a consistent view of the database (a WAL snapshot) without the write lock
 * that the portal's default IMMEDIATE transactions take at BEGIN, so writers elsewhere are not held up meanwhile.
 */
export function readSnapshot<T>(read: (transaction: Transaction) => Promise<T>): Promise<T> {
  return database().transaction({ type: Transaction.TYPES.DEFERRED }, read);
}
