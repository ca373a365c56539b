import { Membership } from './membership.model';
import { Field } from './field.model';
import { Season } from './season.model';
import { FarmClimate } from './farm-climate.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';

export class Farm extends Model<InferAttributes<Farm>, InferCreationAttributes<Farm>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Farm.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.TEXT, allowNull: false },
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
  }
}
