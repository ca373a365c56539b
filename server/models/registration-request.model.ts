import { DataTypes, Model, Op, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type Transaction } from 'sequelize';

/**
 * A request to create an account, waiting for its mailed link (only the token's SHA-256 hash is
 * kept). For an address that already had an account, passwordHash and tokenHash are null.
 */
export class RegistrationRequest extends Model<InferAttributes<RegistrationRequest>, InferCreationAttributes<RegistrationRequest>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare farmName: string;
  declare passwordHash: string | null;
  declare tokenHash: string | null;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    RegistrationRequest.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        email: { type: DataTypes.TEXT, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        farmName: { type: DataTypes.TEXT, allowNull: false },
        passwordHash: DataTypes.TEXT,
        tokenHash: { type: DataTypes.TEXT, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'registration_requests', updatedAt: false },
    );
  }

  static associate(): void {}

  /** Serialises requests for one address until the transaction ends, so its limit holds under a burst. */
  static async lockAddress(email: string, transaction: Transaction): Promise<void> {
    await RegistrationRequest.sequelize!.query('SELECT pg_advisory_xact_lock(hashtext(:key))', {
      replacements: { key: `registration:${email}` },
      transaction,
    });
  }

  static countFor(email: string, since: Date, transaction: Transaction): Promise<number> {
    return RegistrationRequest.count({ where: { email, createdAt: { [Op.gte]: since } }, transaction });
  }

  static byTokenHash(tokenHash: string, transaction: Transaction): Promise<RegistrationRequest | null> {
    return RegistrationRequest.findOne({ where: { tokenHash }, transaction, lock: transaction.LOCK.UPDATE });
  }

  /** Once one link of an address is used, its other links stop working. */
  static async closeOpenOf(email: string, transaction: Transaction): Promise<void> {
    await RegistrationRequest.update({ usedAt: new Date() }, { where: { email, usedAt: null }, transaction });
  }
}
