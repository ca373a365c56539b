// A soil check made standing in the field: where it was taken (a GPS point with the accuracy
// the phone reported), and a key the browser makes per check so a check sent again after a lost
// answer is stored once (a photo sent again likewise).
import type { QueryInterface } from 'sequelize';

export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE soil_samples
      ADD COLUMN position geometry(POINT, 4326),
      ADD COLUMN position_accuracy_m double precision CHECK (position_accuracy_m >= 0),
      ADD COLUMN client_key uuid UNIQUE;
    ALTER TABLE soil_photos ADD COLUMN client_key uuid UNIQUE;
  `);
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(`
    ALTER TABLE soil_photos DROP COLUMN client_key;
    ALTER TABLE soil_samples DROP COLUMN position, DROP COLUMN position_accuracy_m, DROP COLUMN client_key;
  `);
}
