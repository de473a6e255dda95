import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Append-only (UPDATE and DELETE are refused by triggers); each row's hash chains to the one before. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare at: string;
  declare actorId: string | null;
  declare action: string;
  declare entityType: string;
  declare entityId: string | null;
  declare schemeId: string | null;
  declare detailsJson: string;
  declare previousHash: string;
  declare hash: string;
}

export function initAuditEvent(sequelize: Sequelize): void {
  AuditEvent.init(
    {
      id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
      at: { type: DataTypes.TEXT, allowNull: false },
      actorId: { type: DataTypes.TEXT, allowNull: true },
      action: { type: DataTypes.TEXT, allowNull: false },
      entityType: { type: DataTypes.TEXT, allowNull: false },
      entityId: { type: DataTypes.TEXT, allowNull: true },
      schemeId: { type: DataTypes.TEXT, allowNull: true },
      detailsJson: { type: DataTypes.TEXT, allowNull: false },
      previousHash: { type: DataTypes.TEXT, allowNull: false },
      hash: { type: DataTypes.TEXT, allowNull: false, unique: true },
    },
    { sequelize, tableName: 'audit_events', modelName: 'AuditEvent' },
  );
}
