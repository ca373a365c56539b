// Create, change and remove soil samples: one transaction each, version check on change
// (409 when stale), derived texture and drainage stored with the row, an audit event.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { SoilSampleCreate, type SoilSample, type SoilSampleUpdate } from '../../../shared/schemas/soils';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import { describeIssues } from '../../middleware/validate';
import { recordEvent } from '../audit';
import { afterInputsChange } from '../input-changes.service';
import { deriveSample } from './derive-sample';
import { presentSample, querySamples, sampleRows, type SampleRow } from './soil-sample-presenter';

type Actor = { userId: number };

export async function farmOfField(sequelize: Sequelize, fieldId: number, transaction: Transaction): Promise<number> {
  const [f] = await sequelize.query<{ farm_id: number }>('SELECT farm_id FROM fields WHERE id = :fieldId', {
    replacements: { fieldId },
    type: QueryTypes.SELECT,
    transaction,
  });
  if (!f) throw notFound('That field');
  return f.farm_id;
}

/** The column values of a checked sample (typed values plus what the engine derives). */
function columnsOf(input: SoilSampleCreate) {
  const d = deriveSample(input);
  if (!d.ok) throw badRequest('invalid_input', `${d.path}: ${d.reason}`, { issues: [{ path: d.path, message: d.reason }] });
  const v = d.value;
  const feel = input.kind === 'feel' ? input : null;
  return {
    kind: input.kind,
    label: input.label?.trim() || null,
    sampledOn: input.sampledOn ?? null,
    depthTopCm: input.depthTopCm ?? null,
    depthBottomCm: input.depthBottomCm ?? null,
    sandPct: v.sandPct,
    siltPct: v.siltPct,
    clayPct: v.clayPct,
    separatesSumPct: v.separatesSumPct,
    organicMatterPct: input.organicMatterPct ?? null,
    ph: input.ph ?? null,
    bufferPh: input.bufferPh ?? null,
    depthToGrayCm: input.depthToGrayCm ?? null,
    describedToCm: input.describedToCm ?? null,
    bulkDensity: input.bulkDensity ?? null,
    cec: input.cecCmolPerKg ?? null,
    esp: input.espPct ?? null,
    balls: feel ? feel.balls : null,
    ribbonCm: feel ? (feel.ribbonCm ?? null) : null,
    grit: feel ? (feel.feel ?? null) : null,
    ribbonClass: v.ribbonClass,
    textureClass: v.textureClass,
    textureSource: v.textureSource,
    drainageClass: v.drainageClass,
    notWorthAmending: v.notWorthAmending,
    drainageSource: v.drainageSource,
  };
}

const ASSIGNMENTS = `kind = :kind, label = :label, sampled_on = :sampledOn, depth_top_cm = :depthTopCm, depth_bottom_cm = :depthBottomCm,
  sand_pct = :sandPct, silt_pct = :siltPct, clay_pct = :clayPct, separates_sum_pct = :separatesSumPct,
  organic_matter_pct = :organicMatterPct, ph = :ph, buffer_ph = :bufferPh, depth_to_gray_cm = :depthToGrayCm,
  described_to_cm = :describedToCm, bulk_density_mg_m3 = :bulkDensity, cec_cmol_kg = :cec, esp_pct = :esp,
  feel_balls = :balls, feel_ribbon_cm = :ribbonCm, feel_grit = :grit, ribbon_class = :ribbonClass,
  texture_class = :textureClass, texture_source = :textureSource, drainage_class = :drainageClass,
  not_worth_amending = :notWorthAmending, drainage_source = :drainageSource`;

/** Inserts one checked sample inside the caller's transaction; returns its id. */
export async function insertSample(
  sequelize: Sequelize,
  actor: Actor,
  fieldId: number,
  input: SoilSampleCreate,
  transaction: Transaction,
  farmId?: number,
): Promise<number> {
  const cols = columnsOf(input);
  const farm = farmId ?? (await farmOfField(sequelize, fieldId, transaction));
  const [row] = await sequelize.query<{ id: number }>(
    `INSERT INTO soil_samples (field_id, created_by, kind, label, sampled_on, depth_top_cm, depth_bottom_cm, sand_pct, silt_pct, clay_pct,
        separates_sum_pct, organic_matter_pct, ph, buffer_ph, depth_to_gray_cm, described_to_cm, bulk_density_mg_m3, cec_cmol_kg, esp_pct,
        feel_balls, feel_ribbon_cm, feel_grit, ribbon_class, texture_class, texture_source, drainage_class, not_worth_amending, drainage_source)
     VALUES (:fieldId, :userId, :kind, :label, :sampledOn, :depthTopCm, :depthBottomCm, :sandPct, :siltPct, :clayPct,
        :separatesSumPct, :organicMatterPct, :ph, :bufferPh, :depthToGrayCm, :describedToCm, :bulkDensity, :cec, :esp,
        :balls, :ribbonCm, :grit, :ribbonClass, :textureClass, :textureSource, :drainageClass, :notWorthAmending, :drainageSource)
     RETURNING id`,
    { replacements: { ...cols, fieldId, userId: actor.userId }, type: QueryTypes.SELECT, transaction },
  );
  await recordEvent(
    { userId: actor.userId, farmId: farm, entity: 'soil_sample', entityId: row.id, action: 'created', detail: { fieldId, kind: cols.kind, textureClass: cols.textureClass } },
    transaction,
  );
  return row.id;
}

