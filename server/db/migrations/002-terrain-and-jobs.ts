// Elevation models per farm, background jobs with progress, per-field terrain figures and
// rendered map layers; per-farm slope-class breaks.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE farms ADD COLUMN slope_breaks jsonb;
    CREATE TABLE elevation_models (
      id serial PRIMARY KEY,
      farm_id integer NOT NULL REFERENCES farms(id) ON DELETE CASCADE,
      file_key text NOT NULL,
      original_name text NOT NULL,
      epsg integer NOT NULL,
      width integer NOT NULL,
      height integer NOT NULL,
      cell_size_m double precision NOT NULL,
      bounds geometry(POLYGON, 4326) NOT NULL,
      created_by integer REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX elevation_models_farm ON elevation_models (farm_id, id);
    CREATE TABLE processing_jobs (
      id uuid PRIMARY KEY,
      farm_id integer NOT NULL REFERENCES farms(id) ON DELETE CASCADE,
      kind text NOT NULL,
      state text NOT NULL DEFAULT 'queued' CHECK (state IN ('queued', 'running', 'done', 'failed')),
      progress real NOT NULL DEFAULT 0,
      message text NOT NULL DEFAULT 'Waiting to start',
      payload jsonb NOT NULL DEFAULT '{}'::jsonb,
      created_by integer REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX processing_jobs_farm ON processing_jobs (farm_id, created_at);
    CREATE TABLE field_terrain (
      field_id integer PRIMARY KEY REFERENCES fields(id) ON DELETE CASCADE,
      elevation_model_id integer NOT NULL REFERENCES elevation_models(id) ON DELETE CASCADE,
      field_version integer NOT NULL,
      stats jsonb NOT NULL,
      computed_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE terrain_layers (
      elevation_model_id integer NOT NULL REFERENCES elevation_models(id) ON DELETE CASCADE,
      kind text NOT NULL,
      file_key text NOT NULL,
      bounds jsonb NOT NULL,
      legend jsonb NOT NULL,
      PRIMARY KEY (elevation_model_id, kind)
    );
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query('DROP TABLE terrain_layers, field_terrain, processing_jobs, elevation_models; ALTER TABLE farms DROP COLUMN slope_breaks;');
}
