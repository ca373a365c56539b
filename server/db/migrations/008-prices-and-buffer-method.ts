// A farm's price list for treatments with its lime and gypsum products (absent until someone
// edits the example list), and the
// buffer method of a soil sample's buffer pH, which lime needs to read it.
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    CREATE TABLE farm_prices (
      farm_id integer PRIMARY KEY REFERENCES farms(id) ON DELETE CASCADE,
      currency text NOT NULL CHECK (currency ~ '^[A-Z]{3}$'),
      prices jsonb NOT NULL,
      amendments jsonb,
      version integer NOT NULL DEFAULT 1,
      updated_by integer REFERENCES users(id) ON DELETE SET NULL,
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    ALTER TABLE soil_samples ADD COLUMN buffer_method text CHECK (buffer_method IN ('smp', 'mehlich'));
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE soil_samples DROP COLUMN buffer_method;
    DROP TABLE farm_prices;
  `);
}
