import { User } from './user.model';
import { DataTypes, Model, Op, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type Transaction } from 'sequelize';

/**
 * A signed-in session, kept on the server so that signing out, a new password or a removal ends it
 * at once. The cookie carries the token; only its SHA-256 hash is stored.
 */
export class UserSession extends Model<InferAttributes<UserSession>, InferCreationAttributes<UserSession>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare tokenHash: string;
  declare expiresAt: Date;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    UserSession.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        tokenHash: { type: DataTypes.TEXT, allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'user_sessions', updatedAt: false },
    );
  }

  static associate(): void {
    UserSession.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  }

  /** Ends one session (signing out). */
  static async endByHash(tokenHash: string): Promise<void> {
    await UserSession.destroy({ where: { tokenHash } });
  }

  /** Ends every session of a user but the one kept (a new password ends the others at once). */
  static async endAllOf(userId: number, keepHash: string | null, transaction?: Transaction): Promise<void> {
    await UserSession.destroy({ where: { userId, ...(keepHash ? { tokenHash: { [Op.ne]: keepHash } } : {}) }, transaction });
  }

  /** Sessions past their end are no use to anyone; swept when the user signs in again. */
  static async removeExpiredOf(userId: number): Promise<void> {
    await UserSession.destroy({ where: { userId, expiresAt: { [Op.lte]: new Date() } } });
  }
}
