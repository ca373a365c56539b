import { Farm } from './farm.model';
import { SoilMapUnit } from './soil-map-unit.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { SoilMapMeaning } from '../../shared/schemas/soils';

/** Which attribute name of the map units means what; K may be in US or SI units. */
export type StoredMapping = Record<SoilMapMeaning, string | null> & { kUnits: 'us' | 'si' };

/** A farm's soil map (one per farm): the uploaded file's name, its attribute names and the person's mapping. */
export class SoilMap extends Model<InferAttributes<SoilMap>, InferCreationAttributes<SoilMap>> {
  declare id: CreationOptional<number>;
  declare farmId: number;
  declare originalName: string;
  declare attributeNames: CreationOptional<string[]>;
  /** Stored before every meaning existed, a row may lack some keys. */
  declare mapping: CreationOptional<Partial<StoredMapping>>;
  declare warnings: CreationOptional<string[]>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SoilMap.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        farmId: { type: DataTypes.INTEGER, allowNull: false, unique: true },
        originalName: { type: DataTypes.TEXT, allowNull: false },
        attributeNames: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        mapping: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        warnings: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        createdBy: DataTypes.INTEGER,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'soil_maps' },
    );
  }

  static associate(): void {
    SoilMap.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    SoilMap.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
    SoilMap.hasMany(SoilMapUnit, { foreignKey: 'soilMapId', as: 'units' });
  }
}
