// Gathers what one field's assessment needs for a season: the farm's climate, the field's
// terrain (elevation model) or typed slope, soils, and cropping. Pure mapping to the
// engine's EstimateInput is in buildEstimateInput below; gaps are said in words.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { EstimateInput } from '../../shared/schemas/estimate';
import type { Climate, Cropping, Ground } from '../../shared/schemas/season';
import type { InputOrigin } from '../../shared/schemas/assessment';
import type { FieldFeature } from '../../shared/schemas/field';
import { fieldSoilSummary, type FieldSoilSummary } from './soils/field-soil-summary';
import { getClimate, getGround } from './climate-ground.service';
import { getCropping } from './seasons.service';

export type TerrainFigures = { meanSlopePct: number; meanLS: number | null; cellCount: number; cellSizeM?: number; upToDate: boolean; concentratedFlowCells: number };

export type GatheredInputs = {
  field: { id: number; farmId: number; name: string; areaHa: number; version: number };
  season: { id: number; label: string };
  climate: Climate | null;
  ground: Ground | null;
  terrain: TerrainFigures | null;
  soil: FieldSoilSummary;
  cropping: Cropping | null;
};

export async function gatherInputs(sequelize: Sequelize, field: FieldFeature, season: { id: number; label: string }): Promise<GatheredInputs> {
  const [terrainRow] = await sequelize.query<{ stats: TerrainFigures & { concentratedFlow?: { cellCount: number } }; field_version: number }>(
    `SELECT stats, field_version FROM field_terrain WHERE field_id = :id`,
    { replacements: { id: field.id }, type: QueryTypes.SELECT },
  );
  const [climate, ground, soil, cropping] = await Promise.all([
    getClimate(sequelize, field.properties.farmId),
    getGround(sequelize, field.id),
    fieldSoilSummary(sequelize, field.id),
    getCropping(sequelize, field.id, season.id),
  ]);
  const terrain = terrainRow
    ? { meanSlopePct: terrainRow.stats.meanSlopePct, meanLS: terrainRow.stats.meanLS, cellCount: terrainRow.stats.cellCount, cellSizeM: terrainRow.stats.cellSizeM, upToDate: terrainRow.field_version === field.properties.version, concentratedFlowCells: terrainRow.stats.concentratedFlow?.cellCount ?? 0 }
    : null;
  return {
    field: { id: field.id, farmId: field.properties.farmId, name: field.properties.name, areaHa: field.properties.areaHa, version: field.properties.version },
    season,
    climate,
    ground,
    terrain,
    soil,
    cropping,
  };
}

/** Slope length assumed for the support-practice limit when only a DEM gives the slope (common practice, no single source). */
export const ASSUMED_SLOPE_LENGTH_M = 50;

type Line = { key: string; label: string; value: string; origin: InputOrigin; note?: string };

/** TR-55 cover, treatment and hydrologic condition for a cropping record (TR-55 Tables 2-2b/2-2c). */
export function curveNumberCover(c: Cropping): { cover: string; treatment: string | null; condition: 'poor' | 'fair' | 'good' | null } {
  if (c.crop === 'pasture') {
    // TR-55 Table 2-2c note: poor < 50 % ground cover, fair 50–75 %, good > 75 %.
    const g = c.groundCoverPct ?? 0;
    return { cover: 'pasture', treatment: null, condition: g < 50 ? 'poor' : g <= 75 ? 'fair' : 'good' };
  }
  if (c.crop === 'hay or meadow') return { cover: 'meadow', treatment: null, condition: null };
  const cover = c.crop === 'small grain' ? 'small grain' : 'row crops';
  const layout = c.practice === 'terraces' ? 'contoured and terraced' : c.practice === 'contouring' || c.practice === 'strip cropping' ? 'contoured' : 'straight row';
  // TR-55 Table 2-2b note: "crop residue cover" applies when residue is on at least 5 % of the surface; good when ≥ 20 %.
  const residue = (c.residuePct ?? 0) >= 5 ? ' + crop residue' : '';
  const good = (c.residuePct ?? 0) >= 20 || !!c.coverCrop || c.tillage === 'no-till';
  return { cover, treatment: `${layout}${residue}`, condition: good ? 'good' : 'poor' };
}

