// Reads for assessments that span several tables: the stored board rows of a farm or of all an
// advisor's client farms in one query each, and the farms whose stored assessments are missing
// or from an older engine.
import { QueryTypes, type Sequelize } from 'sequelize';
import type { StoredBoardFigures } from '../../shared/schemas/assessment';

/** A field with its stored board figures for the season (null when none is stored yet). */
export type BoardRecord = {
  seasonId: number;
  seasonLabel: string;
  farmId: number;
  farmName: string;
  fieldId: number;
  name: string;
  areaM2: number;
  boardRow: StoredBoardFigures | null;
};

type BoardSqlRow = { season_id: number; season_label: string; farm_id: number; farm_name: string; field_id: number | null; name: string | null; area_m2: number | null; board_row: StoredBoardFigures | null };

const toRecords = (rows: BoardSqlRow[]): BoardRecord[] =>
  rows
    .filter((r) => r.field_id !== null)
    .map((r) => ({ seasonId: r.season_id, seasonLabel: r.season_label, farmId: r.farm_id, farmName: r.farm_name, fieldId: r.field_id!, name: r.name!, areaM2: r.area_m2!, boardRow: r.board_row }));

/**
 * Every field of one farm (or only one owner's) with its stored board figures, for the season with
 * that label or the farm's current one (the newest holding cropping or a plan, else the newest), in one query. No season: an empty list and a null season.
 */
export async function farmBoardRecords(
  sequelize: Sequelize,
  args: { farmId: number; seasonLabel?: string; ownerMembershipId?: number },
): Promise<{ season: { id: number; label: string } | null; records: BoardRecord[] }> {
  const rows = await sequelize.query<BoardSqlRow>(
    `WITH chosen AS (
       SELECT s.id, s.label, s.farm_id FROM seasons s
        WHERE s.farm_id = $farmId AND ($label::text IS NULL OR s.label = $label)
        ORDER BY (EXISTS (SELECT 1 FROM field_croppings fc WHERE fc.season_id = s.id) OR EXISTS (SELECT 1 FROM plans p WHERE p.season_id = s.id)) DESC, s.label DESC LIMIT 1)
     SELECT c.id AS season_id, c.label AS season_label, fa.id AS farm_id, fa.name AS farm_name,
            f.id AS field_id, f.name, f.area_m2, a.board_row
       FROM chosen c
       JOIN farms fa ON fa.id = c.farm_id
       LEFT JOIN fields f ON f.farm_id = c.farm_id AND ($owner::integer IS NULL OR f.owner_membership_id = $owner)
       LEFT JOIN assessments a ON a.field_id = f.id AND a.season_id = c.id`,
    { bind: { farmId: args.farmId, label: args.seasonLabel ?? null, owner: args.ownerMembershipId ?? null }, type: QueryTypes.SELECT },
  );
  const season = rows[0] ? { id: rows[0].season_id, label: rows[0].season_label } : null;
  return { season, records: toRecords(rows) };
}

/**
 * An advisor's board across every farm where they are advisor: each farm's season with that
 * label, or its current season (as for one farm). Farms without such a season are left out; a farm with the season
 * but no fields still names its season.
 */
export async function advisorBoardRecords(sequelize: Sequelize, args: { userId: number; seasonLabel?: string }): Promise<{ seasons: string[]; records: BoardRecord[] }> {
  const rows = await sequelize.query<BoardSqlRow>(
    `WITH chosen AS (
       SELECT DISTINCT ON (s.farm_id) s.id, s.farm_id, s.label
         FROM seasons s
         JOIN memberships m ON m.farm_id = s.farm_id AND m.user_id = :userId AND m.role = 'advisor'
        WHERE CAST(:label AS text) IS NULL OR s.label = :label
        ORDER BY s.farm_id, (EXISTS (SELECT 1 FROM field_croppings fc WHERE fc.season_id = s.id) OR EXISTS (SELECT 1 FROM plans p WHERE p.season_id = s.id)) DESC, s.label DESC)
     SELECT c.id AS season_id, c.label AS season_label, fa.id AS farm_id, fa.name AS farm_name,
            f.id AS field_id, f.name, f.area_m2, a.board_row
       FROM chosen c
       JOIN farms fa ON fa.id = c.farm_id
       LEFT JOIN fields f ON f.farm_id = c.farm_id
       LEFT JOIN assessments a ON a.field_id = f.id AND a.season_id = c.id`,
    { replacements: { userId: args.userId, label: args.seasonLabel ?? null }, type: QueryTypes.SELECT },
  );
  return { seasons: [...new Set(rows.map((r) => r.season_label))], records: toRecords(rows) };
}

/** Farms where some field lacks a stored assessment for some season, or has one from another engine version. */
export async function farmsWithStaleAssessments(sequelize: Sequelize, engineVersion: string): Promise<number[]> {
  const rows = await sequelize.query<{ farm_id: number }>(
    `SELECT DISTINCT s.farm_id
       FROM seasons s
       JOIN fields f ON f.farm_id = s.farm_id
       LEFT JOIN assessments a ON a.field_id = f.id AND a.season_id = s.id
      WHERE a.id IS NULL OR a.engine_version <> :engineVersion`,
    { replacements: { engineVersion }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.farm_id);
}
