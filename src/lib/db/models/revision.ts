import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type RevisionStatus = 'draft' | 'submitted' | 'returned' | 'countersigned' | 'withdrawn';

/** One revision of a scheme's design check. Frozen for ever (by database triggers too) once it leaves draft. */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: string;
  declare schemeId: string;
  declare number: number;
  declare status: CreationOptional<RevisionStatus>;
  declare wizardStep: string | null;
  declare inputsJson: string;
  declare resultsJson: string | null;
  declare inputsSha256: string | null;
  declare resultsSha256: string | null;
  declare revisionSha256: string | null;
  declare engineVersion: string | null;
  declare authorId: string;
  declare checkerId: string | null;
  declare basedOnRevisionId: string | null;
  declare submittedAt: string | null;
  declare countersignedAt: string | null;
  declare createdAt: CreationOptional<string>;
  declare updatedAt: CreationOptional<string>;
}

export function initRevision(sequelize: Sequelize): void {
  const text = (allowNull: boolean) => ({ type: DataTypes.TEXT, allowNull });
  Revision.init(
    {
      id: { type: DataTypes.TEXT, primaryKey: true },
      schemeId: text(false),
      number: { type: DataTypes.INTEGER, allowNull: false },
      status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
      wizardStep: text(true),
      inputsJson: text(false),
      resultsJson: text(true),
      inputsSha256: text(true),
      resultsSha256: text(true),
      revisionSha256: text(true),
      engineVersion: text(true),
      authorId: text(false),
      checkerId: text(true),
      basedOnRevisionId: text(true),
      submittedAt: text(true),
      countersignedAt: text(true),
      createdAt: { type: DataTypes.TEXT, allowNull: false, defaultValue: () => new Date().toISOString() },
      updatedAt: { type: DataTypes.TEXT, allowNull: false, defaultValue: () => new Date().toISOString() },
    },
    { sequelize, tableName: 'revisions', modelName: 'Revision' },
  );
}
