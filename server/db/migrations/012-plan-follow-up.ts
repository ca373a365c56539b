// Follow-up on a plan's actions: the day the work was done, the amount actually applied, who
// recorded it and when, an optional photo (files in storage), and the advisor's check. These
// are records of what happened, not changes to the plan, so they live beside the action. And who
// last changed a soil check (other records already keep it).
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE plan_actions
      ADD COLUMN done_on date,
      ADD COLUMN applied_quantity double precision CHECK (applied_quantity >= 0),
      ADD COLUMN done_note text,
      ADD COLUMN done_by_user integer REFERENCES users(id) ON DELETE SET NULL,
      ADD COLUMN done_at timestamptz,
      ADD COLUMN checked_by integer REFERENCES users(id) ON DELETE SET NULL,
      ADD COLUMN checked_at timestamptz,
      ADD COLUMN photo_key text,
      ADD COLUMN photo_thumbnail_key text,
      ADD COLUMN photo_content_type text,
      ADD CONSTRAINT plan_actions_done_check CHECK (status = 'planned' OR done_on IS NOT NULL);
    ALTER TABLE soil_samples ADD COLUMN updated_by integer REFERENCES users(id) ON DELETE SET NULL;
    UPDATE soil_samples SET updated_by = created_by;
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE soil_samples DROP COLUMN updated_by;
    ALTER TABLE plan_actions
      DROP CONSTRAINT plan_actions_done_check,
      DROP COLUMN done_on, DROP COLUMN applied_quantity, DROP COLUMN done_note, DROP COLUMN done_by_user, DROP COLUMN done_at,
      DROP COLUMN checked_by, DROP COLUMN checked_at, DROP COLUMN photo_key, DROP COLUMN photo_thumbnail_key, DROP COLUMN photo_content_type;
  `);
}
