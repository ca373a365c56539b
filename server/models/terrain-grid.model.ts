import { ElevationModel } from './elevation-model.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationAttributes, type CreationOptional, type Sequelize, type Transaction } from 'sequelize';

/** Where a kept grid sits on the ground: the elevation model's frame, in its own CRS. */
export type GridFrame = { width: number; height: number; originX: number; originY: number; cellSizeX: number; cellSizeY: number; epsg: number };

/**
 * A raw typed-array grid (file storage) kept from the last terrain run, for pictures drawn on
 * request: 'ls' (Float32) and 'field-labels' (Uint16, label k = detail.fieldIdsByLabel[k - 1]).
 */
export class TerrainGrid extends Model<InferAttributes<TerrainGrid>, InferCreationAttributes<TerrainGrid>> {
  declare elevationModelId: number;
  declare kind: 'ls' | 'field-labels';
  declare fileKey: string;
  declare frame: GridFrame;
  declare detail: CreationOptional<{ fieldIdsByLabel?: number[] }>;

  static initModel(sequelize: Sequelize): void {
    TerrainGrid.init(
      {
        elevationModelId: { type: DataTypes.INTEGER, primaryKey: true },
        kind: { type: DataTypes.TEXT, primaryKey: true },
        fileKey: { type: DataTypes.TEXT, allowNull: false },
        frame: { type: DataTypes.JSONB, allowNull: false },
        detail: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
      },
      { sequelize, tableName: 'terrain_grids', timestamps: false },
    );
  }

  static associate(): void {
    TerrainGrid.belongsTo(ElevationModel, { foreignKey: 'elevationModelId', as: 'elevationModel' });
  }

  static ofFarm(farmId: number, transaction?: Transaction): Promise<TerrainGrid[]> {
    return TerrainGrid.findAll({
      include: [{ model: ElevationModel, as: 'elevationModel', where: { farmId }, attributes: [] }],
      transaction,
    });
  }

  /** Drops the kept grids of every model of the farm and stores a run's new ones. */
  static async replaceForFarm(farmId: number, grids: CreationAttributes<TerrainGrid>[], transaction: Transaction): Promise<void> {
    await TerrainGrid.destroy({ where: { elevationModelId: await ElevationModel.idsOfFarm(farmId, transaction) }, transaction });
    await TerrainGrid.bulkCreate(grids, { transaction });
  }
}
