import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { booleanColumn, createdAtColumn, idColumn, integerColumn, textColumn } from './columns';

/** `held`: kept but never sent, because the certificate of the letter's revision was revoked. */
export type LetterStatus = 'queued' | 'sending' | 'sent' | 'failed' | 'acknowledged' | 'held';

export class LetterTemplate extends Model<InferAttributes<LetterTemplate>, InferCreationAttributes<LetterTemplate>> {
  declare id: string;
  declare schemeId: string | null;
  declare version: number;
  declare paragraphsJson: string;
  declare updatedBy: string;
  declare createdAt: CreationOptional<string>;
}

export class LetterBatch extends Model<InferAttributes<LetterBatch>, InferCreationAttributes<LetterBatch>> {
  declare id: string;
  declare schemeId: string;
  declare revisionId: string;
  declare createdBy: string;
  declare status: CreationOptional<'open' | 'sending' | 'complete'>;
  declare createdAt: CreationOptional<string>;
}

/** One letter version to one parcel's owner; unique per (parcel, revision, version) so a batch can never send it twice. */
export class Letter extends Model<InferAttributes<Letter>, InferCreationAttributes<Letter>> {
  declare id: string;
  declare batchId: string | null;
  declare parcelId: string;
  declare revisionId: string;
  declare templateId: string | null;
  declare version: number;
  declare preliminary: CreationOptional<boolean>;
  declare category: string;
  declare impactJson: string;
  declare pdfPath: string | null;
  declare pdfSha256: string | null;
  declare recipientEmail: string | null;
  declare status: CreationOptional<LetterStatus>;
  declare failureReason: string | null;
  declare messageId: string | null;
  declare sentAt: string | null;
  declare acknowledgedAt: string | null;
  declare createdAt: CreationOptional<string>;
}

export class LetterResponse extends Model<InferAttributes<LetterResponse>, InferCreationAttributes<LetterResponse>> {
  declare id: string;
  declare letterId: string;
  declare loggedBy: string;
  declare receivedAt: string;
  declare summary: string;
  declare createdAt: CreationOptional<string>;
}

export function initLetter(sequelize: Sequelize): void {
  LetterTemplate.init(
    { id: idColumn(), schemeId: textColumn(true), version: integerColumn(), paragraphsJson: textColumn(), updatedBy: textColumn(), createdAt: createdAtColumn() },
    { sequelize, tableName: 'letter_templates', modelName: 'LetterTemplate' },
  );
  LetterBatch.init(
    { id: idColumn(), schemeId: textColumn(), revisionId: textColumn(), createdBy: textColumn(), status: { ...textColumn(), defaultValue: 'open' }, createdAt: createdAtColumn() },
    { sequelize, tableName: 'letter_batches', modelName: 'LetterBatch' },
  );
  Letter.init(
    {
      id: idColumn(),
      batchId: textColumn(true),
      parcelId: textColumn(),
      revisionId: textColumn(),
      templateId: textColumn(true),
      version: integerColumn(),
      preliminary: booleanColumn(),
      category: textColumn(),
      impactJson: textColumn(),
      pdfPath: textColumn(true),
      pdfSha256: textColumn(true),
      recipientEmail: textColumn(true),
      status: { ...textColumn(), defaultValue: 'queued' },
      failureReason: textColumn(true),
      messageId: textColumn(true),
      sentAt: textColumn(true),
      acknowledgedAt: textColumn(true),
      createdAt: createdAtColumn(),
    },
    { sequelize, tableName: 'letters', modelName: 'Letter' },
  );
  LetterResponse.init(
    { id: idColumn(), letterId: textColumn(), loggedBy: textColumn(), receivedAt: textColumn(), summary: textColumn(), createdAt: createdAtColumn() },
    { sequelize, tableName: 'letter_responses', modelName: 'LetterResponse' },
  );
}
