// Seasons of a farm ("2027"), and the per-season, per-field cropping record. A new season and
// every cropping change refresh the stored assessments they touch.
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import type { Cropping, CroppingUpdate, Season as SeasonShape } from '../../shared/schemas/season';
import { badRequest, conflict, HttpError, notFound } from '../lib/http-error';
import { FieldCropping, Plan, Season } from '../models';
import { withEditor } from '../models/with-editor';
import { presentCropping, presentSeason } from '../presenters/seasons.presenter';
import { recordEvent } from './audit';
import { afterInputsChange, type InputChange } from './input-changes.service';

/** A farm's seasons, newest first, each with what it holds (fields with cropping, a plan). */
async function seasonsWithData(farmId: number, transaction?: Transaction): Promise<{ season: Season; croppedFields: number; hasPlan: boolean }[]> {
  const seasons = await Season.scope('newestFirst').findAll({ where: { farmId }, transaction });
  const ids = seasons.map((s) => s.id);
  if (!ids.length) return [];
  const counts = (await FieldCropping.count({ where: { seasonId: ids }, group: ['seasonId'], transaction })) as unknown as { seasonId: number; count: number }[];
  const byId = new Map(counts.map((c) => [c.seasonId, Number(c.count)]));
  const planned = new Set((await Plan.findAll({ where: { seasonId: ids }, attributes: ['seasonId'], transaction })).map((p) => p.seasonId));
  return seasons.map((season) => ({ season, croppedFields: byId.get(season.id) ?? 0, hasPlan: planned.has(season.id) }));
}

/**
 * The season screens open on: the newest one holding cropping or a plan (the one in progress, or
 * the latest with data), never an empty newer one; the newest when none holds anything.
 */
const currentOf = <T extends { croppedFields: number; hasPlan: boolean }>(list: T[]): T | undefined => list.find((s) => s.croppedFields > 0 || s.hasPlan) ?? list[0];

/** GET /api/farms/:farmId/seasons: newest first, the current one marked, empty ones marked (they can be deleted). */
export async function listSeasons(farmId: number, transaction?: Transaction): Promise<SeasonShape[]> {
  const list = await seasonsWithData(farmId, transaction);
  const current = currentOf(list);
  return list.map((s) => presentSeason(s.season, { croppedFields: s.croppedFields, hasPlan: s.hasPlan, current: s === current }));
}

/** The 404 for a season label the farm does not have (or for a farm with no season at all). */
export function seasonNotFound(label: string | undefined): HttpError {
  return label ? notFound(`Season ${label}`) : notFound('A season on this farm');
}

export async function resolveSeason(farmId: number, label: string | undefined): Promise<SeasonShape> {
  if (label) {
    const s = await Season.findOne({ where: { farmId, label } });
    if (!s) throw seasonNotFound(label);
    return presentSeason(s);
  }
  const current = currentOf(await seasonsWithData(farmId));
  if (!current) throw seasonNotFound(undefined);
  return presentSeason(current.season);
}

/** The season with that label, created when missing. */
async function ensureSeason(farmId: number, label: string, transaction: Transaction): Promise<{ season: Season; created: boolean }> {
  const [season, created] = await Season.findOrCreate({ where: { farmId, label }, transaction });
  return { season, created };
}

/** Every field's cropping of one season written into another (a new, empty one), as the actor's. */
async function copyCropping(fromSeasonId: number, toSeasonId: number, actor: { userId: number }, t: Transaction): Promise<number> {
  const rows = await FieldCropping.findAll({ where: { seasonId: fromSeasonId }, transaction: t });
  for (const r of rows) {
    await FieldCropping.create(
      {
        fieldId: r.fieldId, seasonId: toSeasonId, crop: r.crop, tillage: r.tillage, residuePct: r.residuePct, groundCoverPct: r.groundCoverPct, coverCrop: r.coverCrop,
        practice: r.practice, terraceIntervalM: r.terraceIntervalM, stripRotation: r.stripRotation, stripWidthM: r.stripWidthM, updatedBy: actor.userId,
      },
      { transaction: t },
    );
  }
  return rows.length;
}

/**
 * POST a season: the existing one when the label is taken. With copyCroppingFrom, a new season
 * starts with every field's cropping of that season (the usual start: the same crops again).
 */
export async function createSeason(
  sequelize: Sequelize,
  actor: { userId: number },
  farmId: number,
  label: string,
  options: { copyCroppingFrom?: string } = {},
): Promise<{ season: SeasonShape; created: boolean }> {
  return sequelize.transaction(async (t) => {
    const source = options.copyCroppingFrom ? await Season.findOne({ where: { farmId, label: options.copyCroppingFrom }, transaction: t }) : null;
    if (options.copyCroppingFrom && !source) {
      const message = `copyCroppingFrom: this farm has no season ${options.copyCroppingFrom}`;
      throw badRequest('invalid_input', message, { issues: [{ path: 'copyCroppingFrom', message: message.slice('copyCroppingFrom: '.length) }] });
    }
    const { season, created } = await ensureSeason(farmId, label, t);
    if (created) {
      const copied = source ? await copyCropping(source.id, season.id, actor, t) : 0;
      await recordEvent({ userId: actor.userId, farmId, entity: 'season', entityId: season.id, action: 'created', detail: { label, ...(source ? { copiedFrom: source.label, copied } : {}) } }, t);
      // A new season needs an assessment row for every field of the farm.
      await afterInputsChange({ sequelize }, { kind: 'season', farmId }, actor, t);
    }
    return { season: presentSeason(season), created };
  });
}

