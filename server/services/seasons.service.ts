// Seasons of a farm ("2027"), and the per-season, per-field cropping record.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { Cropping, CroppingUpdate, Season } from '../../shared/schemas/season';
import { conflict, notFound } from '../lib/http-error';
import { recordEvent } from './audit';

export async function listSeasons(sequelize: Sequelize, farmId: number): Promise<Season[]> {
  return sequelize.query<Season>(`SELECT id, label FROM seasons WHERE farm_id = :farmId ORDER BY label DESC`, { replacements: { farmId }, type: QueryTypes.SELECT });
}

/** The season with that label, created when missing. */
export async function ensureSeason(sequelize: Sequelize, farmId: number, label: string, transaction?: Transaction): Promise<Season> {
  const [row] = await sequelize.query<Season>(
    `INSERT INTO seasons (farm_id, label) VALUES (:farmId, :label)
     ON CONFLICT (farm_id, label) DO UPDATE SET label = EXCLUDED.label RETURNING id, label`,
    { replacements: { farmId, label }, type: QueryTypes.SELECT, transaction },
  );
  return row;
}

export async function findSeason(sequelize: Sequelize, farmId: number, label: string): Promise<Season | null> {
  const [row] = await sequelize.query<Season>(`SELECT id, label FROM seasons WHERE farm_id = :farmId AND label = :label`, {
    replacements: { farmId, label },
    type: QueryTypes.SELECT,
  });
  return row ?? null;
}

/** The season asked for, or the newest one; 404 when the farm has none by that label. */
export async function resolveSeason(sequelize: Sequelize, farmId: number, label: string | undefined): Promise<Season> {
  if (label) {
    const s = await findSeason(sequelize, farmId, label);
    if (!s) throw notFound(`Season ${label}`);
    return s;
  }
  const [latest] = await listSeasons(sequelize, farmId);
  if (!latest) throw notFound('A season on this farm');
  return latest;
}

type CroppingRow = {
  field_id: number;
  label: string;
  crop: Cropping['crop'];
  tillage: Cropping['tillage'];
  residue_pct: number | null;
  ground_cover_pct: number | null;
  cover_crop: Cropping['coverCrop'];
  practice: Cropping['practice'];
  terrace_interval_m: number | null;
  version: number;
  updated_at: Date;
};

const presentCropping = (r: CroppingRow): Cropping => ({
  fieldId: r.field_id,
  season: r.label,
  crop: r.crop,
  tillage: r.tillage,
  residuePct: r.residue_pct,
  groundCoverPct: r.ground_cover_pct,
  coverCrop: r.cover_crop,
  practice: r.practice,
  terraceIntervalM: r.terrace_interval_m,
  version: r.version,
  updatedAt: new Date(r.updated_at).toISOString(),
});

export async function getCropping(sequelize: Sequelize, fieldId: number, seasonId: number, transaction?: Transaction): Promise<Cropping | null> {
  const [row] = await sequelize.query<CroppingRow>(
    `SELECT c.*, s.label FROM field_croppings c JOIN seasons s ON s.id = c.season_id WHERE c.field_id = :fieldId AND c.season_id = :seasonId`,
    { replacements: { fieldId, seasonId }, type: QueryTypes.SELECT, transaction },
  );
  return row ? presentCropping(row) : null;
}

export async function putCropping(sequelize: Sequelize, actor: { userId: number }, field: { id: number; farmId: number }, input: CroppingUpdate): Promise<Cropping> {
  return sequelize.transaction(async (t) => {
    const season = await ensureSeason(sequelize, field.farmId, input.season, t);
    const existing = await getCropping(sequelize, field.id, season.id, t);
    if (existing && existing.version !== input.version) {
      throw conflict(
        'stale_version',
        input.version === undefined
          ? `This field already has cropping for ${season.label}; send the version you read to change it.`
          : `Someone changed this field's cropping for ${season.label} since you opened it (you had version ${input.version}, it is now ${existing.version}). Reload and change it again.`,
        { current: existing },
      );
    }
    const rep = {
      fieldId: field.id,
      seasonId: season.id,
      crop: input.crop,
      tillage: input.tillage ?? null,
      residuePct: input.residuePct ?? null,
      groundCoverPct: input.groundCoverPct ?? null,
      coverCrop: input.coverCrop ? JSON.stringify(input.coverCrop) : null,
      practice: input.practice ?? 'none',
      terraceIntervalM: input.terraceIntervalM ?? null,
      userId: actor.userId,
    };
    await sequelize.query(
      `INSERT INTO field_croppings (field_id, season_id, crop, tillage, residue_pct, ground_cover_pct, cover_crop, practice, terrace_interval_m, updated_by)
       VALUES (:fieldId, :seasonId, :crop, :tillage, :residuePct, :groundCoverPct, :coverCrop, :practice, :terraceIntervalM, :userId)
       ON CONFLICT (field_id, season_id) DO UPDATE SET crop = EXCLUDED.crop, tillage = EXCLUDED.tillage, residue_pct = EXCLUDED.residue_pct,
         ground_cover_pct = EXCLUDED.ground_cover_pct, cover_crop = EXCLUDED.cover_crop, practice = EXCLUDED.practice,
         terrace_interval_m = EXCLUDED.terrace_interval_m, updated_by = EXCLUDED.updated_by, updated_at = now(),
         version = field_croppings.version + 1`,
      { replacements: rep, transaction: t },
    );
    await recordEvent({ userId: actor.userId, farmId: field.farmId, entity: 'cropping', entityId: field.id, action: existing ? 'updated' : 'created', detail: { season: season.label, crop: input.crop } }, t);
    return (await getCropping(sequelize, field.id, season.id, t))!;
  });
}
