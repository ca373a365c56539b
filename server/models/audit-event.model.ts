import { Farm } from './farm.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';

/** Who changed what, when. Written in the same transaction as the change. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare userId: number | null;
  declare farmId: number | null;
  declare entity: string;
  declare entityId: number | null;
  declare action: string;
  declare detail: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuditEvent.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        userId: DataTypes.INTEGER,
        farmId: DataTypes.INTEGER,
        entity: { type: DataTypes.TEXT, allowNull: false },
        entityId: DataTypes.INTEGER,
        action: { type: DataTypes.TEXT, allowNull: false },
        detail: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_events', updatedAt: false },
    );
  }

  /** A farm's newest events, newest first. */
  static async newestOfFarm(farmId: number, limit: number): Promise<AuditEvent[]> {
    return AuditEvent.findAll({ where: { farmId }, order: [['createdAt', 'DESC'], ['id', 'DESC']], limit });
  }

  static associate(): void {
    AuditEvent.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    AuditEvent.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  }
}
