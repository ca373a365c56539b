import { Field } from './field.model';
import { Season } from './season.model';
import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type CreationOptional, type Sequelize, type NonAttribute } from 'sequelize';
import type { FieldAssessment, StoredBoardFigures } from '../../shared/schemas/assessment';
import type { EstimateInput } from '../../shared/schemas/estimate';

/**
 * One field's assessment for one season, stored when an input changes: what went in, the
 * engine's answer, and the figures the priority board shows, so reading them runs no engine.
 */
export class Assessment extends Model<InferAttributes<Assessment>, InferCreationAttributes<Assessment>> {
  declare id: CreationOptional<number>;
  declare fieldId: number;
  declare seasonId: number;
  /** The engine input built from the gathered inputs (null while something is missing). */
  declare inputs: { estimateInput: EstimateInput | null };
  declare results: FieldAssessment;
  declare boardRow: StoredBoardFigures;
  declare engineVersion: string;
  declare computedAt: CreationOptional<Date>;
  declare season?: NonAttribute<Season>;
  declare field?: NonAttribute<Field>;

  static initModel(sequelize: Sequelize): void {
    Assessment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fieldId: { type: DataTypes.INTEGER, allowNull: false },
        seasonId: { type: DataTypes.INTEGER, allowNull: false },
        inputs: { type: DataTypes.JSONB, allowNull: false },
        results: { type: DataTypes.JSONB, allowNull: false },
        boardRow: { type: DataTypes.JSONB, allowNull: false },
        engineVersion: { type: DataTypes.TEXT, allowNull: false },
        computedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'assessments', timestamps: false },
    );
  }

  /** Every stored assessment of a farm's fields, with the season's label and the field's name (A across seasons). */
  static async ofFarmAcrossSeasons(farmId: number): Promise<Assessment[]> {
    return Assessment.findAll({
      attributes: ['fieldId', 'seasonId', 'boardRow'],
      include: [
        { model: Season, as: 'season', attributes: ['label'], where: { farmId } },
        { model: Field, as: 'field', attributes: ['name'] },
      ],
    });
  }

  static associate(): void {
    Assessment.belongsTo(Field, { foreignKey: 'fieldId', as: 'field' });
    Assessment.belongsTo(Season, { foreignKey: 'seasonId', as: 'season' });
  }
}
