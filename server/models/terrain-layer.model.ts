import { ElevationModel } from './elevation-model.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationAttributes, type Sequelize, type Transaction } from 'sequelize';

export type LayerBoundsWgs84 = { west: number; south: number; east: number; north: number };
export type LayerLegendEntry = { label: string; colour: string };

/** A map picture (PNG in file storage) drawn by the last terrain run on an elevation model. */
export class TerrainLayer extends Model<InferAttributes<TerrainLayer>, InferCreationAttributes<TerrainLayer>> {
  declare elevationModelId: number;
  /** hillshade, slope-classes, ls or concentrated-flow. */
  declare kind: string;
  declare fileKey: string;
  declare bounds: LayerBoundsWgs84;
  declare legend: LayerLegendEntry[];

  static initModel(sequelize: Sequelize): void {
    TerrainLayer.init(
      {
        elevationModelId: { type: DataTypes.INTEGER, primaryKey: true },
        kind: { type: DataTypes.TEXT, primaryKey: true },
        fileKey: { type: DataTypes.TEXT, allowNull: false },
        bounds: { type: DataTypes.JSONB, allowNull: false },
        legend: { type: DataTypes.JSONB, allowNull: false },
      },
      { sequelize, tableName: 'terrain_layers', timestamps: false },
    );
  }

  static associate(): void {
    TerrainLayer.belongsTo(ElevationModel, { foreignKey: 'elevationModelId', as: 'elevationModel' });
  }

  /** The layers of a farm's elevation models, by kind; `kind` picks one. */
  static ofFarm(farmId: number, kind?: string, transaction?: Transaction): Promise<TerrainLayer[]> {
    return TerrainLayer.findAll({
      where: kind === undefined ? {} : { kind },
      include: [{ model: ElevationModel, as: 'elevationModel', where: { farmId }, attributes: [] }],
      order: [['kind', 'ASC']],
      transaction,
    });
  }

  /** Drops the layers of every model of the farm and stores a run's new ones. */
  static async replaceForFarm(farmId: number, layers: CreationAttributes<TerrainLayer>[], transaction: Transaction): Promise<void> {
    await TerrainLayer.destroy({ where: { elevationModelId: await ElevationModel.idsOfFarm(farmId, transaction) }, transaction });
    await TerrainLayer.bulkCreate(layers, { transaction });
  }
}
