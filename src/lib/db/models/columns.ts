import { DataTypes } from 'sequelize';

// Column shorthands: the SQL schema (db/migrations) is the source of truth; models only mirror it.
export const textColumn = (allowNull = false) => ({ type: DataTypes.TEXT, allowNull });
export const realColumn = (allowNull = false) => ({ type: DataTypes.REAL, allowNull });
export const integerColumn = (allowNull = false) => ({ type: DataTypes.INTEGER, allowNull });
export const booleanColumn = (defaultValue = false) => ({ type: DataTypes.BOOLEAN, allowNull: false, defaultValue });
export const idColumn = () => ({ type: DataTypes.TEXT, primaryKey: true });
export const createdAtColumn = () => ({ type: DataTypes.TEXT, allowNull: false, defaultValue: () => new Date().toISOString() });
