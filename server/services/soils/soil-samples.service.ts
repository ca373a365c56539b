// Create, change and remove soil samples: one transaction each, version check on change
// (409 when stale), derived texture and drainage stored with the row, an audit event; then the
// field's assessments are refreshed, since its soil figures changed.
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import { SoilSampleCreate, type SoilSampleUpdate } from '../../../shared/schemas/soils';
import { badRequest, conflict, notFound } from '../../lib/http-error';
import { Field, SoilSample } from '../../models';
import { describeIssues } from '../../middleware/validate';
import { presentSample } from '../../presenters/soil-sample.presenter';
import { withEditor } from '../../models/with-editor';
import { recordEvent } from '../audit';
import { afterInputsChange } from '../input-changes.service';
import { deriveSample } from './derive-sample';

type Actor = { userId: number };
/** The field a sample belongs to, with its farm (for the audit trail and the assessments). */
export type SampleField = { id: number; farmId: number };

export async function sampleFieldOf(fieldId: number, transaction: Transaction): Promise<SampleField> {
  const field = await Field.findByPk(fieldId, { attributes: ['id', 'farmId'], transaction });
  if (!field) throw notFound('That field');
  return { id: field.id, farmId: field.farmId };
}

/** A field's samples, oldest first (undated last). */
export async function listSamples(fieldId: number): Promise<SoilSample[]> {
  return SoilSample.scope('oldestFirst').findAll({ where: { fieldId }, include: [withEditor] });
}

/** The stored values of a checked sample: the typed values plus what the engine derives. */
function valuesOf(input: SoilSampleCreate) {
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
    bufferMethod: input.bufferMethod ?? null,
    depthToGrayCm: input.depthToGrayCm ?? null,
    describedToCm: input.describedToCm ?? null,
    bulkDensityMgM3: input.bulkDensity ?? null,
    cecCmolKg: input.cecCmolPerKg ?? null,
    espPct: input.espPct ?? null,
    position: input.position ? { type: 'Point' as const, coordinates: [input.position.lng, input.position.lat] } : null,
    positionAccuracyM: input.position?.accuracyM ?? null,
    feelBalls: feel ? feel.balls : null,
    feelRibbonCm: feel ? (feel.ribbonCm ?? null) : null,
    feelGrit: feel ? (feel.feel ?? null) : null,
    ribbonClass: v.ribbonClass,
    textureClass: v.textureClass,
    textureSource: v.textureSource,
    drainageClass: v.drainageClass,
    notWorthAmending: v.notWorthAmending,
    drainageSource: v.drainageSource,
  };
}

/** Stores one checked sample inside the caller's transaction. */
export async function insertSample(actor: Actor, field: SampleField, input: SoilSampleCreate, transaction: Transaction): Promise<SoilSample> {
  const values = valuesOf(input);
  const sample = await SoilSample.create({ ...values, clientKey: input.clientKey ?? null, fieldId: field.id, createdBy: actor.userId, updatedBy: actor.userId }, { transaction });
  await recordEvent(
    { userId: actor.userId, farmId: field.farmId, entity: 'soil_sample', entityId: sample.id, action: 'created', detail: { fieldId: field.id, kind: values.kind, textureClass: values.textureClass } },
    transaction,
  );
  return sample;
}

/** The check stored earlier under this browser key, if any; a key already used on another field is refused. */
async function sampleWithKey(fieldId: number, clientKey: string): Promise<SoilSample | null> {
  const earlier = await SoilSample.findOne({ where: { clientKey }, include: [withEditor] });
  if (earlier && earlier.fieldId !== fieldId) throw conflict('client_key_used', 'clientKey was already used for a soil check of another field: make a new key for each check.');
  return earlier;
}

/**
 * Stores a soil check. With a clientKey, a check already stored under that key is answered
 * instead of storing it again (a phone resending after a lost answer, or two sends racing: the
 * unique key lets one insert win and the other read it).
 */
export async function createSample(sequelize: Sequelize, actor: Actor, fieldId: number, input: SoilSampleCreate): Promise<SoilSample> {
  const key = input.clientKey;
  const earlier = key ? await sampleWithKey(fieldId, key) : null;
  if (earlier) return earlier;
  let stored: { sample: SoilSample; field: SampleField };
  try {
    stored = await sequelize.transaction(async (t) => {
      const field = await sampleFieldOf(fieldId, t);
      const made = await insertSample(actor, field, input, t);
      return { sample: await made.reload({ include: [withEditor], transaction: t }), field };
    });
  } catch (e) {
    const winner = key && e instanceof UniqueConstraintError ? await sampleWithKey(fieldId, key) : null;
    if (winner) return winner;
    throw e;
  }
  const { sample, field } = stored;
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId: field.farmId, fieldIds: [field.id] }, actor);
  return sample;
}

/**
 * A stored sample back in the create payload's shape (the API's sample uses the same names; the
 * schema drops the rest), so a change can be merged and re-checked. Sand, silt and clay are the
 * renormalised values: they add up to 100 %, so a stored sample always re-checks.
 */
function inputOf(s: SoilSample): Record<string, unknown> {
  const { feelTest, ...stored } = presentSample(s);
  return { ...stored, balls: feelTest?.balls, ribbonCm: feelTest?.ribbonCm ?? null, feel: feelTest?.feel ?? null };
}

export async function updateSample(sequelize: Sequelize, actor: Actor, sampleId: number, patch: SoilSampleUpdate): Promise<SoilSample> {
  const { sample, field } = await sequelize.transaction(async (t) => {
    const sample = await SoilSample.findByPk(sampleId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!sample) throw notFound('That soil sample');
    if (sample.version !== patch.version) {
      throw conflict(
        'stale_version',
        `Someone changed this soil sample since you opened it (you had version ${patch.version}, it is now ${sample.version}). Reload it and make your change again.`,
        { current: presentSample(sample) },
      );
    }
    const { version: _version, ...changes } = patch;
    const merged = { ...inputOf(sample), ...Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined)) };
    const parsed = SoilSampleCreate.safeParse(merged);
    if (!parsed.success) {
      const d = describeIssues(parsed.error);
      throw badRequest('invalid_input', d.message, { issues: d.issues });
    }
    await sample.update({ ...valuesOf(parsed.data), version: sample.version + 1, updatedBy: actor.userId }, { transaction: t });
    await sample.reload({ include: [withEditor], transaction: t });
    const field = await sampleFieldOf(sample.fieldId, t);
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'soil_sample', entityId: sampleId, action: 'updated', detail: { changed: Object.keys(changes) } }, t);
    return { sample, field };
  });
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId: field.farmId, fieldIds: [field.id] }, actor);
  return sample;
}

export async function deleteSample(sequelize: Sequelize, actor: Actor, sampleId: number): Promise<void> {
  const field = await sequelize.transaction(async (t) => {
    const sample = await SoilSample.findByPk(sampleId, { lock: t.LOCK.UPDATE, transaction: t });
    if (!sample) throw notFound('That soil sample');
    const field = await sampleFieldOf(sample.fieldId, t);
    await sample.destroy({ transaction: t });
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'soil_sample', entityId: sampleId, action: 'deleted', detail: { fieldId: sample.fieldId, label: sample.label } }, t);
    return field;
  });
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId: field.farmId, fieldIds: [field.id] }, actor);
}
