import 'server-only';
import { Op } from 'sequelize';
import { AuditEvent, database } from '@/lib/db';
import { GENESIS_HASH, auditEventHash } from './audit-hash';

export interface ChainBreak {
  /** The event number (its row id) where the chain first breaks. */
  number: number;
  at: string;
  problem: string;
}

export type ChainCheck = { intact: true; events: number } | { intact: false; events: number; firstBreak: ChainBreak };

const BATCH = 1000;

/**
 * Walks the whole trail in order and recomputes every hash. An edited row no longer matches its own hash; a removed
 * or inserted row leaves the next one pointing at a hash that is not the one before it.
 */
export async function verifyAuditChain(): Promise<ChainCheck> {
  database();
  let previousHash = GENESIS_HASH;
  let afterId = 0;
  let events = 0;
  let firstBreak: ChainBreak | null = null;
  for (;;) {
    const batch = await AuditEvent.findAll({ where: { id: { [Op.gt]: afterId } }, order: [['id', 'ASC']], limit: BATCH });
    for (const event of batch) {
      events += 1;
      if (!firstBreak) {
        if (event.previousHash !== previousHash) firstBreak = { number: event.id, at: event.at, problem: 'it does not follow on from the event before it: an event before it was removed, inserted or altered' };
        else if (auditEventHash(event) !== event.hash) firstBreak = { number: event.id, at: event.at, problem: 'its contents were altered after it was recorded: they no longer match its hash' };
      }
      previousHash = event.hash;
    }
    if (batch.length < BATCH) break;
    afterId = batch[batch.length - 1].id;
  }
  return firstBreak ? { intact: false, events, firstBreak } : { intact: true, events };
}
