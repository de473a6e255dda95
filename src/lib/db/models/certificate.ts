import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { idColumn, textColumn } from './columns';

export type CertificateStatus = 'issued' | 'superseded' | 'revoked';

export class Certificate extends Model<InferAttributes<Certificate>, InferCreationAttributes<Certificate>> {
  declare id: string;
  declare number: string;
  declare schemeId: string;
  declare revisionId: string;
  declare status: CreationOptional<CertificateStatus>;
  declare pdfPath: string;
  declare pdfSha256: string;
  declare signerFingerprint: string;
  declare issuedAt: string;
  declare supersededById: string | null;
  declare revokedAt: string | null;
  declare revokedBy: string | null;
  declare revocationReason: string | null;
}

export function initCertificate(sequelize: Sequelize): void {
  Certificate.init(
    {
      id: idColumn(),
      number: { ...textColumn(), unique: true },
      schemeId: textColumn(),
      revisionId: { ...textColumn(), unique: true },
      status: { ...textColumn(), defaultValue: 'issued' },
      pdfPath: textColumn(),
      pdfSha256: textColumn(),
      signerFingerprint: textColumn(),
      issuedAt: textColumn(),
      supersededById: textColumn(true),
      revokedAt: textColumn(true),
      revokedBy: textColumn(true),
      revocationReason: textColumn(true),
    },
    { sequelize, tableName: 'certificates', modelName: 'Certificate' },
  );
}