/** DELETE a season (farmer): only an empty one (no cropping, no plan); 409 saying what it holds otherwise. */
export async function deleteSeason(sequelize: Sequelize, actor: { userId: number }, farmId: number, label: string): Promise<void> {
  await sequelize.transaction(async (t) => {
    const season = await Season.findOne({ where: { farmId, label }, lock: t.LOCK.UPDATE, transaction: t });
    if (!season) throw seasonNotFound(label);
    const cropped = await FieldCropping.count({ where: { seasonId: season.id }, transaction: t });
    const plan = await Plan.count({ where: { seasonId: season.id }, transaction: t });
    if (cropped || plan) {
      const holds = [cropped ? `cropping for ${cropped} field${cropped === 1 ? '' : 's'}` : null, plan ? 'a season plan' : null].filter(Boolean).join(' and ');
      throw conflict('season_has_data', `Season ${label} holds ${holds}, so it cannot be deleted. Only an empty season can be.`);
    }
    // Its assessment rows (made for every field when the season was added) go with it.
    await season.destroy({ transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'season', entityId: season.id, action: 'deleted', detail: { label } }, t);
  });
}

export async function getCropping(fieldId: number, seasonLabel: string | undefined, farmId: number): Promise<Cropping> {
  const season = await resolveSeason(farmId, seasonLabel);
  const row = await FieldCropping.findOne({ where: { fieldId, seasonId: season.id }, include: [withEditor] });
  if (!row) throw new HttpError(404, 'no_cropping', `This field has no cropping for season ${season.label} yet.`);
  return presentCropping(row, season.label);
}

const staleCropping = (label: string, sent: number | undefined, current: Cropping) =>
  conflict(
    'stale_version',
    sent === undefined
      ? `This field already has cropping for ${label}; send the version you read to change it.`
      : `Someone changed this field's cropping for ${label} since you opened it (you had version ${sent}, it is now ${current.version}). Reload and change it again.`,
    { current },
  );

export async function putCropping(sequelize: Sequelize, actor: { userId: number }, field: { id: number; farmId: number }, input: CroppingUpdate): Promise<Cropping> {
  return sequelize.transaction(async (t) => {
    const { season, created } = await ensureSeason(field.farmId, input.season, t);
    const existing = await FieldCropping.findOne({ where: { fieldId: field.id, seasonId: season.id }, transaction: t, lock: t.LOCK.UPDATE });
    if (existing && existing.version !== input.version) throw staleCropping(season.label, input.version, presentCropping(await existing.reload({ include: [withEditor], transaction: t }), season.label));
    const values = {
      crop: input.crop,
      tillage: input.tillage ?? null,
      residuePct: input.residuePct ?? null,
      groundCoverPct: input.groundCoverPct ?? null,
      coverCrop: input.coverCrop ?? null,
      practice: input.practice ?? 'none',
      terraceIntervalM: input.terraceIntervalM ?? null,
      // The rotation and width mean something only for strips.
      stripRotation: input.practice === 'strip cropping' ? (input.stripRotation ?? null) : null,
      stripWidthM: input.practice === 'strip cropping' ? (input.stripWidthM ?? null) : null,
      updatedBy: actor.userId,
    };
    let row: FieldCropping;
    if (existing) row = await existing.update({ ...values, version: existing.version + 1 }, { transaction: t });
    else {
      try {
        row = await FieldCropping.create({ fieldId: field.id, seasonId: season.id, ...values }, { transaction: t });
      } catch (e) {
        // Someone else saved the first record at the same moment.
        if (e instanceof UniqueConstraintError) throw conflict('stale_version', `Someone saved this field's cropping for ${season.label} at the same time. Reload and change it again.`);
        throw e;
      }
    }
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'cropping', entityId: field.id, action: existing ? 'updated' : 'created', detail: { season: season.label, crop: input.crop } }, t);
    // A season created by this record needs rows for every field of the farm.
    const change: InputChange = created ? { kind: 'season', farmId: field.farmId } : { kind: 'cropping', farmId: field.farmId, fieldIds: [field.id] };
    await afterInputsChange({ sequelize }, change, actor, t);
    // Read back: REAL columns round what was sent, and the answer should match a later GET.
    return presentCropping(await row.reload({ include: [withEditor], transaction: t }), season.label);
  });
}
