import { Field } from './field.model';
import { ElevationModel } from './elevation-model.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationAttributes, type CreationOptional, type NonAttribute, type Sequelize, type Transaction } from 'sequelize';

/** A field's terrain figures as stored by a terrain run (the API answers them as they are). */
export type StoredTerrainStats = {
  cellCount: number;
  cellsWithoutData: number;
  meanSlopePct: number;
  p90SlopePct: number;
  slopeClasses: Array<{ name: string; minPct: number; maxPct: number | null; share: number }>;
  meanLS: number | null;
  meanSoilLossTPerHaYr: number | null;
  /** Cells where flow from a large upslope area gathers, as [lng, lat] cell centres. */
  concentratedFlow: { minAreaM2: number; cellCount: number; points: Array<[number, number]> };
  cellSizeM: number;
  epsg: number;
};

/** One field's figures from the farm's elevation model, for the outline version they were computed on. */
export class FieldTerrain extends Model<InferAttributes<FieldTerrain>, InferCreationAttributes<FieldTerrain>> {
  declare fieldId: number;
  declare elevationModelId: number;
  /** The field's version when computed: older than the field's own means a new outline is being worked out. */
  declare fieldVersion: number;
  declare stats: StoredTerrainStats;
  /** The run that should have replaced these figures stopped before it finished. */
  declare stale: CreationOptional<boolean>;
  declare computedAt: CreationOptional<Date>;
  declare field?: NonAttribute<Field>;

  static initModel(sequelize: Sequelize): void {
    FieldTerrain.init(
      {
        fieldId: { type: DataTypes.INTEGER, primaryKey: true },
        elevationModelId: { type: DataTypes.INTEGER, allowNull: false },
        fieldVersion: { type: DataTypes.INTEGER, allowNull: false },
        stats: { type: DataTypes.JSONB, allowNull: false },
        stale: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        computedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'field_terrain', timestamps: false },
    );
  }

  static associate(): void {
    FieldTerrain.belongsTo(Field, { foreignKey: 'fieldId', as: 'field' });
    FieldTerrain.belongsTo(ElevationModel, { foreignKey: 'elevationModelId', as: 'elevationModel' });
  }

  /** The field's figures with the field's current version, to tell whether they are up to date. */
  static withFieldVersion(fieldId: number): Promise<FieldTerrain | null> {
    return FieldTerrain.findByPk(fieldId, { include: [{ model: Field, as: 'field', attributes: ['id', 'version'] }] });
  }

  /** Marks the figures of every field of the farm stale: the run meant to replace them did not finish. */
  static async markFarmStale(farmId: number, transaction?: Transaction): Promise<void> {
    const fields = await Field.findAll({ where: { farmId }, attributes: ['id'], transaction });
    await FieldTerrain.update({ stale: true }, { where: { fieldId: fields.map((f) => f.id) }, transaction });
  }

  /** Drops the figures of every field of the farm and stores a run's new ones. */
  static async replaceForFarm(farmId: number, figures: CreationAttributes<FieldTerrain>[], transaction: Transaction): Promise<void> {
    const fields = await Field.findAll({ where: { farmId }, attributes: ['id'], transaction });
    await FieldTerrain.destroy({ where: { fieldId: fields.map((f) => f.id) }, transaction });
    await FieldTerrain.bulkCreate(figures, { transaction });
  }
}
