import { Field } from './field.model';
import { SoilPhoto } from './soil-photo.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type NonAttribute, type Sequelize } from 'sequelize';
import type { FeelGrit } from '../../shared/schemas/soils';

/**
 * One soil check of a field: lab results or a feel test. Sand/silt/clay are stored renormalised
 * to 100 % (separatesSumPct keeps what was typed); texture and drainage class are derived on write.
 */
export class SoilSample extends Model<InferAttributes<SoilSample>, InferCreationAttributes<SoilSample>> {
  declare id: CreationOptional<number>;
  declare fieldId: number;
  declare kind: 'lab' | 'feel';
  declare label: string | null;
  /** 'YYYY-MM-DD' */
  declare sampledOn: string | null;
  declare depthTopCm: number | null;
  declare depthBottomCm: number | null;
  declare sandPct: number | null;
  declare siltPct: number | null;
  declare clayPct: number | null;
  declare separatesSumPct: number | null;
  declare organicMatterPct: number | null;
  declare ph: number | null;
  declare bufferPh: number | null;
  declare bufferMethod: 'smp' | 'mehlich' | null;
  declare depthToGrayCm: number | null;
  declare describedToCm: number | null;
  declare bulkDensityMgM3: number | null;
  declare cecCmolKg: number | null;
  declare espPct: number | null;
  /** GeoJSON Point in WGS84 where the check was taken (Sequelize adds a `crs` member when reading). */
  declare position: { type: 'Point'; coordinates: number[] } | null;
  declare positionAccuracyM: number | null;
  /** The browser's key for this check (a UUID): a check sent twice is stored once. */
  declare clientKey: string | null;
  declare feelBalls: boolean | null;
  declare feelRibbonCm: number | null;
  declare feelGrit: FeelGrit | null;
  declare ribbonClass: string | null;
  declare textureClass: string | null;
  declare textureSource: string | null;
  declare drainageClass: string | null;
  declare notWorthAmending: boolean | null;
  declare drainageSource: string | null;
  declare version: CreationOptional<number>;
  declare createdBy: number | null;
  declare updatedBy: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  /** Loaded only when included. */
  declare field?: NonAttribute<Field>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    // A fresh definition per column: Sequelize writes each column's name into its definition object.
    const double = () => ({ type: DataTypes.DOUBLE, allowNull: true });
    SoilSample.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fieldId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false },
        label: DataTypes.TEXT,
        sampledOn: DataTypes.DATEONLY,
        depthTopCm: double(),
        depthBottomCm: double(),
        sandPct: double(),
        siltPct: double(),
        clayPct: double(),
        separatesSumPct: double(),
        organicMatterPct: double(),
        ph: double(),
        bufferPh: double(),
        bufferMethod: DataTypes.TEXT,
        depthToGrayCm: double(),
        describedToCm: double(),
        bulkDensityMgM3: double(),
        cecCmolKg: double(),
        espPct: double(),
        position: { type: DataTypes.GEOMETRY('POINT', 4326), allowNull: true },
        positionAccuracyM: double(),
        clientKey: DataTypes.UUID,
        feelBalls: DataTypes.BOOLEAN,
        feelRibbonCm: double(),
        feelGrit: DataTypes.TEXT,
        ribbonClass: DataTypes.TEXT,
        textureClass: DataTypes.TEXT,
        textureSource: DataTypes.TEXT,
        drainageClass: DataTypes.TEXT,
        notWorthAmending: DataTypes.BOOLEAN,
        drainageSource: DataTypes.TEXT,
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdBy: DataTypes.INTEGER,
        updatedBy: DataTypes.INTEGER,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      {
        sequelize,
        tableName: 'soil_samples',
        // Undated samples after dated ones; the summary's feel-test tie goes to the latest.
        scopes: { oldestFirst: { order: [['sampledOn', 'ASC NULLS LAST'], ['id', 'ASC']] } },
      },
    );
  }

  static associate(): void {
    SoilSample.belongsTo(Field, { foreignKey: 'fieldId', as: 'field' });
    SoilSample.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
    SoilSample.belongsTo(User, { foreignKey: 'updatedBy', as: 'editor' });
    SoilSample.hasMany(SoilPhoto, { foreignKey: 'sampleId', as: 'photos' });
  }
}
