import { Plan } from './plan.model';
import { Field } from './field.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type NonAttribute, type Transaction } from 'sequelize';
import type { ActionStatus, ActionTreatment } from '../../shared/schemas/plans';

/** One piece of planned work on one field: a treatment (or typed work), amounts, cost, when, who; versioned. */
export class PlanAction extends Model<InferAttributes<PlanAction>, InferCreationAttributes<PlanAction>> {
  declare id: CreationOptional<number>;
  declare planId: number;
  declare fieldId: number;
  declare treatment: ActionTreatment;
  declare title: string;
  declare quantity: number | null;
  declare unit: string | null;
  declare cost: number | null;
  declare currency: string;
  /** DATEONLY: 'YYYY-MM-DD' text both ways. */
  declare plannedOn: string | null;
  declare plannedFrom: string | null;
  declare plannedTo: string | null;
  declare doneBy: string | null;
  declare status: CreationOptional<ActionStatus>;
  declare notes: string | null;
  declare version: CreationOptional<number>;
  declare createdBy: number | null;
  declare updatedBy: number | null;
  /** Follow-up, recorded without changing the plan: the day done, the amount applied, who recorded it and when. */
  declare doneOn: CreationOptional<string | null>;
  declare appliedQuantity: CreationOptional<number | null>;
  declare doneNote: CreationOptional<string | null>;
  declare doneByUser: CreationOptional<number | null>;
  declare doneAt: CreationOptional<Date | null>;
  /** The advisor's check of the work done. */
  declare checkedBy: CreationOptional<number | null>;
  declare checkedAt: CreationOptional<Date | null>;
  /** A photo of the work (storage keys made by the server). */
  declare photoKey: CreationOptional<string | null>;
  declare photoThumbnailKey: CreationOptional<string | null>;
  declare photoContentType: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare field?: NonAttribute<Field>;
  declare plan?: NonAttribute<Plan>;

  static initModel(sequelize: Sequelize): void {
    PlanAction.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        planId: { type: DataTypes.INTEGER, allowNull: false },
        fieldId: { type: DataTypes.INTEGER, allowNull: false },
        treatment: { type: DataTypes.TEXT, allowNull: false },
        title: { type: DataTypes.TEXT, allowNull: false },
        quantity: DataTypes.DOUBLE,
        unit: DataTypes.TEXT,
        cost: DataTypes.DOUBLE,
        currency: { type: DataTypes.TEXT, allowNull: false },
        plannedOn: DataTypes.DATEONLY,
        plannedFrom: DataTypes.DATEONLY,
        plannedTo: DataTypes.DATEONLY,
        doneBy: DataTypes.TEXT,
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'planned' },
        notes: DataTypes.TEXT,
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdBy: DataTypes.INTEGER,
        updatedBy: DataTypes.INTEGER,
        doneOn: DataTypes.DATEONLY,
        appliedQuantity: DataTypes.DOUBLE,
        doneNote: DataTypes.TEXT,
        doneByUser: DataTypes.INTEGER,
        doneAt: DataTypes.DATE,
        checkedBy: DataTypes.INTEGER,
        checkedAt: DataTypes.DATE,
        photoKey: DataTypes.TEXT,
        photoThumbnailKey: DataTypes.TEXT,
        photoContentType: DataTypes.TEXT,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize,
        tableName: 'plan_actions',
        // Field by field, then in the order they were added.
        scopes: { inOrder: { order: [['fieldId', 'ASC'], ['id', 'ASC']] } },
      },
    );
  }

  /** The fields a plan's actions are on. */
  static async fieldIdsOfPlan(planId: number, transaction?: Transaction): Promise<number[]> {
    const rows = await PlanAction.findAll({ attributes: ['fieldId'], where: { planId }, group: ['fieldId'], transaction });
    return rows.map((r) => r.fieldId);
  }

  static associate(): void {
    PlanAction.belongsTo(Plan, { foreignKey: 'planId', as: 'plan' });
    PlanAction.belongsTo(Field, { foreignKey: 'fieldId', as: 'field' });
    PlanAction.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
    PlanAction.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor' });
  }
}
