import { Field } from './field.model';
import { SoilSample } from './soil-sample.model';
import { User } from './user.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type NonAttribute, type Sequelize } from 'sequelize';

/** A soil profile photo of a field: the image and its thumbnail live in file storage under server-made keys. */
export class SoilPhoto extends Model<InferAttributes<SoilPhoto>, InferCreationAttributes<SoilPhoto>> {
  declare id: CreationOptional<number>;
  declare fieldId: number;
  declare sampleId: number | null;
  declare caption: string | null;
  declare imageKey: string;
  declare thumbnailKey: string;
  declare contentType: string;
  declare byteSize: number;
  declare width: number;
  declare height: number;
  declare thumbnailWidth: number;
  declare thumbnailHeight: number;
  /** The browser's key for this photo (a UUID): a photo sent twice is stored once. */
  declare clientKey: string | null;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  /** Loaded only when included. */
  declare field?: NonAttribute<Field>;

  static initModel(sequelize: Sequelize): void {
    const required = (type: typeof DataTypes.TEXT | typeof DataTypes.INTEGER) => ({ type, allowNull: false });
    SoilPhoto.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fieldId: required(DataTypes.INTEGER),
        sampleId: DataTypes.INTEGER,
        caption: DataTypes.TEXT,
        imageKey: required(DataTypes.TEXT),
        thumbnailKey: required(DataTypes.TEXT),
        contentType: required(DataTypes.TEXT),
        byteSize: required(DataTypes.INTEGER),
        width: required(DataTypes.INTEGER),
        height: required(DataTypes.INTEGER),
        thumbnailWidth: required(DataTypes.INTEGER),
        thumbnailHeight: required(DataTypes.INTEGER),
        clientKey: DataTypes.UUID,
        createdBy: DataTypes.INTEGER,
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'soil_photos', updatedAt: false },
    );
  }

  static associate(): void {
    SoilPhoto.belongsTo(Field, { foreignKey: 'fieldId', as: 'field' });
    SoilPhoto.belongsTo(SoilSample, { foreignKey: 'sampleId', as: 'sample' });
    SoilPhoto.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  }
}
