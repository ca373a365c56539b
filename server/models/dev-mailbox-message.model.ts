import { DataTypes, Model, Op, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';

/** A message the local fake mail server received over SMTP (development and tests only). */
export class DevMailboxMessage extends Model<InferAttributes<DevMailboxMessage>, InferCreationAttributes<DevMailboxMessage>> {
  declare id: CreationOptional<number>;
  declare envelopeFrom: string;
  declare envelopeTo: string[];
  declare toHeader: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string;
  declare receivedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    DevMailboxMessage.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        envelopeFrom: { type: DataTypes.TEXT, allowNull: false },
        envelopeTo: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false },
        toHeader: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        htmlBody: { type: DataTypes.TEXT, allowNull: false },
        receivedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'dev_mailbox_messages', timestamps: false },
    );
  }

  static associate(): void {}

  /** Newest first; `to` narrows to one address (tests and the dev mailbox's filter). */
  static newest(limit: number, to?: string): Promise<DevMailboxMessage[]> {
    return DevMailboxMessage.findAll({
      where: to ? { envelopeTo: { [Op.contains]: [to] } } : {},
      order: [['id', 'DESC']],
      limit,
    });
  }
}