export function buildEstimateInput(g: GatheredInputs): { input: EstimateInput | null; gaps: string[]; lines: Line[] } {
  const gaps: string[] = [];
  const lines: Line[] = [];
  const fmt = (x: number, d = 1) => x.toFixed(d);

  let r: EstimateInput['r'] | null = null;
  if (!g.climate) gaps.push("the farm's rainfall erosivity R (set the farm climate)");
  else if (g.climate.rFrom === 'record' && g.climate.rValue != null) {
    r = { from: 'value', value: g.climate.rValue, units: 'si' };
    const rec = g.climate.record;
    lines.push({ key: 'r', label: 'Rainfall erosivity R', value: `${fmt(g.climate.rValue, 0)} MJ·mm/(ha·h·yr)`, origin: 'derived', note: rec ? `from a rainfall record, ${rec.years} yr, ${rec.erosiveStorms} erosive storms (storm EI30, AH-703 ch. 2)` : 'from a rainfall record' });
  } else if (g.climate.rFrom === 'value' && g.climate.rValue != null) {
    r = { from: 'value', value: g.climate.rValue, units: 'si' };
    lines.push({ key: 'r', label: 'Rainfall erosivity R', value: `${fmt(g.climate.rValue, 0)} MJ·mm/(ha·h·yr)`, origin: 'typed' });
  } else if (g.climate.annualPrecipitationMm != null) {
    r = { from: 'precipitation', annualPrecipitationMm: g.climate.annualPrecipitationMm };
    lines.push({ key: 'r', label: 'Rainfall erosivity R', value: `from ${fmt(g.climate.annualPrecipitationMm, 0)} mm/yr of rain`, origin: 'derived' });
  }

  let k: EstimateInput['k'] | null = null;
  if (g.soil.kUs == null) gaps.push('soil erodibility K (add a soil check with texture, a feel test, or a soil map with K)');
  else {
    k = { from: 'value', value: g.soil.kUs, units: 'us' };
    lines.push({ key: 'k', label: 'Soil erodibility K', value: `${fmt(g.soil.kUs, 3)} (US units)`, origin: 'derived', note: g.soil.kSource ?? undefined });
  }

  let slopePct: number | null = null;
  let lsFromGrid: EstimateInput['lsFromGrid'];
  if (g.terrain) {
    slopePct = g.terrain.meanSlopePct;
    lines.push({ key: 'slope', label: 'Mean slope', value: `${fmt(slopePct)} %`, origin: 'derived', note: `elevation model, ${g.terrain.cellCount} cells${g.terrain.upToDate ? '' : ' (boundary changed: being recomputed)'}` });
    if (g.terrain.meanLS != null) {
      lsFromGrid = { value: g.terrain.meanLS, source: 'Desmet & Govers 1996 grid L × RUSLE S (McCool et al. 1987), D8 flow', method: `mean of ${g.terrain.cellCount} cells of the elevation model` };
    }
  } else if (g.ground?.slopePct != null) {
    slopePct = g.ground.slopePct;
    lines.push({ key: 'slope', label: 'Slope', value: `${fmt(slopePct)} %`, origin: 'typed' });
  } else gaps.push('slope (upload an elevation model, or type the slope % on the Ground tab)');

  let slopeLengthM: number | null = g.ground?.slopeLengthM ?? null;
  if (slopeLengthM != null) {
    lines.push({ key: 'length', label: 'Slope length', value: `${fmt(slopeLengthM, 0)} m`, origin: 'typed', ...(g.terrain ? { note: "also the longest flow path the elevation model's LS may use on this field" } : {}) });
  }
  else if (g.terrain) {
    slopeLengthM = ASSUMED_SLOPE_LENGTH_M;
    lines.push({ key: 'length', label: 'Slope length', value: `${ASSUMED_SLOPE_LENGTH_M} m`, origin: 'default', note: 'assumed for the practice limit only; LS comes from the elevation model (common practice, no single source)' });
  } else gaps.push('slope length (type it on the Ground tab)');

  let c: EstimateInput['c'] | null = null;
  let p: EstimateInput['p'] = { from: 'practice', practice: 'none' };
  if (!g.cropping) gaps.push(`cropping for season ${g.season.label}`);
  else {
    const cr = g.cropping;
    c = { from: 'table', crop: cr.crop, ...(cr.tillage ? { tillage: cr.tillage } : {}), ...(cr.residuePct != null ? { residuePct: cr.residuePct } : {}), coverCrop: !!cr.coverCrop, ...(cr.groundCoverPct != null ? { groundCoverPct: cr.groundCoverPct } : {}) };
    p = { from: 'practice', practice: cr.practice, ...(cr.terraceIntervalM != null ? { terraceIntervalM: cr.terraceIntervalM } : {}) };
    lines.push({ key: 'crop', label: 'Cropping', value: [cr.crop, cr.tillage, cr.residuePct != null ? `${cr.residuePct} % residue` : null, cr.coverCrop ? `cover crop: ${cr.coverCrop.species}` : null].filter(Boolean).join(', '), origin: 'typed' });
    lines.push({ key: 'practice', label: 'Support practice', value: cr.practice, origin: 'typed' });
  }

  lines.push({ key: 't', label: 'Soil-loss tolerance T', value: `${g.soil.tTonPerAcYr ?? 5} t/ac/yr`, origin: g.soil.tSource?.includes('[practice]') || g.soil.tTonPerAcYr == null ? 'default' : 'derived', note: g.soil.tSource ?? 'deep soil default [practice]' });

  let runoff: EstimateInput['runoff'];
  if (g.climate && g.cropping) {
    if (!g.soil.hsg) gaps.push('hydrologic soil group for runoff (a soil texture or soil map)');
    else {
      const cn = curveNumberCover(g.cropping);
      runoff = { rainfallMm: g.climate.designStormMm, hsg: g.soil.hsg as NonNullable<EstimateInput['runoff']>['hsg'], cover: cn.cover, treatment: cn.treatment, condition: cn.condition };
      lines.push({ key: 'storm', label: 'Design storm', value: `${fmt(g.climate.designStormMm, 0)} mm`, origin: 'typed' });
      lines.push({ key: 'hsg', label: 'Hydrologic soil group', value: g.soil.hsg, origin: 'derived' });
    }
  }

  if (!r || !k || slopePct == null || slopeLengthM == null || !c) return { input: null, gaps, lines };
  return {
    input: {
      r,
      k,
      slopePct,
      slopeLengthM,
      c,
      p,
      ...(g.soil.tTonPerAcYr != null ? { tTonPerAcYr: g.soil.tTonPerAcYr } : {}),
      areaHa: g.field.areaHa,
      ...(runoff ? { runoff } : {}),
      ...(lsFromGrid ? { lsFromGrid } : {}),
    },
    gaps,
    lines,
  };
}
