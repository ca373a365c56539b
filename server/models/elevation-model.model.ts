import { Farm } from './farm.model';
import { TerrainLayer } from './terrain-layer.model';
import { TerrainGrid } from './terrain-grid.model';
import { FieldTerrain } from './field-terrain.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type Transaction } from 'sequelize';
import type { Polygon } from 'geojson';

/** An uploaded elevation model (GeoTIFF in file storage); a farm's newest one is the one used. */
export class ElevationModel extends Model<InferAttributes<ElevationModel>, InferCreationAttributes<ElevationModel>> {
  declare id: CreationOptional<number>;
  declare farmId: number;
  declare fileKey: string;
  declare originalName: string;
  declare epsg: number;
  /** Size in cells. */
  declare width: number;
  declare height: number;
  declare cellSizeM: number;
  /** The grid's outline in WGS84. */
  declare bounds: Polygon;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ElevationModel.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        farmId: { type: DataTypes.INTEGER, allowNull: false },
        fileKey: { type: DataTypes.TEXT, allowNull: false },
        originalName: { type: DataTypes.TEXT, allowNull: false },
        epsg: { type: DataTypes.INTEGER, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        cellSizeM: { type: DataTypes.DOUBLE, allowNull: false },
        bounds: { type: DataTypes.GEOMETRY('POLYGON', 4326), allowNull: false },
        createdBy: DataTypes.INTEGER,
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'elevation_models', updatedAt: false },
    );
  }

  static associate(): void {
    ElevationModel.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    ElevationModel.hasMany(TerrainLayer, { foreignKey: 'elevationModelId', as: 'layers' });
    ElevationModel.hasMany(TerrainGrid, { foreignKey: 'elevationModelId', as: 'grids' });
    ElevationModel.hasMany(FieldTerrain, { foreignKey: 'elevationModelId', as: 'fieldTerrain' });
  }

  /** The farm's newest model, the one terrain runs use; null before any upload. */
  static newestOfFarm(farmId: number, transaction?: Transaction): Promise<ElevationModel | null> {
    return ElevationModel.findOne({ where: { farmId }, order: [['id', 'DESC']], transaction });
  }

  static async farmHasAny(farmId: number, transaction?: Transaction): Promise<boolean> {
    return (await ElevationModel.count({ where: { farmId }, transaction })) > 0;
  }

  static async idsOfFarm(farmId: number, transaction?: Transaction): Promise<number[]> {
    const rows = await ElevationModel.findAll({ where: { farmId }, attributes: ['id'], transaction });
    return rows.map((r) => r.id);
  }
}
