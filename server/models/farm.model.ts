import { Membership } from './membership.model';
import { Field } from './field.model';
import { Season } from './season.model';
import { FarmClimate } from './farm-climate.model';
import { SoilMap } from './soil-map.model';
import { ElevationModel } from './elevation-model.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { SlopeClass } from '../../shared/schemas/terrain';

export class Farm extends Model<InferAttributes<Farm>, InferCreationAttributes<Farm>> {
  declare id: CreationOptional<number>;
  declare name: string;
  /** The farm's own slope classes; null means the default classes. */
  declare slopeBreaks: CreationOptional<SlopeClass[] | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Farm.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        slopeBreaks: { type: DataTypes.JSONB, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'farms' },
    );
  }

  static associate(): void {
    Farm.hasMany(Membership, { foreignKey: 'farmId', as: 'memberships' });
    Farm.hasMany(Field, { foreignKey: 'farmId', as: 'fields' });
    Farm.hasMany(Season, { foreignKey: 'farmId', as: 'seasons' });
    Farm.hasOne(FarmClimate, { foreignKey: 'farmId', as: 'climate' });
    Farm.hasOne(SoilMap, { foreignKey: 'farmId', as: 'soilMap' });
    Farm.hasMany(ElevationModel, { foreignKey: 'farmId', as: 'elevationModels' });
  }
}
