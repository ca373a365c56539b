import { User } from './user.model';
import { DataTypes, Model, Op, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { NoticeKind } from '../../shared/schemas/people';

/** A person's choice for one kind of notice; without a row, the notice is on. */
export class NoticeSetting extends Model<InferAttributes<NoticeSetting>, InferCreationAttributes<NoticeSetting>> {
  declare userId: number;
  declare kind: NoticeKind;
  declare enabled: boolean;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    NoticeSetting.init(
      {
        userId: { type: DataTypes.INTEGER, primaryKey: true },
        kind: { type: DataTypes.TEXT, primaryKey: true },
        enabled: { type: DataTypes.BOOLEAN, allowNull: false },
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'notice_settings', createdAt: false },
    );
  }

  static associate(): void {
    NoticeSetting.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  }

  static async ofUser(userId: number): Promise<Map<NoticeKind, boolean>> {
    const rows = await NoticeSetting.findAll({ where: { userId } });
    return new Map(rows.map((r) => [r.kind, r.enabled]));
  }

  /** Of these users, the ones who turned this kind of notice off. */
  static async turnedOff(userIds: number[], kind: NoticeKind): Promise<Set<number>> {
    if (!userIds.length) return new Set();
    const rows = await NoticeSetting.findAll({ attributes: ['userId'], where: { userId: { [Op.in]: userIds }, kind, enabled: false } });
    return new Set(rows.map((r) => r.userId));
  }

  static async put(userId: number, settings: Partial<Record<NoticeKind, boolean>>): Promise<void> {
    const rows = Object.entries(settings).map(([kind, enabled]) => ({ userId, kind: kind as NoticeKind, enabled: !!enabled }));
    if (rows.length) await NoticeSetting.bulkCreate(rows, { updateOnDuplicate: ['enabled', 'updatedAt'] });
  }
}
