import { Farm } from './farm.model';
import { Op, DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type Transaction } from 'sequelize';

export type JobKind = 'terrain';
export type JobState = 'queued' | 'running' | 'done' | 'failed';

/** What a person sees of a background job; the queue itself (pg-boss) keeps its own tables. */
export class ProcessingJob extends Model<InferAttributes<ProcessingJob>, InferCreationAttributes<ProcessingJob>> {
  declare id: string;
  declare farmId: number;
  declare kind: JobKind;
  declare state: CreationOptional<JobState>;
  /** 0..1 */
  declare progress: CreationOptional<number>;
  declare message: CreationOptional<string>;
  declare payload: CreationOptional<Record<string, unknown>>;
  declare createdBy: number | null;
  /** Inputs changed while this run was running: another run follows it. */
  declare rerunRequested: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ProcessingJob.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true },
        farmId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false },
        state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'queued' },
        progress: { type: DataTypes.REAL, allowNull: false, defaultValue: 0 },
        message: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'Waiting to start' },
        payload: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdBy: DataTypes.INTEGER,
        rerunRequested: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'processing_jobs' },
    );
  }

  static associate(): void {
    ProcessingJob.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
  }

  static latestOfFarm(farmId: number, kind: JobKind): Promise<ProcessingJob | null> {
    return ProcessingJob.findOne({ where: { farmId, kind }, order: [['createdAt', 'DESC']] });
  }

  /** The farm's job of this kind waiting or running, locked for the transaction when one is given. */
  static pendingOfFarm(farmId: number, kind: JobKind, transaction?: Transaction): Promise<ProcessingJob | null> {
    return ProcessingJob.findOne({ where: { farmId, kind, state: { [Op.in]: ['queued', 'running'] } }, transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
  }

  /** How many jobs a person has waiting or running. */
  static pendingCountOfUser(userId: number, transaction?: Transaction): Promise<number> {
    return ProcessingJob.count({ where: { createdBy: userId, state: { [Op.in]: ['queued', 'running'] } }, transaction });
  }

  /** Whether a job of this kind is waiting or running for the farm. */
  static async pendingForFarm(farmId: number, kind: JobKind): Promise<boolean> {
    return (await ProcessingJob.count({ where: { farmId, kind, state: { [Op.in]: ['queued', 'running'] } } })) > 0;
  }
}
