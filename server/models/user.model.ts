import { Membership, type MembershipJson } from './membership.model';
import { DataTypes, Model, QueryTypes, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare units: CreationOptional<'ha' | 'ac'>;
  declare isAdmin: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    User.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        email: { type: DataTypes.TEXT, allowNull: false, unique: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        passwordHash: { type: DataTypes.TEXT, allowNull: false },
        units: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'ha' },
        isAdmin: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users' },
    );
  }

  /**
   * The user of a live session and their memberships (as rows: an advisor may have hundreds, and a
   * route needs one), read on every request in one round trip: the session check, and the farm and
   * field access checks, then need no query of their own. A session ended (signed out, a new
   * password) or expired finds nobody. A plain SELECT mapped onto the model, because findByPk's
   * generic query path costs the API more than the query itself.
   */
  static async findSignedIn(userId: number, sessionTokenHash: string): Promise<{ user: User; memberships: MembershipJson[] } | null> {
    const [row] = await User.sequelize!.query<InferAttributes<User> & { memberships: MembershipJson[] }>(
      `SELECT u.id, u.email, u.name, u.password_hash AS "passwordHash", u.units, u.is_admin AS "isAdmin",
              u.created_at AS "createdAt", u.updated_at AS "updatedAt",
              COALESCE((SELECT json_agg(json_build_object('id', m.id, 'userId', m.user_id, 'farmId', m.farm_id, 'role', m.role,
                                                          'createdAt', m.created_at, 'updatedAt', m.updated_at) ORDER BY m.farm_id)
                          FROM memberships m WHERE m.user_id = u.id), '[]') AS memberships
         FROM user_sessions s JOIN users u ON u.id = s.user_id
        WHERE s.token_hash = $hash AND s.user_id = $userId AND s.expires_at > now()`,
      { bind: { hash: sessionTokenHash, userId }, type: QueryTypes.SELECT },
    );
    if (!row) return null;
    const { memberships, ...attributes } = row;
    return { user: User.build(attributes, { isNewRecord: false, raw: true }), memberships };
  }

  static associate(): void {
    User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  }
}
