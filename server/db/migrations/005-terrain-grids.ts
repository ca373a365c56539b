// Grids kept from a terrain run (raw typed arrays in storage) so pictures that depend on other
// inputs, such as per-cell soil loss from each field's K, C and P, can be drawn on request.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE TABLE terrain_grids (
      elevation_model_id integer NOT NULL REFERENCES elevation_models(id) ON DELETE CASCADE,
      kind text NOT NULL,
      file_key text NOT NULL,
      frame jsonb NOT NULL,
      detail jsonb NOT NULL DEFAULT '{}'::jsonb,
      PRIMARY KEY (elevation_model_id, kind)
    );
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query('DROP TABLE terrain_grids');
}
