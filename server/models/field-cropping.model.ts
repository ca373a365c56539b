import { Field } from './field.model';
import { Season } from './season.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { Cropping } from '../../shared/schemas/season';

/** A field's crop, tillage, residue, cover crop and support practice in one season; versioned. */
export class FieldCropping extends Model<InferAttributes<FieldCropping>, InferCreationAttributes<FieldCropping>> {
  declare id: CreationOptional<number>;
  declare fieldId: number;
  declare seasonId: number;
  declare crop: Cropping['crop'];
  declare tillage: Cropping['tillage'];
  declare residuePct: number | null;
  declare groundCoverPct: number | null;
  declare coverCrop: Cropping['coverCrop'];
  declare practice: Cropping['practice'];
  declare terraceIntervalM: number | null;
  declare stripRotation: Cropping['stripRotation'];
  declare stripWidthM: number | null;
  declare version: CreationOptional<number>;
  declare updatedBy: number | null;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    FieldCropping.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fieldId: { type: DataTypes.INTEGER, allowNull: false },
        seasonId: { type: DataTypes.INTEGER, allowNull: false },
        crop: { type: DataTypes.TEXT, allowNull: false },
        tillage: DataTypes.TEXT,
        residuePct: DataTypes.REAL,
        groundCoverPct: DataTypes.REAL,
        coverCrop: DataTypes.JSONB,
        practice: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'none' },
        terraceIntervalM: DataTypes.REAL,
        stripRotation: DataTypes.TEXT,
        stripWidthM: DataTypes.REAL,
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        updatedBy: DataTypes.INTEGER,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'field_croppings', createdAt: false },
    );
  }

  static associate(): void {
    FieldCropping.belongsTo(Field, { foreignKey: 'fieldId', as: 'field' });
    FieldCropping.belongsTo(Season, { foreignKey: 'seasonId', as: 'season' });
    FieldCropping.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor' });
  }
}
