import { SoilMap } from './soil-map.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { MultiPolygon } from 'geojson';

/**
 * One map unit of a farm's soil map: its outline and the attributes it came with. Written and
 * intersected with fields by the PostGIS queries in soil-map-unit.queries.ts.
 */
export class SoilMapUnit extends Model<InferAttributes<SoilMapUnit>, InferCreationAttributes<SoilMapUnit>> {
  declare id: CreationOptional<number>;
  declare soilMapId: number;
  /** The unit's place (1-based) among the uploaded file's features. */
  declare featureIndex: number;
  declare attributes: CreationOptional<Record<string, unknown>>;
  declare geom: MultiPolygon;

  static initModel(sequelize: Sequelize): void {
    SoilMapUnit.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        soilMapId: { type: DataTypes.INTEGER, allowNull: false },
        featureIndex: { type: DataTypes.INTEGER, allowNull: false },
        attributes: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        geom: { type: DataTypes.GEOMETRY('MULTIPOLYGON', 4326), allowNull: false },
      },
      { sequelize, tableName: 'soil_map_units', timestamps: false },
    );
  }

  static associate(): void {
    SoilMapUnit.belongsTo(SoilMap, { foreignKey: 'soilMapId', as: 'soilMap' });
  }
}
