import { Farm } from './farm.model';
import { Membership } from './membership.model';
import { FieldCropping } from './field-cropping.model';
import { FieldGround } from './field-ground.model';
import { Assessment } from './assessment.model';
import { SoilPhoto } from './soil-photo.model';
import { SoilSample } from './soil-sample.model';
import { FieldTerrain } from './field-terrain.model';
import { DataTypes, Model, Op, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type Transaction } from 'sequelize';
import type { MultiPolygon } from 'geojson';

export class Field extends Model<InferAttributes<Field>, InferCreationAttributes<Field>> {
  declare id: CreationOptional<number>;
  declare farmId: number;
  declare name: string;
  declare geom: MultiPolygon;
  /** Ellipsoidal (WGS84) area from PostGIS geography. */
  declare areaM2: number;
  declare perimeterM: number;
  declare ownerMembershipId: number | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Field.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        farmId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        geom: { type: DataTypes.GEOMETRY('MULTIPOLYGON', 4326), allowNull: false },
        areaM2: { type: DataTypes.DOUBLE, allowNull: false },
        perimeterM: { type: DataTypes.DOUBLE, allowNull: false },
        ownerMembershipId: { type: DataTypes.INTEGER, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'fields' },
    );
  }

  /**
   * A boundary as Sequelize writes it (ST_GeomFromGeoJSON), its CRS named so PostGIS stores
   * SRID 4326 whatever its default for GeoJSON without one.
   */
  static storedGeometry(geometry: MultiPolygon): MultiPolygon {
    return { ...geometry, crs: { type: 'name', properties: { name: 'EPSG:4326' } } } as MultiPolygon;
  }

  /** How many of these ids are fields of the farm (a check that every id given belongs to it). */
  static countOfFarm(farmId: number, ids: number[], transaction?: Transaction): Promise<number> {
    return Field.count({ where: { farmId, id: { [Op.in]: ids } }, transaction });
  }

  /** Field id → owning membership, for the farm's owned fields. */
  static async ownersOfFarm(farmId: number): Promise<{ id: number; ownerMembershipId: number }[]> {
    const rows = await Field.findAll({ attributes: ['id', 'ownerMembershipId'], where: { farmId, ownerMembershipId: { [Op.ne]: null } }, order: [['id', 'ASC']] });
    return rows.map((r) => ({ id: r.id, ownerMembershipId: r.ownerMembershipId! }));
  }

  /**
   * Makes exactly these fields of the farm the membership's own (a landowner's); fields it owned
   * before and not listed are no longer owned. Each changed field's version moves on.
   */
  static async setOwnedFields(farmId: number, membershipId: number, fieldIds: number[], transaction: Transaction): Promise<void> {
    const bump = { version: Field.sequelize!.literal('version + 1') as unknown as number };
    await Field.update({ ownerMembershipId: null, ...bump }, { where: { farmId, ownerMembershipId: membershipId, id: { [Op.notIn]: fieldIds.length ? fieldIds : [0] } }, transaction });
    if (fieldIds.length) {
      await Field.update(
        { ownerMembershipId: membershipId, ...bump },
        { where: { farmId, id: { [Op.in]: fieldIds }, [Op.or]: [{ ownerMembershipId: null }, { ownerMembershipId: { [Op.ne]: membershipId } }] }, transaction },
      );
    }
  }

  /** The users who own these fields as landowners. */
  static async ownerUserIdsOf(fieldIds: number[], transaction?: Transaction): Promise<number[]> {
    if (!fieldIds.length) return [];
    const fields = await Field.findAll({ attributes: ['ownerMembershipId'], where: { id: { [Op.in]: fieldIds }, ownerMembershipId: { [Op.ne]: null } }, transaction });
    const owners = await Membership.findAll({ attributes: ['userId'], where: { id: { [Op.in]: fields.map((f) => f.ownerMembershipId!) }, role: 'landowner' }, transaction });
    return [...new Set(owners.map((m) => m.userId))];
  }

  static associate(): void {
    Field.belongsTo(Farm, { foreignKey: 'farmId', as: 'farm' });
    Field.belongsTo(Membership, { foreignKey: 'ownerMembershipId', as: 'owner' });
    Field.hasMany(FieldCropping, { foreignKey: 'fieldId', as: 'croppings' });
    Field.hasOne(FieldGround, { foreignKey: 'fieldId', as: 'ground' });
    Field.hasMany(Assessment, { foreignKey: 'fieldId', as: 'assessments' });
    Field.hasMany(SoilSample, { foreignKey: 'fieldId', as: 'soilSamples' });
    Field.hasMany(SoilPhoto, { foreignKey: 'fieldId', as: 'soilPhotos' });
    Field.hasOne(FieldTerrain, { foreignKey: 'fieldId', as: 'terrain' });
  }
}
