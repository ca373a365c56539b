import { Field } from './field.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { OverrideFactor } from '../../shared/schemas/overrides';

/** A value of R, K, C or P typed for one field, replacing the worked-out one, with its note. */
export class FieldFactorOverride extends Model<InferAttributes<FieldFactorOverride>, InferCreationAttributes<FieldFactorOverride>> {
  declare id: CreationOptional<number>;
  declare fieldId: number;
  declare factor: OverrideFactor;
  declare value: number;
  declare note: string;
  declare setBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    FieldFactorOverride.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fieldId: { type: DataTypes.INTEGER, allowNull: false },
        factor: { type: DataTypes.TEXT, allowNull: false },
        value: { type: DataTypes.REAL, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false },
        setBy: DataTypes.INTEGER,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'field_factor_overrides' },
    );
  }

  static associate(): void {
    FieldFactorOverride.belongsTo(Field, { foreignKey: 'fieldId', as: 'field' });
    FieldFactorOverride.belongsTo(User, { foreignKey: 'setBy', as: 'setter' });
  }
}
