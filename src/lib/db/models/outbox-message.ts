import { Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { idColumn, integerColumn, textColumn } from './columns';

/** A message the local fake SMTP server received; the raw RFC 5322 text is kept on disk. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: string;
  declare messageId: string | null;
  declare envelopeFrom: string;
  declare envelopeTo: string;
  declare subject: string | null;
  declare rawPath: string;
  declare sizeBytes: number;
  declare receivedAt: string;
}

export function initOutboxMessage(sequelize: Sequelize): void {
  OutboxMessage.init(
    {
      id: idColumn(),
      messageId: textColumn(true),
      envelopeFrom: textColumn(),
      envelopeTo: textColumn(),
      subject: textColumn(true),
      rawPath: textColumn(),
      sizeBytes: integerColumn(),
      receivedAt: textColumn(),
    },
    { sequelize, tableName: 'outbox_messages', modelName: 'OutboxMessage' },
  );
}
