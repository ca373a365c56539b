// What a terrain run reads from outside the terrain tables.
import { QueryTypes } from 'sequelize';
import { FieldTerrain } from './field-terrain.model';

/** Slope lengths typed on the Ground tab for the farm's fields, metres by field id. */
export async function typedSlopeLengthsM(farmId: number): Promise<Map<number, number>> {
  const rows = await FieldTerrain.sequelize!.query<{ fieldId: number; slopeLengthM: number }>(
    `SELECT g.field_id AS "fieldId", g.slope_length_m AS "slopeLengthM" FROM field_grounds g JOIN fields f ON f.id = g.field_id
      WHERE f.farm_id = :farmId AND g.slope_length_m IS NOT NULL`,
    { replacements: { farmId }, type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.fieldId, r.slopeLengthM]));
}
