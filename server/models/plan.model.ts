import { Farm } from './farm.model';
import { Season } from './season.model';
import { User } from './user.model';
import { PlanAction } from './plan-action.model';
import { PlanComment } from './plan-comment.model';
import { PlanVersion } from './plan-version.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type NonAttribute, type Transaction } from 'sequelize';
import type { PlanState } from '../../shared/schemas/plans';

/** A farm's plan for one season: its state in review, a version for concurrent edits, its revision. */
export class Plan extends Model<InferAttributes<Plan>, InferCreationAttributes<Plan>> {
  declare id: CreationOptional<number>;
  declare farmId: number;
  declare seasonId: number;
  declare state: CreationOptional<PlanState>;
  declare version: CreationOptional<number>;
  declare revision: CreationOptional<number>;
  declare currency: string;
  declare createdBy: number | null;
  declare submittedBy: CreationOptional<number | null>;
  declare submittedAt: CreationOptional<Date | null>;
  declare returnedBy: CreationOptional<number | null>;
  declare returnedAt: CreationOptional<Date | null>;
  declare approvedBy: CreationOptional<number | null>;
  declare approvedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare season?: NonAttribute<Season>;

  static initModel(sequelize: Sequelize): void {
    Plan.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        farmId: { type: DataTypes.INTEGER, allowNull: false },
        seasonId: { type: DataTypes.INTEGER, allowNull: false },
        state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        revision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        currency: { type: DataTypes.TEXT, allowNull: false },
        createdBy: DataTypes.INTEGER,
        submittedBy: DataTypes.INTEGER,
        submittedAt: DataTypes.DATE,
        returnedBy: DataTypes.INTEGER,
        returnedAt: DataTypes.DATE,
        approvedBy: DataTypes.INTEGER,
        approvedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'plans' },
    );
  }

  /** The plan, locked for the rest of the transaction: changes to it and its actions queue behind each other. */
  static async lockForChange(id: number, transaction: Transaction): Promise<Plan | null> {
    return Plan.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
  }

  static associate(): void {
    Plan.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    Plan.belongsTo(Season, { foreignKey: 'seasonId', as: 'season' });
    Plan.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
    Plan.hasMany(PlanAction, { foreignKey: 'planId', as: 'actions' });
    Plan.hasMany(PlanComment, { foreignKey: 'planId', as: 'comments' });
    Plan.hasMany(PlanVersion, { foreignKey: 'planId', as: 'versions' });
  }
}
