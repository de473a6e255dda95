import 'server-only';
import { randomUUID } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { OutboundMessage, database } from '@/lib/db';
import { SENDING_LEASE_MS } from './retry-schedule';

/**
 * Takes messages that are due (pending and past their next attempt, or "sending" under a lease that ran out because
 * their sender died) for this deliverer alone: one UPDATE in an IMMEDIATE transaction, so two deliverers, in one
 * process or two, never claim the same message. `ids` limits the claim to the messages a request just committed.
 */
export async function claimOutboundMail({ now, limit, ids }: { now: number; limit: number; ids?: string[] }): Promise<{ token: string; messages: OutboundMessage[] }> {
  const sequelize = database();
  const token = randomUUID();
  if (ids && ids.length === 0) return { token, messages: [] };
  const onlyThese = ids ? `AND id IN (${ids.map(() => '?').join(', ')})` : '';
  const messages = await sequelize.transaction(async (transaction) => {
    await sequelize.query(
      `UPDATE outbound_messages SET status = 'sending', claim_token = ?, lease_until = ?, attempts = attempts + 1
       WHERE id IN (SELECT id FROM outbound_messages
         WHERE ((status = 'pending' AND next_attempt_at <= ?) OR (status = 'sending' AND lease_until <= ?)) ${onlyThese}
         ORDER BY next_attempt_at, created_at LIMIT ?)`,
      { replacements: [token, now + SENDING_LEASE_MS, now, now, ...(ids ?? []), limit], type: QueryTypes.UPDATE, transaction },
    );
    return OutboundMessage.findAll({ where: { claimToken: token, status: 'sending' }, order: [['createdAt', 'ASC']], transaction });
  });
  return { token, messages };
}
