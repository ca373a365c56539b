// Jobs that finish or fail: at most one terrain run waiting or running per farm (a partial unique
// index, so two requests at once cannot both queue one), a flag asking for another run once the
// running one ends (inputs changed while it ran), and terrain figures marked stale when the run
// that should have replaced them stopped without finishing.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    UPDATE processing_jobs j SET state = 'failed', message = 'Replaced by a newer run of the same farm.', updated_at = now()
      WHERE j.state IN ('queued', 'running') AND EXISTS (
        SELECT 1 FROM processing_jobs n
        WHERE n.farm_id = j.farm_id AND n.kind = j.kind AND n.state IN ('queued', 'running') AND (n.created_at, n.id) > (j.created_at, j.id)
      );
    CREATE UNIQUE INDEX processing_jobs_one_pending ON processing_jobs (farm_id, kind) WHERE state IN ('queued', 'running');
    CREATE INDEX processing_jobs_pending_by_user ON processing_jobs (created_by) WHERE state IN ('queued', 'running');
    ALTER TABLE processing_jobs ADD COLUMN rerun_requested boolean NOT NULL DEFAULT false;
    ALTER TABLE field_terrain ADD COLUMN stale boolean NOT NULL DEFAULT false;
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE field_terrain DROP COLUMN stale;
    ALTER TABLE processing_jobs DROP COLUMN rerun_requested;
    DROP INDEX processing_jobs_pending_by_user;
    DROP INDEX processing_jobs_one_pending;
  `);
}
