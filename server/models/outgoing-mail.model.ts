import { DataTypes, Model, Op, UniqueConstraintError, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type Transaction } from 'sequelize';

export type MailState = 'queued' | 'sending' | 'sent' | 'failed';
export type NewMail = Pick<InferAttributes<OutgoingMail>, 'kind' | 'toAddress' | 'subject' | 'textBody' | 'htmlBody' | 'userId' | 'farmId' | 'dedupeKey'>;

/**
 * The outbox: every mail the product sends, written in the same transaction as what caused it,
 * then sent by the job queue (with retries). The row says whether it went out.
 */
export class OutgoingMail extends Model<InferAttributes<OutgoingMail>, InferCreationAttributes<OutgoingMail>> {
  declare id: CreationOptional<number>;
  declare kind: string;
  declare toAddress: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string;
  declare userId: number | null;
  declare farmId: number | null;
  declare dedupeKey: string | null;
  declare state: CreationOptional<MailState>;
  declare attempts: CreationOptional<number>;
  declare lastError: CreationOptional<string | null>;
  declare sentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    OutgoingMail.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.TEXT, allowNull: false },
        toAddress: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        htmlBody: { type: DataTypes.TEXT, allowNull: false },
        userId: DataTypes.INTEGER,
        farmId: DataTypes.INTEGER,
        dedupeKey: { type: DataTypes.TEXT, unique: true },
        state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'queued' },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastError: DataTypes.TEXT,
        sentAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'outgoing_mails' },
    );
  }

  static associate(): void {}

  /**
   * Adds a mail to the outbox; a mail whose dedupe key is already there (a reminder sent before)
   * is not added again and gives null. A savepoint keeps the caller's transaction usable.
   */
  static async add(mail: NewMail, transaction: Transaction): Promise<OutgoingMail | null> {
    if (mail.dedupeKey && (await OutgoingMail.count({ where: { dedupeKey: mail.dedupeKey }, transaction }))) return null;
    try {
      return await OutgoingMail.sequelize!.transaction({ transaction }, (t) => OutgoingMail.create(mail, { transaction: t }));
    } catch (e) {
      if (e instanceof UniqueConstraintError && mail.dedupeKey) return null;
      throw e;
    }
  }

  /** Takes a queued mail for sending (so two workers never send it twice); null when it is not waiting. */
  static async claim(id: number): Promise<OutgoingMail | null> {
    const [count, rows] = await OutgoingMail.update(
      { state: 'sending', attempts: OutgoingMail.sequelize!.literal('attempts + 1') as unknown as number },
      { where: { id, state: { [Op.in]: ['queued', 'failed'] } }, returning: true },
    );
    return count ? rows[0] : null;
  }

  /** Mails a stopped process left waiting (not sent within `olderThanMs`), to queue again at start-up. */
  static async stuckIds(olderThanMs: number): Promise<number[]> {
    const rows = await OutgoingMail.findAll({
      attributes: ['id'],
      where: { state: { [Op.in]: ['queued', 'sending'] }, updatedAt: { [Op.lt]: new Date(Date.now() - olderThanMs) } },
    });
    await OutgoingMail.update({ state: 'queued' }, { where: { id: rows.map((r) => r.id), state: 'sending' } });
    return rows.map((r) => Number(r.id));
  }
}