/** After the commit: the soil summary reads committed samples. */
async function soilsChanged(sequelize: Sequelize, actor: Actor, farmId: number, fieldId: number): Promise<void> {
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId, fieldIds: [fieldId] }, actor);
}

export async function createSample(sequelize: Sequelize, actor: Actor, fieldId: number, input: SoilSampleCreate): Promise<SoilSample> {
  const { s, farmId } = await sequelize.transaction(async (t) => {
    const id = await insertSample(sequelize, actor, fieldId, input, t);
    const [s] = await querySamples(sequelize, { sampleIds: [id] }, t);
    return { s, farmId: await farmOfField(sequelize, fieldId, t) };
  });
  await soilsChanged(sequelize, actor, farmId, fieldId);
  return s;
}

/** A stored row back in the create payload's shape, so a change can be merged and re-checked. */
function inputOf(r: SampleRow): Record<string, unknown> {
  return {
    kind: r.kind,
    label: r.label,
    sampledOn: r.sampled_on,
    depthTopCm: r.depth_top_cm,
    depthBottomCm: r.depth_bottom_cm,
    // The renormalised values: they add up to 100 %, so a stored sample always re-checks.
    sandPct: r.sand_pct,
    siltPct: r.silt_pct,
    clayPct: r.clay_pct,
    organicMatterPct: r.organic_matter_pct,
    ph: r.ph,
    bufferPh: r.buffer_ph,
    depthToGrayCm: r.depth_to_gray_cm,
    describedToCm: r.described_to_cm,
    bulkDensity: r.bulk_density_mg_m3,
    cecCmolPerKg: r.cec_cmol_kg,
    espPct: r.esp_pct,
    balls: r.feel_balls ?? undefined,
    ribbonCm: r.feel_ribbon_cm,
    feel: r.feel_grit,
  };
}

export async function updateSample(sequelize: Sequelize, actor: Actor, sampleId: number, patch: SoilSampleUpdate): Promise<SoilSample> {
  const { s, farmId } = await sequelize.transaction(async (t) => {
    const [row] = await sampleRows(sequelize, { sampleIds: [sampleId] }, t, true);
    if (!row) throw notFound('That soil sample');
    if (row.version !== patch.version) {
      throw conflict(
        'stale_version',
        `Someone changed this soil sample since you opened it (you had version ${patch.version}, it is now ${row.version}). Reload it and make your change again.`,
        { current: presentSample(row) },
      );
    }
    const { version: _version, ...changes } = patch;
    const merged = { ...inputOf(row), ...Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined)) };
    const parsed = SoilSampleCreate.safeParse(merged);
    if (!parsed.success) {
      const d = describeIssues(parsed.error);
      throw badRequest('invalid_input', d.message, { issues: d.issues });
    }
    const cols = columnsOf(parsed.data);
    await sequelize.query(`UPDATE soil_samples SET ${ASSIGNMENTS}, version = version + 1, updated_at = now() WHERE id = :id`, {
      replacements: { ...cols, id: sampleId },
      transaction: t,
    });
    const farmId = await farmOfField(sequelize, row.field_id, t);
    await recordEvent({ userId: actor.userId, farmId, entity: 'soil_sample', entityId: sampleId, action: 'updated', detail: { changed: Object.keys(changes) } }, t);
    const [s] = await querySamples(sequelize, { sampleIds: [sampleId] }, t);
    return { s, farmId };
  });
  await soilsChanged(sequelize, actor, farmId, s.fieldId);
  return s;
}

export async function deleteSample(sequelize: Sequelize, actor: Actor, sampleId: number): Promise<void> {
  const { farmId, fieldId } = await sequelize.transaction(async (t) => {
    const [row] = await sampleRows(sequelize, { sampleIds: [sampleId] }, t, true);
    if (!row) throw notFound('That soil sample');
    const farmId = await farmOfField(sequelize, row.field_id, t);
    await sequelize.query('DELETE FROM soil_samples WHERE id = :id', { replacements: { id: sampleId }, transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'soil_sample', entityId: sampleId, action: 'deleted', detail: { fieldId: row.field_id, label: row.label } }, t);
    return { farmId, fieldId: row.field_id };
  });
  await soilsChanged(sequelize, actor, farmId, fieldId);
}
