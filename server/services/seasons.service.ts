// Seasons of a farm ("2027"), and the per-season, per-field cropping record. A new season and
// every cropping change refresh the stored assessments they touch.
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import type { Cropping, CroppingUpdate, Season as SeasonShape } from '../../shared/schemas/season';
import { conflict, HttpError, notFound } from '../lib/http-error';
import { FieldCropping, Season } from '../models';
import { presentCropping, presentSeason } from '../presenters/seasons.presenter';
import { recordEvent } from './audit';
import { afterInputsChange, type InputChange } from './input-changes.service';

export async function listSeasons(farmId: number, transaction?: Transaction): Promise<SeasonShape[]> {
  return (await Season.scope('newestFirst').findAll({ where: { farmId }, transaction })).map(presentSeason);
}

/** The season asked for, or the newest one; 404 when the farm has none by that label. */
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
  const latest = await Season.scope('newestFirst').findOne({ where: { farmId } });
  if (!latest) throw seasonNotFound(undefined);
  return presentSeason(latest);
}

/** The season with that label, created when missing. */
async function ensureSeason(farmId: number, label: string, transaction: Transaction): Promise<{ season: Season; created: boolean }> {
  const [season, created] = await Season.findOrCreate({ where: { farmId, label }, transaction });
  return { season, created };
}

/** POST a season: the existing one when the label is taken. */
export async function createSeason(sequelize: Sequelize, actor: { userId: number }, farmId: number, label: string): Promise<{ season: SeasonShape; created: boolean }> {
  return sequelize.transaction(async (t) => {
    const { season, created } = await ensureSeason(farmId, label, t);
    if (created) {
      await recordEvent({ userId: actor.userId, farmId, entity: 'season', entityId: season.id, action: 'created', detail: { label } }, t);
      // A new season needs an assessment row for every field of the farm.
      await afterInputsChange({ sequelize }, { kind: 'season', farmId }, actor, t);
    }
    return { season: presentSeason(season), created };
  });
}

export async function getCropping(fieldId: number, seasonLabel: string | undefined, farmId: number): Promise<Cropping> {
  const season = await resolveSeason(farmId, seasonLabel);
  const row = await FieldCropping.findOne({ where: { fieldId, seasonId: season.id } });
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
    if (existing && existing.version !== input.version) throw staleCropping(season.label, input.version, presentCropping(existing, season.label));
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
    return presentCropping(await row.reload({ transaction: t }), season.label);
  });
}
