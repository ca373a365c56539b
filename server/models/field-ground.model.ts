import { Field } from './field.model';
import { User } from './user.model';
import { DataTypes, Model, Op, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize } from 'sequelize';

/** A field's typed slope and slope length (where no elevation model covers it) and its drainage; versioned. */
export class FieldGround extends Model<InferAttributes<FieldGround>, InferCreationAttributes<FieldGround>> {
  declare fieldId: number;
  declare slopePct: number | null;
  declare slopeLengthM: number | null;
  declare drained: CreationOptional<boolean>;
  declare drainedWaterTableDepthCm: number | null;
  declare version: CreationOptional<number>;
  declare updatedBy: number | null;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    FieldGround.init(
      {
        fieldId: { type: DataTypes.INTEGER, primaryKey: true },
        slopePct: DataTypes.REAL,
        slopeLengthM: DataTypes.REAL,
        drained: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        drainedWaterTableDepthCm: DataTypes.REAL,
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        updatedBy: DataTypes.INTEGER,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'field_grounds', createdAt: false },
    );
  }

  static associate(): void {
    FieldGround.belongsTo(Field, { foreignKey: 'fieldId', as: 'field' });
    FieldGround.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor' });
  }

  /** Slope lengths typed on the Ground tab for a farm's fields, metres by field id (they cap the DEM's flow length). */
  static async typedSlopeLengthsM(farmId: number): Promise<Map<number, number>> {
    const rows = await FieldGround.findAll({
      where: { slopeLengthM: { [Op.ne]: null } },
      attributes: ['fieldId', 'slopeLengthM'],
      include: [{ model: Field, as: 'field', attributes: [], where: { farmId } }],
    });
    return new Map(rows.map((r) => [r.fieldId, r.slopeLengthM as number]));
  }
}
