// The farm's climate (R and the design storm) and a field's typed ground (slope % and slope
// length where no elevation model covers it). Both versioned: 409 when stale. Every change
// refreshes the stored assessments it touches.
import { UniqueConstraintError, type Sequelize } from 'sequelize';
import type { Climate, ClimateUpdate, Ground, GroundUpdate, RainfallRecordFields, RainfallRecordSummary } from '../../shared/schemas/season';
import { badRequest, conflict, HttpError, invalid } from '../lib/http-error';
import { FarmClimate, FieldGround } from '../models';
import { NO_GROUND, presentClimate, presentGround } from '../presenters/seasons.presenter';
import { withEditor } from '../models/with-editor';
import { recordEvent } from './audit';
import { afterInputsChange } from './input-changes.service';
import type { JobQueue } from './jobs/job-queue';
import { rFromRainfallCsvInThread } from './rainfall-record-in-thread';

export async function getClimate(farmId: number): Promise<Climate> {
  const c = await FarmClimate.findByPk(farmId, { include: [withEditor] });
  if (!c) throw new HttpError(404, 'no_climate', "This farm's climate (R and the design storm) is not set yet.");
  return presentClimate(c);
}

function staleCheck<T extends { version: number }>(what: string, current: T | null, sent: number | undefined): void {
  if (current && current.version !== sent) {
    throw conflict('stale_version', `Someone changed the ${what} since you opened it (you had version ${sent ?? 'none'}, it is now ${current.version}). Reload and change it again.`, { current });
  }
}

/** Two first saves at the same moment: the loser is told to reload. */
async function firstSave<T>(what: string, create: () => Promise<T>): Promise<T> {
  try {
    return await create();
  } catch (e) {
    if (e instanceof UniqueConstraintError) throw conflict('stale_version', `Someone saved the ${what} at the same time. Reload and change it again.`);
    throw e;
  }
}

type ClimateValues = Pick<FarmClimate, 'rFrom' | 'rValue' | 'annualPrecipitationMm' | 'designStormMm' | 'rRecord'>;

async function saveClimate(sequelize: Sequelize, actor: { userId: number }, farmId: number, values: (cur: FarmClimate | null) => ClimateValues, version: number | undefined | 'any', audit: { action?: string; detail?: Record<string, unknown> }): Promise<Climate> {
  return sequelize.transaction(async (t) => {
    const cur = await FarmClimate.findByPk(farmId, { transaction: t, lock: t.LOCK.UPDATE });
    if (version !== 'any') staleCheck("farm's climate", cur ? presentClimate(cur) : null, version);
    const next = { ...values(cur), updatedBy: actor.userId };
    const row = cur ? await cur.update({ ...next, version: cur.version + 1 }, { transaction: t }) : await firstSave("farm's climate", () => FarmClimate.create({ farmId, ...next }, { transaction: t }));
    await recordEvent({ userId: actor.userId, farmId, entity: 'climate', entityId: farmId, action: audit.action ?? (cur ? 'updated' : 'created'), ...(audit.detail ? { detail: audit.detail } : {}) }, t);
    await afterInputsChange({ sequelize }, { kind: 'climate', farmId }, actor, t);
    // Read back: REAL columns round what was sent, and the answer should match a later GET.
    return presentClimate(await row.reload({ include: [withEditor], transaction: t }));
  });
}

export async function putClimate(sequelize: Sequelize, actor: { userId: number }, farmId: number, input: ClimateUpdate): Promise<Climate> {
  const values = (): ClimateValues => ({ rFrom: input.rFrom, rValue: input.rValue ?? null, annualPrecipitationMm: input.annualPrecipitationMm ?? null, designStormMm: input.designStormMm, rRecord: null });
  return saveClimate(sequelize, actor, farmId, values, input.version, {});
}

/** R from an uploaded rainfall record (breakpoint CSV); the design storm stays unless given. */
export async function putClimateFromRecord(sequelize: Sequelize, actor: { userId: number }, farmId: number, file: Buffer | undefined, fields: RainfallRecordFields): Promise<Climate> {
  if (!file) throw badRequest('no_file', 'Attach the rainfall record as the multipart part named "file".');
  // On a thread of its own: a large record must not hold up other requests while it is read.
  const r = await rFromRainfallCsvInThread(file, fields.years);
  if (!r.ok) throw new HttpError(r.status, r.error, r.message);
  const summary: RainfallRecordSummary = r.summary;
  const values = (cur: FarmClimate | null): ClimateValues => {
    const storm = fields.designStormMm ?? cur?.designStormMm;
    if (storm === undefined) throw invalid('invalid_input', 'designStormMm: give the design storm depth (mm) with the first climate record of a farm.');
    return { rFrom: 'record', rValue: summary.r, annualPrecipitationMm: null, designStormMm: storm, rRecord: summary };
  };
  return saveClimate(sequelize, actor, farmId, values, 'any', { action: 'rainfall-record', detail: { r: summary.r, years: summary.years } });
}

export async function getGround(fieldId: number): Promise<Ground | typeof NO_GROUND> {
  const g = await FieldGround.findByPk(fieldId, { include: [withEditor] });
  return g ? presentGround(g) : NO_GROUND;
}

export async function putGround(
  sequelize: Sequelize,
  actor: { userId: number },
  field: { id: number; farmId: number },
  input: GroundUpdate,
  jobs?: JobQueue,
): Promise<Ground> {
  return sequelize.transaction(async (t) => {
    const cur = await FieldGround.findByPk(field.id, { transaction: t, lock: t.LOCK.UPDATE });
    staleCheck("field's ground", cur ? presentGround(cur) : null, input.version);
    const lengthBefore = cur?.slopeLengthM ?? null;
    const drained = input.drained ?? false;
    const next = {
      slopePct: input.slopePct,
      slopeLengthM: input.slopeLengthM,
      drained,
      drainedWaterTableDepthCm: drained ? (input.drainedWaterTableDepthCm ?? null) : null,
      updatedBy: actor.userId,
    };
    const row = cur ? await cur.update({ ...next, version: cur.version + 1 }, { transaction: t }) : await firstSave("field's slope", () => FieldGround.create({ fieldId: field.id, ...next }, { transaction: t }));
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'ground', entityId: field.id, action: cur ? 'updated' : 'created' }, t);
    await row.reload({ include: [withEditor], transaction: t });
    // The typed slope length caps the elevation model's flow length for LS, so a change of it
    // queues a terrain run, in this transaction: the run starts only once the length is committed.
    const slopeLengthChanged = lengthBefore !== row.slopeLengthM;
    await afterInputsChange({ sequelize, jobs }, { kind: 'ground', farmId: field.farmId, fieldIds: [field.id], slopeLengthChanged }, actor, t);
    return presentGround(row);
  });
}
