import { Farm } from './farm.model';
import { User } from './user.model';
import { DataTypes, Model, Op, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type Transaction, type NonAttribute } from 'sequelize';
import type { Role } from '../../shared/schemas/auth';

/** An e-mailed invitation to join a farm with a role; the link's token is stored as its SHA-256 hash. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare farmId: number;
  declare email: string;
  declare role: Role;
  /** For a landowner: the fields that are theirs once they accept. */
  declare fieldIds: CreationOptional<number[]>;
  declare tokenHash: string;
  declare invitedBy: number | null;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare acceptedBy: CreationOptional<number | null>;
  declare cancelledAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare farm?: NonAttribute<Farm>;
  declare inviter?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    Invitation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        farmId: { type: DataTypes.INTEGER, allowNull: false },
        email: { type: DataTypes.TEXT, allowNull: false },
        role: { type: DataTypes.TEXT, allowNull: false },
        fieldIds: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false, defaultValue: [] },
        tokenHash: { type: DataTypes.TEXT, allowNull: false, unique: true },
        invitedBy: DataTypes.INTEGER,
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        acceptedAt: DataTypes.DATE,
        acceptedBy: DataTypes.INTEGER,
        cancelledAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'invitations' },
    );
  }

  static associate(): void {
    Invitation.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    Invitation.belongsTo(User, { foreignKey: 'invitedBy', as: 'inviter' });
  }

  /** The invitation behind a link, with its farm and who sent it, locked when a transaction is given. */
  static byTokenHash(tokenHash: string, transaction?: Transaction): Promise<Invitation | null> {
    return Invitation.findOne({
      where: { tokenHash },
      include: [
        { model: Farm, as: 'farm', attributes: ['id', 'name'] },
        { model: User, as: 'inviter', attributes: ['id', 'name'] },
      ],
      transaction,
      ...(transaction ? { lock: { level: transaction.LOCK.UPDATE, of: Invitation } } : {}),
    });
  }

  /** Invitations of a farm nobody has answered yet and that still work. */
  static openOfFarm(farmId: number): Promise<Invitation[]> {
    return Invitation.findAll({
      where: { farmId, acceptedAt: null, cancelledAt: null, expiresAt: { [Op.gt]: new Date() } },
      order: [['createdAt', 'DESC']],
    });
  }

  /** Older open invitations of the same address to the same farm stop working when a new one is sent. */
  static async cancelOpen(farmId: number, email: string, transaction: Transaction): Promise<void> {
    await Invitation.update({ cancelledAt: new Date() }, { where: { farmId, email, acceptedAt: null, cancelledAt: null }, transaction });
  }

  static countSentBy(userId: number, since: Date): Promise<number> {
    return Invitation.count({ where: { invitedBy: userId, createdAt: { [Op.gte]: since } } });
  }

  static countSentTo(email: string, since: Date): Promise<number> {
    return Invitation.count({ where: { email, createdAt: { [Op.gte]: since } } });
  }
}
