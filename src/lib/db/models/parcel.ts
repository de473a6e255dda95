import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { createdAtColumn, idColumn, integerColumn, realColumn, textColumn } from './columns';

/** Each upload or edit of a scheme's parcels makes a new register version; old versions stay for the history. */
export class ParcelRegister extends Model<InferAttributes<ParcelRegister>, InferCreationAttributes<ParcelRegister>> {
  declare id: string;
  declare schemeId: string;
  declare version: number;
  declare uploadId: string | null;
  /** Set when the version was made by restoring an earlier one (migration 0007). */
  declare restoredFromVersion: CreationOptional<number | null>;
  declare createdBy: string;
  declare note: string | null;
  declare createdAt: CreationOptional<string>;
}

export class Parcel extends Model<InferAttributes<Parcel>, InferCreationAttributes<Parcel>> {
  declare id: string;
  declare registerId: string;
  declare schemeId: string;
  declare reference: string;
  declare ownerName: string;
  declare postalAddress: string;
  declare email: string | null;
  declare distanceFromM: number;
  declare distanceToM: number;
  declare bankSide: 'left' | 'right' | 'both';
  declare groundLevelM: number | null;
  declare landUse: string | null;
  declare createdAt: CreationOptional<string>;
}

export function initParcel(sequelize: Sequelize): void {
  ParcelRegister.init(
    { id: idColumn(), schemeId: textColumn(), version: integerColumn(), uploadId: textColumn(true), restoredFromVersion: { ...integerColumn(true), defaultValue: null }, createdBy: textColumn(), note: textColumn(true), createdAt: createdAtColumn() },
    { sequelize, tableName: 'parcel_registers', modelName: 'ParcelRegister' },
  );
  Parcel.init(
    {
      id: idColumn(),
      registerId: textColumn(),
      schemeId: textColumn(),
      reference: textColumn(),
      ownerName: textColumn(),
      postalAddress: textColumn(),
      email: textColumn(true),
      distanceFromM: { ...realColumn(), field: 'distance_from_m' },
      distanceToM: { ...realColumn(), field: 'distance_to_m' },
      bankSide: textColumn(),
      groundLevelM: { ...realColumn(true), field: 'ground_level_m' },
      landUse: textColumn(true),
      createdAt: createdAtColumn(),
    },
    { sequelize, tableName: 'parcels', modelName: 'Parcel' },
  );
}
