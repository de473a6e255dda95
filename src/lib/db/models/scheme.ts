import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Scheme extends Model<InferAttributes<Scheme>, InferCreationAttributes<Scheme>> {
  declare id: string;
  declare reference: string;
  declare name: string;
  declare watercourse: string;
  declare site: string;
  declare description: string | null;
  declare designerId: string;
  declare createdAt: CreationOptional<string>;
  declare updatedAt: CreationOptional<string>;
}

export function initScheme(sequelize: Sequelize): void {
  Scheme.init(
    {
      id: { type: DataTypes.TEXT, primaryKey: true },
      reference: { type: DataTypes.TEXT, allowNull: false, unique: true },
      name: { type: DataTypes.TEXT, allowNull: false },
      watercourse: { type: DataTypes.TEXT, allowNull: false },
      site: { type: DataTypes.TEXT, allowNull: false },
      description: { type: DataTypes.TEXT, allowNull: true },
      designerId: { type: DataTypes.TEXT, allowNull: false },
      createdAt: { type: DataTypes.TEXT, allowNull: false, defaultValue: () => new Date().toISOString() },
      updatedAt: { type: DataTypes.TEXT, allowNull: false, defaultValue: () => new Date().toISOString() },
    },
    { sequelize, tableName: 'schemes', modelName: 'Scheme' },
  );
}
