import { Farm } from './farm.model';
import { FieldCropping } from './field-cropping.model';
import { Assessment } from './assessment.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';

/** A farm's season ("2027"): cropping and assessments are per field per season. */
export class Season extends Model<InferAttributes<Season>, InferCreationAttributes<Season>> {
  declare id: CreationOptional<number>;
  declare farmId: number;
  declare label: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Season.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        farmId: { type: DataTypes.INTEGER, allowNull: false },
        label: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      {
        sequelize,
        tableName: 'seasons',
        updatedAt: false,
        // Labels sort as text: "2027" after "2026".
        scopes: { newestFirst: { order: [['label', 'DESC']] } },
      },
    );
  }

  static associate(): void {
    Season.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    Season.hasMany(FieldCropping, { foreignKey: 'seasonId', as: 'croppings' });
    Season.hasMany(Assessment, { foreignKey: 'seasonId', as: 'assessments' });
  }
}
