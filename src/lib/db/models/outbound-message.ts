import { Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { idColumn, integerColumn, textColumn } from './columns';

export type OutboundStatus = 'pending' | 'sending' | 'delivered' | 'failed';

/** An e-mail the portal owes someone, written with the decision it reports and delivered after it commits. */
export class OutboundMessage extends Model<InferAttributes<OutboundMessage>, InferCreationAttributes<OutboundMessage>> {
  declare id: string;
  declare messageId: string;
  declare purpose: string;
  declare recipient: string;
  declare subject: string;
  declare bodyText: string;
  declare status: OutboundStatus;
  declare attempts: number;
  declare nextAttemptAt: number;
  declare leaseUntil: number | null;
  declare claimToken: string | null;
  declare lastError: string | null;
  declare createdAt: string;
  declare deliveredAt: string | null;
}

export function initOutboundMessage(sequelize: Sequelize): void {
  OutboundMessage.init(
    {
      id: idColumn(),
      messageId: textColumn(),
      purpose: textColumn(),
      recipient: textColumn(),
      subject: textColumn(),
      bodyText: textColumn(),
      status: textColumn(),
      attempts: integerColumn(),
      nextAttemptAt: integerColumn(),
      leaseUntil: integerColumn(true),
      claimToken: textColumn(true),
      lastError: textColumn(true),
      createdAt: textColumn(),
      deliveredAt: textColumn(true),
    },
    { sequelize, tableName: 'outbound_messages', modelName: 'OutboundMessage' },
  );
}
