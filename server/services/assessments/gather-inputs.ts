// Gathers the inputs of every field in scope for every season of its farm at once: one query
// per input table for the whole scope (seasons, fields, climate, typed ground, cropping,
// terrain figures, factor overrides), and the soil summary of each field.
import { Op, type Sequelize, type Transaction } from 'sequelize';
import { FarmClimate, Field, FieldCropping, FieldFactorOverride, FieldGround, FieldTerrain, Season, User } from '../../models';
import { presentFactorOverride } from '../../presenters/factor-override.presenter';
import { presentClimate, presentCropping, presentGround } from '../../presenters/seasons.presenter';
import { fieldSoilSummaries } from '../soils/field-soil-summary';
import type { GatheredInputs, TerrainFigures } from './gathered-inputs';

export type AssessmentScope = { farmId: number; /** Only these fields; every field of the farm when omitted. */ fieldIds?: number[] };

type Edited = { editor?: User | null };
const editorName = (row: Edited): string | null => row.editor?.name ?? null;
const withEditor = { model: User, as: 'editor', attributes: ['name'] };

/** The inputs of each field in scope × each season of its farm. */
export async function gatherInputs(sequelize: Sequelize, scope: AssessmentScope, transaction?: Transaction): Promise<GatheredInputs[]> {
  // One after another: queries in one transaction share its connection.
  const seasons = await Season.findAll({ where: { farmId: scope.farmId }, transaction });
  const fields = await Field.findAll({
    where: { farmId: scope.farmId, ...(scope.fieldIds ? { id: { [Op.in]: scope.fieldIds } } : {}) },
    attributes: ['id', 'farmId', 'name', 'areaM2', 'version'],
    transaction,
  });
  if (seasons.length === 0 || fields.length === 0) return [];
  const fieldIds = fields.map((f) => f.id);
  const climate = await FarmClimate.findByPk(scope.farmId, { include: [withEditor], transaction });
  const grounds = await FieldGround.findAll({ where: { fieldId: { [Op.in]: fieldIds } }, include: [withEditor], transaction });
  const croppings = await FieldCropping.findAll({ where: { fieldId: { [Op.in]: fieldIds }, seasonId: { [Op.in]: seasons.map((s) => s.id) } }, include: [withEditor], transaction });
  const terrain = await FieldTerrain.findAll({ where: { fieldId: { [Op.in]: fieldIds } }, transaction });
  const overrides = await FieldFactorOverride.findAll({ where: { fieldId: { [Op.in]: fieldIds } }, include: [{ model: User, as: 'setter', attributes: ['name'] }], transaction });
  const soilBy = await fieldSoilSummaries(sequelize, { farmId: scope.farmId, fieldIds }, transaction);
  const groundBy = new Map(grounds.map((g) => [g.fieldId, g]));
  const croppingBy = new Map(croppings.map((c) => [`${c.fieldId}:${c.seasonId}`, c]));
  const terrainBy = new Map(terrain.map((t) => [t.fieldId, t]));
  const overridesBy = new Map<number, GatheredInputs['overrides']>();
  for (const o of overrides) overridesBy.set(o.fieldId, { ...overridesBy.get(o.fieldId), [o.factor]: presentFactorOverride(o) });
  const climateShown = climate ? { ...presentClimate(climate), typedBy: editorName(climate as Edited) } : null;

  const out: GatheredInputs[] = [];
  for (const f of fields) {
    const ground = groundBy.get(f.id);
    const t = terrainBy.get(f.id);
    const terrainFigures: TerrainFigures | null = t
      ? {
          meanSlopePct: t.stats.meanSlopePct,
          meanLS: t.stats.meanLS,
          cellCount: t.stats.cellCount,
          cellSizeM: t.stats.cellSizeM,
          upToDate: t.fieldVersion === f.version && !t.stale,
          stale: t.stale,
          concentratedFlowCells: t.stats.concentratedFlow?.cellCount ?? 0,
        }
      : null;
    for (const s of seasons) {
      const cropping = croppingBy.get(`${f.id}:${s.id}`);
      out.push({
        field: { id: f.id, farmId: f.farmId, name: f.name, areaHa: f.areaM2 / 10_000, version: f.version },
        season: { id: s.id, label: s.label },
        climate: climateShown,
        ground: ground ? { ...presentGround(ground), typedBy: editorName(ground as Edited) } : null,
        terrain: terrainFigures,
        soil: soilBy.get(f.id)!,
        cropping: cropping ? { ...presentCropping(cropping, s.label), typedBy: editorName(cropping as Edited) } : null,
        overrides: overridesBy.get(f.id) ?? {},
      });
    }
  }
  return out;
}
