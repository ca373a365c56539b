// Public surface of the terrain service (pure functions over typed-array grids).
export type { DemGrid, ProgressFn } from './types';
export { projectedDem } from './types';
export { readDem, type ReadDemResult } from './read-dem';
export { writeGeoTiff } from './write-geotiff';
export { slopeHorn } from './slope-horn';
export { hillshade } from './hillshade';
export { fillDepressions } from './fill-depressions';
export { flowDirectionD8, flowAccumulationM2, inletAreaM2, D8_DIR_FACTOR } from './flow-d8';
export { lsGrid } from './ls-grid';
export { soilLossGrid, type SoilLossFactors } from './soil-loss-grid';
export { rasterisePolygon } from './rasterise-polygon';
export { fieldTerrainStats, cellCentre, type FieldTerrainStats, type FieldStatsResult } from './field-stats';
export { DEFAULT_SLOPE_CLASSES, parseSlopeClasses, type SlopeClass } from './slope-classes';
export { loadDefaultSlopeClasses } from './load-slope-classes';
export { reprojectBoundary, converterBetween } from './reproject';
export { proj4Definition } from './epsg-definitions';
export { renderLayer, layerLegend, type LayerKind, type RenderResult, type BoundsWgs84 } from './render-layer';
export { runTerrain, type TerrainGrids, type TerrainOptions } from './pipeline';
