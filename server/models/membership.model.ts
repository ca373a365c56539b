import { User } from './user.model';
import { Farm } from './farm.model';
import { DataTypes, Model, Op, type Transaction, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';
import type { Role } from '../../shared/schemas/auth';

export type MembershipJson = { id: number; userId: number; farmId: number; role: Role; createdAt: string; updatedAt: string };

/** A person's role on one farm: rights are per farm. */
export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare farmId: number;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Membership.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        farmId: { type: DataTypes.INTEGER, allowNull: false },
        role: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'memberships' },
    );
  }

  /** A membership row as json_build_object gives it (dates as ISO text), as a model instance. */
  static fromJson(row: MembershipJson): Membership {
    return Membership.build({ ...row, createdAt: new Date(row.createdAt), updatedAt: new Date(row.updatedAt) }, { isNewRecord: false, raw: true });
  }

  /** The farm's members with their user rows, oldest first. */
  static ofFarmWithUsers(farmId: number): Promise<(Membership & { user: User })[]> {
    return Membership.findAll({ where: { farmId }, include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }], order: [['id', 'ASC']] }) as Promise<(Membership & { user: User })[]>;
  }

  /** The user ids of the farm's members in these roles. */
  static async userIdsOfFarm(farmId: number, roles: Role[], transaction?: Transaction): Promise<number[]> {
    const rows = await Membership.findAll({ attributes: ['userId'], where: { farmId, role: { [Op.in]: roles } }, transaction });
    return rows.map((r) => r.userId);
  }

  static countFarmers(farmId: number, transaction: Transaction): Promise<number> {
    return Membership.count({ where: { farmId, role: 'farmer' }, transaction });
  }

  static associate(): void {
    Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
    Membership.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
  }
}
