// R may also come from an uploaded rainfall record (storm EI30 summed, AH-703 ch. 2).
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE farm_climates DROP CONSTRAINT farm_climates_r_from_check;
    ALTER TABLE farm_climates ADD CONSTRAINT farm_climates_r_from_check CHECK (r_from IN ('value', 'precipitation', 'record'));
    ALTER TABLE farm_climates ADD COLUMN r_record jsonb;
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    DELETE FROM farm_climates WHERE r_from = 'record';
    ALTER TABLE farm_climates DROP COLUMN r_record;
    ALTER TABLE farm_climates DROP CONSTRAINT farm_climates_r_from_check;
    ALTER TABLE farm_climates ADD CONSTRAINT farm_climates_r_from_check CHECK (r_from IN ('value', 'precipitation'));
  `);
}
