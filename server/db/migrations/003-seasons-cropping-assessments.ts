// Seasons per farm, cropping and practices per field per season, farm climate (R and the
// design storm), typed ground (slope where there is no DEM), and stored assessments.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE TABLE seasons (
      id serial PRIMARY KEY,
      farm_id integer NOT NULL REFERENCES farms(id) ON DELETE CASCADE,
      label text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (farm_id, label)
    );
    CREATE TABLE field_croppings (
      id serial PRIMARY KEY,
      field_id integer NOT NULL REFERENCES fields(id) ON DELETE CASCADE,
      season_id integer NOT NULL REFERENCES seasons(id) ON DELETE CASCADE,
      crop text NOT NULL,
      tillage text,
      residue_pct real,
      ground_cover_pct real,
      cover_crop jsonb,
      practice text NOT NULL DEFAULT 'none',
      terrace_interval_m real,
      version integer NOT NULL DEFAULT 0,
      updated_by integer REFERENCES users(id) ON DELETE SET NULL,
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (field_id, season_id)
    );
    CREATE TABLE farm_climates (
      farm_id integer PRIMARY KEY REFERENCES farms(id) ON DELETE CASCADE,
      r_from text NOT NULL CHECK (r_from IN ('value', 'precipitation')),
      r_value real,
      annual_precipitation_mm real,
      design_storm_mm real NOT NULL,
      version integer NOT NULL DEFAULT 0,
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE field_grounds (
      field_id integer PRIMARY KEY REFERENCES fields(id) ON DELETE CASCADE,
      slope_pct real,
      slope_length_m real,
      version integer NOT NULL DEFAULT 0,
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE assessments (
      id serial PRIMARY KEY,
      field_id integer NOT NULL REFERENCES fields(id) ON DELETE CASCADE,
      season_id integer NOT NULL REFERENCES seasons(id) ON DELETE CASCADE,
      inputs_hash text NOT NULL,
      inputs jsonb NOT NULL,
      results jsonb NOT NULL,
      engine_version text NOT NULL,
      computed_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (field_id, season_id)
    );
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query('DROP TABLE assessments, field_grounds, farm_climates, field_croppings, seasons');
}
