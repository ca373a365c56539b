// A farm's map layers: the pictures the last terrain run drew, and the soil-loss picture drawn
// on request from the kept LS grid and each field's assessment for a season.
import type { Sequelize } from 'sequelize';
import { TerrainLayer, type TerrainGrid } from '../models';
import { HttpError, notFound } from '../lib/http-error';
import type { FileStorage } from './storage/file-storage';
import { keptGrids, renderSoilLossLayer } from './soil-loss-layer.service';
import { listSeasons, resolveSeason } from './seasons.service';
import type { Season } from '../../shared/schemas/season';

export type FarmLayers = {
  layers: TerrainLayer[];
  /** The kept LS grid and the season its soil-loss picture is offered for; null when it cannot be drawn. */
  soilLoss: { ls: TerrainGrid; season: Season } | null;
};

export async function farmLayers(sequelize: Sequelize, farmId: number): Promise<FarmLayers> {
  const layers = await TerrainLayer.ofFarm(farmId);
  const grids = await keptGrids(farmId);
  const season = (await listSeasons(farmId)).find((s) => s.current);
  return { layers, soilLoss: grids && season && layers.length ? { ls: grids.ls, season } : null };
}

export type LayerImage = { png: Buffer; cacheControl: string };

/** A layer's PNG; soil loss is drawn for the season asked for (default: the current one). */
export async function layerImage(
  deps: { sequelize: Sequelize; storage: FileStorage },
  farmId: number,
  kind: string,
  seasonLabel: string | undefined,
): Promise<LayerImage> {
  if (kind === 'soil-loss') {
    const season = await resolveSeason(farmId, seasonLabel);
    const drawn = await renderSoilLossLayer(deps, farmId, season);
    if (!drawn) throw notFound('That map layer');
    if (!drawn.ok) throw new HttpError(422, 'cannot_draw', drawn.reason);
    // Drawn from the season's assessments, which follow every input: never from a cache.
    return { png: drawn.png, cacheControl: 'private, no-cache' };
  }
  const [layer] = await TerrainLayer.ofFarm(farmId, kind);
  if (!layer) throw notFound('That map layer');
  return { png: await deps.storage.get(layer.fileKey), cacheControl: 'private, max-age=60' };
}
