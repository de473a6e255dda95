import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { createdAtColumn, idColumn, integerColumn, textColumn } from './columns';

export type UploadKind = 'survey-csv' | 'parcels-csv' | 'case-json' | 'certificate-pdf';

/** An uploaded file's record; the bytes live under the data directory by stored name, never under public/. */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: string;
  declare kind: UploadKind;
  declare originalName: string;
  declare storedName: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare mediaType: string;
  declare schemeId: string | null;
  declare uploadedBy: string;
  declare createdAt: CreationOptional<string>;
}

export function initUpload(sequelize: Sequelize): void {
  Upload.init(
    {
      id: idColumn(),
      kind: textColumn(),
      originalName: textColumn(),
      storedName: { ...textColumn(), unique: true },
      sizeBytes: integerColumn(),
      sha256: textColumn(),
      mediaType: textColumn(),
      schemeId: textColumn(true),
      uploadedBy: textColumn(),
      createdAt: createdAtColumn(),
    },
    { sequelize, tableName: 'uploads', modelName: 'Upload' },
  );
}
