import { Farm } from './farm.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { AmendmentChoices, Prices } from '../../shared/schemas/treatments';

/** A farm's own price list for treatments, in one currency; versioned. No row: the example list. */
export class FarmPrices extends Model<InferAttributes<FarmPrices>, InferCreationAttributes<FarmPrices>> {
  declare farmId: number;
  declare currency: string;
  declare prices: Prices;
  /** Null: the example products. */
  declare amendments: AmendmentChoices | null;
  declare version: CreationOptional<number>;
  declare updatedBy: number | null;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    FarmPrices.init(
      {
        farmId: { type: DataTypes.INTEGER, primaryKey: true },
        currency: { type: DataTypes.TEXT, allowNull: false },
        prices: { type: DataTypes.JSONB, allowNull: false },
        amendments: DataTypes.JSONB,
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        updatedBy: DataTypes.INTEGER,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'farm_prices', createdAt: false },
    );
  }

  static associate(): void {
    FarmPrices.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    FarmPrices.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor' });
  }
}
