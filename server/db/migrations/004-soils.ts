// Soil checks per field (lab results or a feel test), profile photos, and a farm's soil map
// (map units with their attributes, PostGIS MULTIPOLYGON 4326) with the user's attribute mapping.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE TABLE soil_samples (
      id serial PRIMARY KEY,
      field_id integer NOT NULL REFERENCES fields(id) ON DELETE CASCADE,
      kind text NOT NULL CHECK (kind IN ('lab', 'feel')),
      label text,
      sampled_on date,
      depth_top_cm double precision,
      depth_bottom_cm double precision,
      -- renormalised to 100 %; separates_sum_pct is what was typed
      sand_pct double precision,
      silt_pct double precision,
      clay_pct double precision,
      separates_sum_pct double precision,
      organic_matter_pct double precision,
      ph double precision,
      buffer_ph double precision,
      depth_to_gray_cm double precision,
      described_to_cm double precision,
      bulk_density_mg_m3 double precision,
      cec_cmol_kg double precision,
      esp_pct double precision,
      feel_balls boolean,
      feel_ribbon_cm double precision,
      feel_grit text CHECK (feel_grit IN ('gritty', 'smooth', 'neither')),
      ribbon_class text,
      texture_class text,
      texture_source text,
      drainage_class text,
      not_worth_amending boolean,
      drainage_source text,
      version integer NOT NULL DEFAULT 0,
      created_by integer REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((sand_pct IS NULL) = (silt_pct IS NULL) AND (silt_pct IS NULL) = (clay_pct IS NULL))
    );
    CREATE INDEX soil_samples_field ON soil_samples (field_id, id);

    CREATE TABLE soil_photos (
      id serial PRIMARY KEY,
      field_id integer NOT NULL REFERENCES fields(id) ON DELETE CASCADE,
      sample_id integer REFERENCES soil_samples(id) ON DELETE SET NULL,
      caption text,
      image_key text NOT NULL,
      thumbnail_key text NOT NULL,
      content_type text NOT NULL,
      byte_size integer NOT NULL,
      width integer NOT NULL,
      height integer NOT NULL,
      thumbnail_width integer NOT NULL,
      thumbnail_height integer NOT NULL,
      created_by integer REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX soil_photos_field ON soil_photos (field_id, id);

    CREATE TABLE soil_maps (
      id serial PRIMARY KEY,
      farm_id integer NOT NULL UNIQUE REFERENCES farms(id) ON DELETE CASCADE,
      original_name text NOT NULL,
      attribute_names jsonb NOT NULL DEFAULT '[]'::jsonb,
      mapping jsonb NOT NULL DEFAULT '{}'::jsonb,
      warnings jsonb NOT NULL DEFAULT '[]'::jsonb,
      created_by integer REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE TABLE soil_map_units (
      id serial PRIMARY KEY,
      soil_map_id integer NOT NULL REFERENCES soil_maps(id) ON DELETE CASCADE,
      feature_index integer NOT NULL,
      attributes jsonb NOT NULL DEFAULT '{}'::jsonb,
      geom geometry(MULTIPOLYGON, 4326) NOT NULL
    );
    CREATE INDEX soil_map_units_geom_gist ON soil_map_units USING gist (geom);
    CREATE INDEX soil_map_units_map ON soil_map_units (soil_map_id);
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query('DROP TABLE soil_map_units, soil_maps, soil_photos, soil_samples');
}
