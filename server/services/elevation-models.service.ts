// Accepting a DEM upload: it must be a GeoTIFF with a known CRS that overlaps the farm's
// fields. The file is stored under a server-made key and a terrain job is queued.
import type { Sequelize } from 'sequelize';
import type { Polygon } from 'geojson';
import { ElevationModel, ProcessingJob } from '../models';
import { countFieldsOverlapping } from '../models/elevation-model.queries';
import { converterBetween } from './terrain';
import { readDemHeader, type DemHeader } from './terrain/read-dem-header';
import { HttpError, invalid, unsupportedType } from '../lib/http-error';
import { newKey, type FileStorage } from './storage/file-storage';
import type { JobQueue } from './jobs/job-queue';
import { recordEvent } from './audit';
import { DEM_MAX_CELLS } from '../../shared/limits';

/** The grid's outline in WGS84, sampled along its edges (a projected square is curved in lon/lat). */
export function demBoundsWgs84(dem: DemHeader): { ok: true; ring: [number, number][] } | { ok: false; reason: string } {
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

/**
 * 503 without a job queue: the upload would wait for a run that never comes. Only the file's
 * header is read here (no cell is decoded on the API's event loop): a grid over `maxCells` is
 * refused with 413 before the run would decode it.
 */
export async function acceptDem(
  deps: { sequelize: Sequelize; storage: FileStorage; jobs?: JobQueue; demMaxCells?: number },
  actor: { userId: number },
  farmId: number,
  file: { buffer: Buffer; originalName: string },
): Promise<{ jobId: string; elevationModelId: number }> {
  const { jobs } = deps;
  if (!jobs) throw new HttpError(503, 'jobs_unavailable', 'Background processing is not running on this server; try again later.');
  if (file.buffer.length === 0) throw new HttpError(400, 'empty_file', 'The file is empty.');
  const read = await readDemHeader(file.buffer, deps.demMaxCells ?? DEM_MAX_CELLS);
  if (!read.ok) {
    if (read.problem === 'not_tiff') throw unsupportedType(`An elevation model must be a GeoTIFF (.tif): ${read.reason}.`);
    if (read.problem === 'too_many_cells') {
      throw new HttpError(413, 'dem_too_large', `The elevation model is too large: ${read.reason}. Resample it to larger cells or clip it to the farm.`);
    }
    throw invalid('invalid_dem', `The elevation model cannot be used: ${read.reason}.`);
  }
  const dem = read.header;
  const outline = demBoundsWgs84(dem);
  if (!outline.ok) throw invalid('invalid_dem', `The elevation model's coordinate system cannot be used: ${outline.reason}.`);
  const bounds: Polygon = { type: 'Polygon', coordinates: [outline.ring] };
  if ((await countFieldsOverlapping(farmId, bounds)) === 0) {
    throw invalid('dem_outside_fields', `The elevation model (EPSG:${dem.epsg}) does not overlap any of this farm's fields; check that it covers the farm and that its coordinate system is right.`);
  }
  const fileKey = newKey('dems', '.tif');
  await deps.storage.put(fileKey, file.buffer);
  try {
    return await deps.sequelize.transaction(async (transaction) => {
      const model = await ElevationModel.create(
        { farmId, fileKey, originalName: file.originalName.slice(0, 200), epsg: dem.epsg, width: dem.width, height: dem.height, cellSizeM: dem.rowCellSizeXM[0], bounds, createdBy: actor.userId },
        { transaction },
      );
      await recordEvent({ userId: actor.userId, farmId, entity: 'elevation_model', entityId: model.id, action: 'uploaded', detail: { epsg: dem.epsg, width: dem.width, height: dem.height } }, transaction);
      // In the same transaction: no model without its run, no run (409/429) without its model.
      const jobId = await jobs.enqueue('terrain', farmId, actor.userId, { elevationModelId: model.id }, transaction);
      return { jobId, elevationModelId: model.id };
    });
  } catch (e) {
    await deps.storage.remove(fileKey); // no orphan file when the row could not be written
    throw e;
  }
}

/** The farm's current elevation model and its latest terrain job (either may be missing). */
export async function farmElevation(farmId: number): Promise<{ model: ElevationModel | null; latestJob: ProcessingJob | null }> {
  const [model, latestJob] = await Promise.all([ElevationModel.newestOfFarm(farmId), ProcessingJob.latestOfFarm(farmId, 'terrain')]);
  return { model, latestJob };
}
