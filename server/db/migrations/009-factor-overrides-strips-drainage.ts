// Per-field overrides of R, K, C and P, each with the note that says why and who set it; the
// rotation and width of contour strips (AH-537 table 14 reads P by rotation); and whether a
// field is drained and how deep the drainage keeps the water table (NEH 630 ch. 7 dual groups).
// Stored assessments are refreshed at start-up by the engine-version change that comes with it.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE TABLE field_factor_overrides (
      id serial PRIMARY KEY,
      field_id integer NOT NULL REFERENCES fields(id) ON DELETE CASCADE,
      factor text NOT NULL CHECK (factor IN ('r', 'k', 'c', 'p')),
      value real NOT NULL CHECK (value >= 0),
      note text NOT NULL CHECK (length(note) > 0),
      set_by integer REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (field_id, factor)
    );
    ALTER TABLE field_croppings
      ADD COLUMN strip_rotation text CHECK (strip_rotation IN ('A', 'B', 'C')),
      ADD COLUMN strip_width_m real;
    -- Strip cropping saved before the rotation was asked: the least favourable column (C) until someone says.
    UPDATE field_croppings SET strip_rotation = 'C' WHERE practice = 'strip cropping';
    ALTER TABLE field_grounds
      ADD COLUMN drained boolean NOT NULL DEFAULT false,
      ADD COLUMN drained_water_table_depth_cm real;
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE field_grounds DROP COLUMN drained_water_table_depth_cm, DROP COLUMN drained;
    ALTER TABLE field_croppings DROP COLUMN strip_width_m, DROP COLUMN strip_rotation;
    DROP TABLE field_factor_overrides;
  `);
}
