import { Farm } from './farm.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { Climate } from '../../shared/schemas/season';

/** A farm's rainfall erosivity R (typed, from precipitation or a rainfall record) and design storm; versioned. */
export class FarmClimate extends Model<InferAttributes<FarmClimate>, InferCreationAttributes<FarmClimate>> {
  declare farmId: number;
  declare rFrom: Climate['rFrom'];
  /** R, MJ·mm/(ha·h·yr). */
  declare rValue: number | null;
  declare annualPrecipitationMm: number | null;
  declare designStormMm: number;
  /** What the rainfall record gave, when rFrom is 'record'. */
  declare rRecord: Climate['record'];
  declare version: CreationOptional<number>;
  declare updatedBy: number | null;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    FarmClimate.init(
      {
        farmId: { type: DataTypes.INTEGER, primaryKey: true },
        rFrom: { type: DataTypes.TEXT, allowNull: false },
        rValue: DataTypes.REAL,
        annualPrecipitationMm: DataTypes.REAL,
        designStormMm: { type: DataTypes.REAL, allowNull: false },
        rRecord: DataTypes.JSONB,
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        updatedBy: DataTypes.INTEGER,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'farm_climates', createdAt: false },
    );
  }

  static associate(): void {
    FarmClimate.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    FarmClimate.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor' });
  }
}
