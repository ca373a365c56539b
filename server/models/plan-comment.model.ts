import { Plan } from './plan.model';
import { PlanAction } from './plan-action.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { PlanComment as PlanCommentShape } from '../../shared/schemas/plans';

/** A remark in a plan's review: on the plan or one action; a return or an approval carries one too. */
export class PlanComment extends Model<InferAttributes<PlanComment>, InferCreationAttributes<PlanComment>> {
  declare id: CreationOptional<number>;
  declare planId: number;
  declare actionId: number | null;
  declare revision: number;
  declare kind: CreationOptional<PlanCommentShape['kind']>;
  declare authorId: number | null;
  declare body: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PlanComment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        planId: { type: DataTypes.INTEGER, allowNull: false },
        actionId: DataTypes.INTEGER,
        revision: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'comment' },
        authorId: DataTypes.INTEGER,
        body: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'plan_comments', updatedAt: false, scopes: { oldestFirst: { order: [['id', 'ASC']] } } },
    );
  }

  static associate(): void {
    PlanComment.belongsTo(Plan, { foreignKey: 'planId', as: 'plan' });
    PlanComment.belongsTo(PlanAction, { foreignKey: 'actionId', as: 'action' });
    PlanComment.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  }
}
