// Accepting a DEM upload: it must be a GeoTIFF with a known CRS that overlaps the farm's
// fields. The file is stored under a server-made key and a terrain job is queued.
import { QueryTypes, type Sequelize } from 'sequelize';
import { readDem, converterBetween } from './terrain';
import type { DemGrid } from './terrain';
import { HttpError, invalid, unsupportedType } from '../lib/http-error';
import { newKey, type FileStorage } from './storage/file-storage';
import type { JobQueue } from './jobs/job-queue';
import { recordEvent } from './audit';

/** The grid's outline in WGS84, sampled along its edges (a projected square is curved in lon/lat). */
export function demBoundsWgs84(dem: DemGrid): { ok: true; ring: [number, number][] } | { ok: false; reason: string } {
  const conv = converterBetween(dem.epsg, 4326);
  if (!conv.ok) return conv;
  const x0 = dem.originX, y0 = dem.originY;
  const x1 = x0 + dem.width * dem.cellSizeX, y1 = y0 - dem.height * dem.cellSizeY;
  const pts: [number, number][] = [];
  const n = 8;
  for (let i = 0; i < n; i++) pts.push([x0 + ((x1 - x0) * i) / n, y0]);
  for (let i = 0; i < n; i++) pts.push([x1, y0 + ((y1 - y0) * i) / n]);
  for (let i = 0; i < n; i++) pts.push([x1 - ((x1 - x0) * i) / n, y1]);
  for (let i = 0; i < n; i++) pts.push([x0, y1 - ((y1 - y0) * i) / n]);
  const ring = pts.map((p) => conv.converter.forward(p));
  ring.push(ring[0]);
  return { ok: true, ring };
}

export async function acceptDem(
  deps: { sequelize: Sequelize; storage: FileStorage; jobs: JobQueue },
  actor: { userId: number },
  farmId: number,
  file: { buffer: Buffer; originalName: string },
): Promise<{ jobId: string; elevationModelId: number }> {
  if (file.buffer.length === 0) throw new HttpError(400, 'empty_file', 'The file is empty.');
  const read = await readDem(file.buffer);
  if (!read.ok) {
    if (/not a GeoTIFF|not a TIFF/i.test(read.reason)) throw unsupportedType(`An elevation model must be a GeoTIFF (.tif): ${read.reason}.`);
    throw invalid('invalid_dem', `The elevation model cannot be used: ${read.reason}.`);
  }
  const dem = read.dem;
  const bounds = demBoundsWgs84(dem);
  if (!bounds.ok) throw invalid('invalid_dem', `The elevation model's coordinate system cannot be used: ${bounds.reason}.`);
  const boundsGeoJson = JSON.stringify({ type: 'Polygon', coordinates: [bounds.ring] });
  const [overlap] = await deps.sequelize.query<{ n: number }>(
    `SELECT count(*)::int AS n FROM fields WHERE farm_id = :farmId AND ST_Intersects(geom, ST_SetSRID(ST_GeomFromGeoJSON(:b), 4326))`,
    { replacements: { farmId, b: boundsGeoJson }, type: QueryTypes.SELECT },
  );
  if (overlap.n === 0) {
    throw invalid('dem_outside_fields', `The elevation model (EPSG:${dem.epsg}) does not overlap any of this farm's fields; check that it covers the farm and that its coordinate system is right.`);
  }
  const key = newKey('dems', '.tif');
  await deps.storage.put(key, file.buffer);
  try {
    const id = await deps.sequelize.transaction(async (t) => {
      const [row] = await deps.sequelize.query<{ id: number }>(
        `INSERT INTO elevation_models (farm_id, file_key, original_name, epsg, width, height, cell_size_m, bounds, created_by)
         VALUES (:farmId, :key, :name, :epsg, :w, :h, :cell, ST_SetSRID(ST_GeomFromGeoJSON(:b), 4326), :userId) RETURNING id`,
        {
          replacements: { farmId, key, name: file.originalName.slice(0, 200), epsg: dem.epsg, w: dem.width, h: dem.height, cell: dem.rowCellSizeXM[0], b: boundsGeoJson, userId: actor.userId },
          type: QueryTypes.SELECT,
          transaction: t,
        },
      );
      await recordEvent({ userId: actor.userId, farmId, entity: 'elevation_model', entityId: row.id, action: 'uploaded', detail: { epsg: dem.epsg, width: dem.width, height: dem.height } }, t);
      return row.id;
    });
    const jobId = await deps.jobs.enqueue('terrain', farmId, actor.userId, { elevationModelId: id });
    return { jobId, elevationModelId: id };
  } catch (e) {
    await deps.storage.remove(key); // no orphan file when the row could not be written
    throw e;
  }
}
