// Reads soil samples and shapes them as the API's SoilSample.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { FeelGrit, SoilSample } from '../../../shared/schemas/soils';

export type SampleRow = {
  id: number;
  field_id: number;
  kind: 'lab' | 'feel';
  label: string | null;
  sampled_on: string | null;
  depth_top_cm: number | null;
  depth_bottom_cm: number | null;
  sand_pct: number | null;
  silt_pct: number | null;
  clay_pct: number | null;
  separates_sum_pct: number | null;
  organic_matter_pct: number | null;
  ph: number | null;
  buffer_ph: number | null;
  depth_to_gray_cm: number | null;
  described_to_cm: number | null;
  bulk_density_mg_m3: number | null;
  cec_cmol_kg: number | null;
  esp_pct: number | null;
  feel_balls: boolean | null;
  feel_ribbon_cm: number | null;
  feel_grit: FeelGrit | null;
  ribbon_class: string | null;
  texture_class: string | null;
  texture_source: string | null;
  drainage_class: string | null;
  not_worth_amending: boolean | null;
  drainage_source: string | null;
  version: number;
  created_at: Date;
  updated_at: Date;
};

const COLUMNS = `s.id, s.field_id, s.kind, s.label, to_char(s.sampled_on, 'YYYY-MM-DD') AS sampled_on, s.depth_top_cm, s.depth_bottom_cm,
  s.sand_pct, s.silt_pct, s.clay_pct, s.separates_sum_pct, s.organic_matter_pct, s.ph, s.buffer_ph, s.depth_to_gray_cm,
  s.described_to_cm, s.bulk_density_mg_m3, s.cec_cmol_kg, s.esp_pct, s.feel_balls, s.feel_ribbon_cm, s.feel_grit, s.ribbon_class,
  s.texture_class, s.texture_source, s.drainage_class, s.not_worth_amending, s.drainage_source, s.version, s.created_at, s.updated_at`;

export function presentSample(r: SampleRow): SoilSample {
  return {
    id: r.id,
    fieldId: r.field_id,
    kind: r.kind,
    label: r.label,
    sampledOn: r.sampled_on,
    depthTopCm: r.depth_top_cm,
    depthBottomCm: r.depth_bottom_cm,
    sandPct: r.sand_pct,
    siltPct: r.silt_pct,
    clayPct: r.clay_pct,
    separatesSumPct: r.separates_sum_pct,
    organicMatterPct: r.organic_matter_pct,
    ph: r.ph,
    bufferPh: r.buffer_ph,
    depthToGrayCm: r.depth_to_gray_cm,
    describedToCm: r.described_to_cm,
    bulkDensity: r.bulk_density_mg_m3,
    cecCmolPerKg: r.cec_cmol_kg,
    espPct: r.esp_pct,
    feelTest: r.kind === 'feel' ? { balls: r.feel_balls ?? false, ribbonCm: r.feel_ribbon_cm, feel: r.feel_grit, ribbonClass: r.ribbon_class } : null,
    textureClass: r.texture_class,
    textureSource: r.texture_source,
    drainageClass: r.drainage_class,
    notWorthAmending: r.not_worth_amending,
    drainageSource: r.drainage_source,
    version: r.version,
    createdAt: new Date(r.created_at).toISOString(),
    updatedAt: new Date(r.updated_at).toISOString(),
  };
}

/** Raw rows of some samples, by field or by id, oldest first. */
export async function sampleRows(
  sequelize: Sequelize,
  where: { fieldId?: number; sampleIds?: number[] },
  transaction?: Transaction,
  lock = false,
): Promise<SampleRow[]> {
  if (where.sampleIds !== undefined && where.sampleIds.length === 0) return [];
  const conds: string[] = [];
  if (where.fieldId !== undefined) conds.push('s.field_id = :fieldId');
  if (where.sampleIds !== undefined) conds.push('s.id IN (:sampleIds)');
  return sequelize.query<SampleRow>(
    `SELECT ${COLUMNS} FROM soil_samples s WHERE ${conds.join(' AND ') || 'true'} ORDER BY s.sampled_on NULLS LAST, s.id${lock ? ' FOR UPDATE' : ''}`,
    { replacements: where, type: QueryTypes.SELECT, transaction },
  );
}

export async function querySamples(
  sequelize: Sequelize,
  where: { fieldId?: number; sampleIds?: number[] },
  transaction?: Transaction,
): Promise<SoilSample[]> {
  return (await sampleRows(sequelize, where, transaction)).map(presentSample);
}
