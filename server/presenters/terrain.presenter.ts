// API shapes of a farm's elevation model, its map layers and a field's terrain figures.
import type { ElevationModel, FieldTerrain, ProcessingJob } from '../models';
import type { FarmLayers } from '../services/terrain-layers.service';
import { LAYER_LABELS, layerLegend, type LayerKind } from '../services/terrain';

export function presentFarmElevation({ model, latestJob }: { model: ElevationModel | null; latestJob: ProcessingJob | null }) {
  return {
    model: model && { id: model.id, originalName: model.originalName, epsg: model.epsg, width: model.width, height: model.height, cellSizeM: model.cellSizeM, createdAt: model.createdAt },
    latestJob: latestJob && { id: latestJob.id, state: latestJob.state, progress: latestJob.progress, message: latestJob.message },
  };
}

/** A file key's name without folder and extension: it changes with every run, so a new picture is never hidden by a cache. */
const versionOf = (fileKey: string) => fileKey.replace(/^.*\/|\.[a-z0-9]+$/g, '');

export function presentFarmLayers(farmId: number, { layers, soilLoss }: FarmLayers) {
  const entries = layers.map((l) => ({
    key: l.kind,
    label: LAYER_LABELS[l.kind as LayerKind] ?? l.kind,
    url: `/api/farms/${farmId}/layers/${l.kind}.png?v=${versionOf(l.fileKey)}`,
    bounds: [
      [l.bounds.south, l.bounds.west],
      [l.bounds.north, l.bounds.east],
    ],
    legend: l.legend,
  }));
  // Soil loss per cell is drawn on request from the kept LS grid and each field's assessment.
  if (soilLoss) {
    const { season, ls } = soilLoss;
    entries.push({
      ...entries[0],
      key: 'soil-loss',
      label: `${LAYER_LABELS['soil-loss']} (${season.label})`,
      url: `/api/farms/${farmId}/layers/soil-loss.png?season=${encodeURIComponent(season.label)}&v=${versionOf(ls.fileKey)}`,
      legend: layerLegend({ kind: 'soil-loss' }),
    });
  }
  return entries;
}

export function presentFieldTerrain(figures: FieldTerrain) {
  return { ...figures.stats, computedAt: figures.computedAt, upToDate: figures.fieldVersion === figures.field?.version && !figures.stale, stale: figures.stale };
}
