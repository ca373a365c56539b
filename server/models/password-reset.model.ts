import { User } from './user.model';
import { DataTypes, Model, Op, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type Transaction } from 'sequelize';

/** A "forgot password" link: one use, short-lived; only the token's SHA-256 hash is stored. */
export class PasswordReset extends Model<InferAttributes<PasswordReset>, InferCreationAttributes<PasswordReset>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PasswordReset.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        tokenHash: { type: DataTypes.TEXT, allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'password_resets', updatedAt: false },
    );
  }

  static associate(): void {
    PasswordReset.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  }

  static byTokenHash(tokenHash: string, transaction: Transaction): Promise<PasswordReset | null> {
    return PasswordReset.findOne({ where: { tokenHash }, transaction, lock: transaction.LOCK.UPDATE });
  }

  static countFor(userId: number, since: Date): Promise<number> {
    return PasswordReset.count({ where: { userId, createdAt: { [Op.gte]: since } } });
  }

  /** A used link, or a newer one, makes every other open link of the user stop working. */
  static async closeOpenOf(userId: number, transaction: Transaction): Promise<void> {
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId, usedAt: null }, transaction });
  }
}
