import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { booleanColumn, createdAtColumn, idColumn, integerColumn, textColumn } from './columns';

/**
 * `held`: kept but never sent, because the certificate of the letter's revision was revoked. `to-post`: the parcel has
 * no e-mail address, so the letter is printed and posted (then `posted`). `withdrawn`: its batch was withdrawn unsent.
 */
export type LetterStatus = 'queued' | 'sending' | 'sent' | 'failed' | 'acknowledged' | 'held' | 'to-post' | 'posted' | 'withdrawn';
export type ResponseType = 'no-objection' | 'objection' | 'question' | 'other';
export type ResponseChannel = 'email' | 'post' | 'telephone' | 'meeting';

export class LetterTemplate extends Model<InferAttributes<LetterTemplate>, InferCreationAttributes<LetterTemplate>> {
  declare id: string;
  declare schemeId: string | null;
  declare version: number;
  declare paragraphsJson: string;
  declare responseDays: CreationOptional<number>;
  declare updatedBy: string;
  declare createdAt: CreationOptional<string>;
}

export class LetterBatch extends Model<InferAttributes<LetterBatch>, InferCreationAttributes<LetterBatch>> {
  declare id: string;
  declare schemeId: string;
  declare revisionId: string;
  declare createdBy: string;
  declare status: CreationOptional<'open' | 'sending' | 'complete' | 'withdrawn'>;
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
  /** ISO date (YYYY-MM-DD) by which the landowner is asked to respond; set when the letter is sent or posted. */
  declare responseDueOn: CreationOptional<string | null>;
  declare postedOn: CreationOptional<string | null>;
  /** The LetterDocument the PDF was rendered from (JSON), to print letters to post together. */
  declare documentJson: CreationOptional<string | null>;
  declare createdAt: CreationOptional<string>;
}

export class LetterResponse extends Model<InferAttributes<LetterResponse>, InferCreationAttributes<LetterResponse>> {
  declare id: string;
  declare letterId: string;
  declare loggedBy: string;
  declare receivedAt: string;
  declare summary: string;
  declare responseType: CreationOptional<ResponseType>;
  declare channel: CreationOptional<ResponseChannel>;
  declare createdAt: CreationOptional<string>;
}

/** An earlier wording of a response, kept when the response is edited. */
export class LetterResponseEdit extends Model<InferAttributes<LetterResponseEdit>, InferCreationAttributes<LetterResponseEdit>> {
  declare id: string;
  declare responseId: string;
  declare editedBy: string;
  declare previousJson: string;
  declare createdAt: CreationOptional<string>;
}

export class LetterReminder extends Model<InferAttributes<LetterReminder>, InferCreationAttributes<LetterReminder>> {
  declare id: string;
  declare letterId: string;
  declare channel: 'email' | 'post';
  declare outboundMessageId: string | null;
  declare createdBy: string;
  declare postedOn: string | null;
  declare createdAt: CreationOptional<string>;
}

export function initLetter(sequelize: Sequelize): void {
  LetterTemplate.init(
    { id: idColumn(), schemeId: textColumn(true), version: integerColumn(), paragraphsJson: textColumn(), responseDays: { ...integerColumn(), defaultValue: 28 }, updatedBy: textColumn(), createdAt: createdAtColumn() },
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
      responseDueOn: textColumn(true),
      postedOn: textColumn(true),
      documentJson: textColumn(true),
      createdAt: createdAtColumn(),
    },
    { sequelize, tableName: 'letters', modelName: 'Letter' },
  );
  LetterResponse.init(
    { id: idColumn(), letterId: textColumn(), loggedBy: textColumn(), receivedAt: textColumn(), summary: textColumn(), responseType: { ...textColumn(), defaultValue: 'other' }, channel: { ...textColumn(), defaultValue: 'email' }, createdAt: createdAtColumn() },
    { sequelize, tableName: 'letter_responses', modelName: 'LetterResponse' },
  );
  LetterResponseEdit.init(
    { id: idColumn(), responseId: textColumn(), editedBy: textColumn(), previousJson: textColumn(), createdAt: createdAtColumn() },
    { sequelize, tableName: 'letter_response_edits', modelName: 'LetterResponseEdit' },
  );
  LetterReminder.init(
    { id: idColumn(), letterId: textColumn(), channel: textColumn(), outboundMessageId: textColumn(true), createdBy: textColumn(), postedOn: textColumn(true), createdAt: createdAtColumn() },
    { sequelize, tableName: 'letter_reminders', modelName: 'LetterReminder' },
  );
}
