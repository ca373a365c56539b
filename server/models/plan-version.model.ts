import { Plan } from './plan.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { Plan as PlanShape } from '../../shared/schemas/plans';

/** An approved revision of a plan, frozen as the API showed it when it was approved. */
export class PlanVersion extends Model<InferAttributes<PlanVersion>, InferCreationAttributes<PlanVersion>> {
  declare id: CreationOptional<number>;
  declare planId: number;
  declare revision: number;
  declare snapshot: PlanShape;
  declare approvedBy: number | null;
  declare approvedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PlanVersion.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        planId: { type: DataTypes.INTEGER, allowNull: false },
        revision: { type: DataTypes.INTEGER, allowNull: false },
        snapshot: { type: DataTypes.JSONB, allowNull: false },
        approvedBy: DataTypes.INTEGER,
        approvedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'plan_versions', timestamps: false, scopes: { oldestFirst: { order: [['revision', 'ASC']] } } },
    );
  }

  /** The newest approved revision of a plan, or null. */
  static async newestOf(planId: number): Promise<PlanVersion | null> {
    return PlanVersion.findOne({ where: { planId }, order: [['revision', 'DESC']] });
  }

  static associate(): void {
    PlanVersion.belongsTo(Plan, { foreignKey: 'planId', as: 'plan' });
    PlanVersion.belongsTo(User, { foreignKey: 'approvedBy', as: 'approver' });
  }
}
