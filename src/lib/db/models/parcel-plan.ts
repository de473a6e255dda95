import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { createdAtColumn, idColumn, integerColumn, textColumn } from './columns';

/** A version of a scheme's plan of parcel outlines and the river centreline (migration 0007). */
export class ParcelPlan extends Model<InferAttributes<ParcelPlan>, InferCreationAttributes<ParcelPlan>> {
  declare id: string;
  declare schemeId: string;
  declare version: number;
  declare coordinateSystem: string;
  /** The checked geometry (planGeometrySchema) as JSON. */
  declare geometryJson: string;
  declare sourceFormat: 'geojson' | 'csv';
  declare originalName: string;
  declare storedName: string;
  declare sha256: string;
  /** Null for the demonstration plan loaded by the seed. */
  declare createdBy: string | null;
  declare createdAt: CreationOptional<string>;
}

export function initParcelPlan(sequelize: Sequelize): void {
  ParcelPlan.init(
    {
      id: idColumn(),
      schemeId: textColumn(),
      version: integerColumn(),
      coordinateSystem: textColumn(),
      geometryJson: textColumn(),
      sourceFormat: textColumn(),
      originalName: textColumn(),
      storedName: { ...textColumn(), unique: true },
      sha256: textColumn(),
      createdBy: textColumn(true),
      createdAt: createdAtColumn(),
    },
    { sequelize, tableName: 'parcel_plans', modelName: 'ParcelPlan' },
  );
}
