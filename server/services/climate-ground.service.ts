// The farm's climate (R and the design storm) and a field's typed ground (slope % and
// slope length where no elevation model covers it). Both versioned: 409 when stale.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { Climate, ClimateUpdate, Ground, RainfallRecordSummary } from '../../shared/schemas/season';
import { conflict, invalid } from '../lib/http-error';
import { recordEvent } from './audit';

type ClimateRow = { r_from: Climate['rFrom']; r_value: number | null; annual_precipitation_mm: number | null; design_storm_mm: number; r_record: Climate['record']; version: number };

export async function getClimate(sequelize: Sequelize, farmId: number, transaction?: Transaction): Promise<Climate | null> {
  const [r] = await sequelize.query<ClimateRow>(`SELECT * FROM farm_climates WHERE farm_id = :farmId`, { replacements: { farmId }, type: QueryTypes.SELECT, transaction });
  return r
    ? { rFrom: r.r_from, rValue: r.r_value, annualPrecipitationMm: r.annual_precipitation_mm, designStormMm: r.design_storm_mm, record: r.r_record, version: r.version }
    : null;
}

function staleCheck(what: string, current: { version: number } | null, sent: number | undefined): void {
  if (current && current.version !== sent) {
    throw conflict('stale_version', `Someone changed the ${what} since you opened it (you had version ${sent ?? 'none'}, it is now ${current.version}). Reload and change it again.`, { current });
  }
}

export async function putClimate(sequelize: Sequelize, actor: { userId: number }, farmId: number, input: ClimateUpdate): Promise<Climate> {
  return sequelize.transaction(async (t) => {
    const [cur] = await sequelize.query<{ version: number }>(`SELECT version FROM farm_climates WHERE farm_id = :farmId FOR UPDATE`, { replacements: { farmId }, type: QueryTypes.SELECT, transaction: t });
    staleCheck("farm's climate", cur ?? null, input.version);
    await sequelize.query(
      `INSERT INTO farm_climates (farm_id, r_from, r_value, annual_precipitation_mm, design_storm_mm) VALUES (:farmId, :rFrom, :rValue, :p, :storm)
       ON CONFLICT (farm_id) DO UPDATE SET r_from = EXCLUDED.r_from, r_value = EXCLUDED.r_value, annual_precipitation_mm = EXCLUDED.annual_precipitation_mm,
         design_storm_mm = EXCLUDED.design_storm_mm, r_record = NULL, version = farm_climates.version + 1, updated_at = now()`,
      { replacements: { farmId, rFrom: input.rFrom, rValue: input.rValue ?? null, p: input.annualPrecipitationMm ?? null, storm: input.designStormMm }, transaction: t },
    );
    await recordEvent({ userId: actor.userId, farmId, entity: 'climate', entityId: farmId, action: cur ? 'updated' : 'created' }, t);
    return (await getClimate(sequelize, farmId, t))!;
  });
}

/** R from an uploaded rainfall record; the design storm stays unless given. */
export async function putClimateFromRecord(
  sequelize: Sequelize,
  actor: { userId: number },
  farmId: number,
  summary: RainfallRecordSummary,
  designStormMm: number | undefined,
): Promise<Climate> {
  return sequelize.transaction(async (t) => {
    const [cur] = await sequelize.query<{ design_storm_mm: number }>(`SELECT design_storm_mm FROM farm_climates WHERE farm_id = :farmId FOR UPDATE`, { replacements: { farmId }, type: QueryTypes.SELECT, transaction: t });
    const storm = designStormMm ?? cur?.design_storm_mm;
    if (storm === undefined) throw invalid('invalid_input', 'designStormMm: give the design storm depth (mm) with the first climate record of a farm.');
    await sequelize.query(
      `INSERT INTO farm_climates (farm_id, r_from, r_value, annual_precipitation_mm, design_storm_mm, r_record) VALUES (:farmId, 'record', :r, NULL, :storm, :rec)
       ON CONFLICT (farm_id) DO UPDATE SET r_from = 'record', r_value = EXCLUDED.r_value, annual_precipitation_mm = NULL,
         design_storm_mm = EXCLUDED.design_storm_mm, r_record = EXCLUDED.r_record, version = farm_climates.version + 1, updated_at = now()`,
      { replacements: { farmId, r: summary.r, storm, rec: JSON.stringify(summary) }, transaction: t },
    );
    await recordEvent({ userId: actor.userId, farmId, entity: 'climate', entityId: farmId, action: 'rainfall-record', detail: { r: summary.r, years: summary.years } }, t);
    return (await getClimate(sequelize, farmId, t))!;
  });
}

export async function getGround(sequelize: Sequelize, fieldId: number, transaction?: Transaction): Promise<Ground | null> {
  const [r] = await sequelize.query<{ slope_pct: number | null; slope_length_m: number | null; version: number }>(
    `SELECT slope_pct, slope_length_m, version FROM field_grounds WHERE field_id = :fieldId`,
    { replacements: { fieldId }, type: QueryTypes.SELECT, transaction },
  );
  return r ? { slopePct: r.slope_pct, slopeLengthM: r.slope_length_m, version: r.version } : null;
}

export async function putGround(sequelize: Sequelize, actor: { userId: number }, field: { id: number; farmId: number }, input: { version?: number; slopePct: number | null; slopeLengthM: number | null }): Promise<Ground> {
  return sequelize.transaction(async (t) => {
    const [cur] = await sequelize.query<{ version: number }>(`SELECT version FROM field_grounds WHERE field_id = :id FOR UPDATE`, { replacements: { id: field.id }, type: QueryTypes.SELECT, transaction: t });
    staleCheck("field's slope", cur ?? null, input.version);
    await sequelize.query(
      `INSERT INTO field_grounds (field_id, slope_pct, slope_length_m) VALUES (:id, :s, :l)
       ON CONFLICT (field_id) DO UPDATE SET slope_pct = EXCLUDED.slope_pct, slope_length_m = EXCLUDED.slope_length_m, version = field_grounds.version + 1, updated_at = now()`,
      { replacements: { id: field.id, s: input.slopePct, l: input.slopeLengthM }, transaction: t },
    );
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'ground', entityId: field.id, action: cur ? 'updated' : 'created' }, t);
    return (await getGround(sequelize, field.id, t))!;
  });
}
