import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '@/lib/auth/roles';

export type UserStatus = 'active' | 'invited' | 'disabled';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: string;
  declare email: string;
  declare name: string;
  declare role: Role;
  declare passwordHash: string | null;
  declare status: CreationOptional<UserStatus>;
  declare organisation: string | null;
  declare createdAt: CreationOptional<string>;
  declare updatedAt: CreationOptional<string>;
}

export function initUser(sequelize: Sequelize): void {
  User.init(
    {
      id: { type: DataTypes.TEXT, primaryKey: true },
      email: { type: DataTypes.TEXT, allowNull: false, unique: true },
      name: { type: DataTypes.TEXT, allowNull: false },
      role: { type: DataTypes.TEXT, allowNull: false },
      passwordHash: { type: DataTypes.TEXT, allowNull: true },
      status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'active' },
      organisation: { type: DataTypes.TEXT, allowNull: true },
      createdAt: { type: DataTypes.TEXT, allowNull: false, defaultValue: () => new Date().toISOString() },
      updatedAt: { type: DataTypes.TEXT, allowNull: false, defaultValue: () => new Date().toISOString() },
    },
    { sequelize, tableName: 'users', modelName: 'User' },
  );
}
