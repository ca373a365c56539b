// A farm's whole terrain computation from the elevation model's file bytes and the field
// outlines: decode, find each field's cells, run the terrain stages in the DEM's own grid
// (pipeline-in-place.ts), draw the map layers, work out each field's figures. Pure CPU and no database, so it can run in a worker thread
// (terrain-thread.ts); the caller reads its inputs and stores what it returns.
// Field borders break overland flow for LS; where water gathers is drawn from unbroken flow.
// Field labels are 2 bytes per cell (Uint16, up to 65 535 fields), made at the end for the
// soil-loss map in the slope codes' buffer.
import type { MultiPolygon, Polygon } from 'geojson';
import { readDem } from './read-dem';
import { runTerrainInPlace } from './pipeline-in-place';
import { FieldLabelRows } from './field-label-rows';
import { renderLayer, type BoundsWgs84, type LayerKind, type LegendEntry, type RenderValues } from './render-layer';
import { reprojectBoundary, converterBetween } from './reproject';
import { polygonSpans, type GridFrame } from './rasterise-polygon';
import { fieldTerrainStats, type FieldTerrainStats } from './field-stats';
import type { SlopeClass } from './slope-classes';
import { LAYER_LABELS } from './layer-labels';
import type { ProgressFn } from './types';

/** Keep at most this many concentrated-flow points per field for the map. */
const MAX_FLOW_POINTS = 400;
/** Labels are Uint16 with 0 for "no field". */
export const MAX_TERRAIN_FIELDS = 65_535;

export type FarmTerrainInput = {
  /** The GeoTIFF's bytes; the buffer is handed over (transferred) to the thread, and taken out of the input once read. */
  demBytes: ArrayBuffer;
  fields: Array<{ id: number; geometry: Polygon | MultiPolygon; typedSlopeLengthM: number | null }>;
  slopeClasses: SlopeClass[];
};

export type FieldTerrainFigures = Omit<FieldTerrainStats, 'concentratedFlow'> & {
  concentratedFlow: { minAreaM2: number; cellCount: number; points: Array<[number, number]> };
  cellSizeM: number;
  epsg: number;
};

export type FarmTerrainOutput = {
  frame: GridFrame & { epsg: number };
  layers: Array<{ kind: LayerKind; png: Uint8Array; bounds: BoundsWgs84; legend: LegendEntry[] }>;
  /** LS per cell and the field labels (0 outside fields, else index in `fields` + 1), kept for the soil-loss map. */
  ls: Float32Array;
  labels: Uint16Array;
  figures: Array<{ fieldId: number; stats: FieldTerrainFigures }>;
};

/** Runs the farm's terrain. Throws an Error with a message for a person when it cannot. */
export async function runFarmTerrain(input: FarmTerrainInput, onProgress: ProgressFn): Promise<FarmTerrainOutput> {
  const { fields, slopeClasses } = input;
  if (fields.length > MAX_TERRAIN_FIELDS) throw new Error(`This farm has ${fields.length} fields; terrain can label at most ${MAX_TERRAIN_FIELDS}.`);
  onProgress(0, 'decoding');
  // Taken out of the input: for a plain Float32 file the grid is the file's own bytes (read-dem.ts),
  // which the run then overwrites.
  const bytes = input.demBytes;
  input.demBytes = new ArrayBuffer(0);
  const read = await readDem(bytes);
  if (!read.ok) throw new Error(`The elevation model cannot be read: ${read.reason}`);
  const dem = read.dem;
  onProgress(0.05, 'read');
  const frame = { width: dem.width, height: dem.height, originX: dem.originX, originY: dem.originY, cellSizeX: dem.cellSizeX, cellSizeY: dem.cellSizeY, epsg: dem.epsg };
  // Each field's cells, as row runs; overland flow starts afresh at its border.
  const ringsByField = new Map<number, Array<Array<[number, number]>>>();
  const spansByField = fields.map((f) => {
    const rings = reprojectBoundary(f.geometry, dem.epsg);
    if (!rings.ok) return null;
    ringsByField.set(f.id, rings.rings);
    return polygonSpans(rings.rings, frame);
  });
  const fieldRows = new FieldLabelRows(dem.width, dem.height, spansByField);
  // A slope length typed on the Ground tab (terraces, diversions, field roads) caps the flow length.
  const capByLabel = new Float64Array(fields.length + 1).fill(NaN);
  fields.forEach((f, idx) => (capByLabel[idx + 1] = f.typedSlopeLengthM ?? NaN));

  const layers: FarmTerrainOutput['layers'] = [];
  const draw = (kind: LayerKind, values: RenderValues, scratch: Uint8Array) => {
    const r = renderLayer({ kind, grid: frame, values, slopeClasses, scratch });
    if (!r.ok) throw new Error(`Could not draw the ${LAYER_LABELS[kind]} layer: ${r.reason}`);
    layers.push({ kind, png: r.png, bounds: r.bounds, legend: r.legend });
  };
  // The DEM's grid is filled in place and ends holding LS (pipeline-in-place.ts).
  const grids = runTerrainInPlace(dem, {
    fields: fieldRows,
    maxSlopeLengthMByLabel: capByLabel,
    onRelief: (shade, scratch) => draw('hillshade', shade, scratch),
    onProgress: (f, stage) => onProgress(0.05 + 0.65 * f, stage),
  });

  onProgress(0.7, 'drawing map layers');
  // The spent directions' buffer holds each picture's scanlines in turn.
  draw('slope-classes', grids.slopePct, grids.spare);
  draw('ls', grids.ls, grids.spare);
  draw('concentrated-flow', grids.contributingAreaM2, grids.spare);

  onProgress(0.85, 'working out each field');
  const toWgs = converterBetween(dem.epsg, 4326);
  const figures = fields.flatMap((f) => {
    const rings = ringsByField.get(f.id);
    if (!rings) return [];
    const s = fieldTerrainStats({ rings, grid: frame, slopePct: grids.slopePct, ls: grids.ls, contributingAreaM2: grids.contributingAreaM2, slopeClasses, maxFlowPoints: MAX_FLOW_POINTS });
    if (!s.ok) return [];
    const { cells: _cells, points, ...flow } = s.stats.concentratedFlow;
    const pointsWgs84 = toWgs.ok ? points.map((p) => toWgs.converter.forward(p) as [number, number]) : [];
    const stats: FieldTerrainFigures = { ...s.stats, concentratedFlow: { ...flow, points: pointsWgs84 }, cellSizeM: dem.rowCellSizeXM[0], epsg: dem.epsg };
    return [{ fieldId: f.id, stats }];
  });
  // The slope codes are done with: their buffer takes the field labels kept for the soil-loss map.
  const labels = fieldRows.toGrid(new Uint16Array(grids.slopePct.codes.buffer, 0, dem.width * dem.height));
  return { frame, layers, ls: grids.ls, labels, figures };
}
