import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '@/lib/auth/roles';

export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: string;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedBy: string;
  declare expiresAt: string;
  declare acceptedAt: string | null;
  declare cancelledAt: CreationOptional<string | null>;
  declare createdAt: CreationOptional<string>;
}

export function initInvitation(sequelize: Sequelize): void {
  Invitation.init(
    {
      id: { type: DataTypes.TEXT, primaryKey: true },
      email: { type: DataTypes.TEXT, allowNull: false },
      role: { type: DataTypes.TEXT, allowNull: false },
      tokenHash: { type: DataTypes.TEXT, allowNull: false, unique: true },
      invitedBy: { type: DataTypes.TEXT, allowNull: false },
      expiresAt: { type: DataTypes.TEXT, allowNull: false },
      acceptedAt: { type: DataTypes.TEXT, allowNull: true },
      cancelledAt: { type: DataTypes.TEXT, allowNull: true },
      createdAt: { type: DataTypes.TEXT, allowNull: false, defaultValue: () => new Date().toISOString() },
    },
    { sequelize, tableName: 'invitations', modelName: 'Invitation' },
  );
}
