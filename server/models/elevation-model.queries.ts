// PostGIS questions about elevation models that Sequelize's finders cannot ask by themselves.
import { Op, col, fn, where } from 'sequelize';
import type { Polygon } from 'geojson';
import { Field } from './field.model';

/** How many of the farm's fields an outline (WGS84) touches. */
export function countFieldsOverlapping(farmId: number, outline: Polygon): Promise<number> {
  const geometry = fn('ST_SetSRID', fn('ST_GeomFromGeoJSON', JSON.stringify(outline)), 4326);
  return Field.count({ where: { farmId, [Op.and]: [where(fn('ST_Intersects', col('geom'), geometry), true)] } });
}
