// Stored assessments are what the board reads: each keeps its board row (figures, gaps and
// reasons) beside the full results, refreshed when an input changes rather than hashed on
// every read. Climate and typed ground remember who typed them, so an input can say so.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    DELETE FROM assessments;
    ALTER TABLE assessments DROP COLUMN inputs_hash;
    ALTER TABLE assessments ADD COLUMN board_row jsonb NOT NULL;
    CREATE INDEX assessments_season_idx ON assessments (season_id);
    ALTER TABLE farm_climates ADD COLUMN updated_by integer REFERENCES users(id) ON DELETE SET NULL;
    ALTER TABLE field_grounds ADD COLUMN updated_by integer REFERENCES users(id) ON DELETE SET NULL;
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE field_grounds DROP COLUMN updated_by;
    ALTER TABLE farm_climates DROP COLUMN updated_by;
    DELETE FROM assessments;
    DROP INDEX assessments_season_idx;
    ALTER TABLE assessments DROP COLUMN board_row;
    ALTER TABLE assessments ADD COLUMN inputs_hash text NOT NULL;
  `);
}
