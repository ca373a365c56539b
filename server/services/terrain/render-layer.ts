// Colours a grid into a palette PNG (palette-png.ts) for a Leaflet ImageOverlay. The image is resampled (nearest
// cell) onto a Web Mercator (EPSG:3857) aligned frame, the frame Leaflet draws in, so the overlay
// lines up with the map even though the DEM's grid is rotated against it; the source position of
// each pixel is interpolated bilinearly from a coarse lattice of exact proj4 transforms.
// Colours: ColorBrewer YlOrBr 5-class (Brewer, colorbrewer2.org), a colour-blind-safe sequential
// scheme; concentrated flow in dark blue; nodata transparent.
// Slope classes may be drawn from the pipeline's 2-byte slope codes and concentrated flow from
// its 1-bit mask: the class tests on codes give the same pixels as on Float32 slope.
import { PaletteScanlines } from './palette-png';
import { pictureFrame, type BoundsWgs84 } from './picture-frame';
import { drawRows, type Painter } from './paint-rows';
import { frameRuns } from './picture-runs';
import { ContributingAreaMask, DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2 } from './contributing-area-mask';
import type { GridFrame } from './rasterise-polygon';
import { DEFAULT_SLOPE_CLASSES, type SlopeClass } from './slope-classes';
import { SLOPE_CODE_NODATA, slopeCodeAtLeast, SlopePctGrid } from './slope-pct-grid';

export const YLORBR_5 = ['#ffffd4', '#fed98e', '#fe9929', '#d95f0e', '#993404'] as const;
export const FLOW_BLUE = '#08306b';
/** LS class upper limits for the map (common practice, no single source). */
export const LS_BREAKS = [0.5, 1, 2, 4];
/** Soil-loss class upper limits, t/ha/yr (≈ 1, 2, 5, 10 US t/ac/yr; common practice, no single source). */
export const SOIL_LOSS_BREAKS_T_PER_HA_YR = [2.2, 4.5, 11, 22];

export type LayerKind = 'hillshade' | 'slope-classes' | 'ls' | 'soil-loss' | 'concentrated-flow';
export type LegendEntry = { label: string; colour: string };
export type RenderValues = Float32Array | Uint8Array | SlopePctGrid | ContributingAreaMask;
export type { BoundsWgs84 };

export type RenderArgs = {
  kind: LayerKind;
  grid: GridFrame & { epsg: number };
  /** A SlopePctGrid only for 'slope-classes'; a ContributingAreaMask only for 'concentrated-flow'. */
  values: RenderValues;
  slopeClasses?: ReadonlyArray<SlopeClass>;
  /** Contributing area that counts as concentrated flow (m²), default 1 ha. */
  concentratedFlowMinAreaM2?: number;
  /** Colour the grid as it is (no resampling); bounds are then the grid corners' envelope. */
  noWarp?: boolean;
  /** A spent buffer the PNG's scanlines may be written into (palette-png.ts); not read. */
  scratch?: Uint8Array;
};

export type RenderResult =
  | { ok: true; png: Buffer; width: number; height: number; bounds: BoundsWgs84; legend: LegendEntry[] }
  | { ok: false; reason: string };

/**
 * How a layer's values become palette indices: `palette` holds the colours packed 0xRRGGBBAA,
 * entry 0 transparent (nodata and "nothing to draw"); `index(v)` picks the entry for a value.
 * A class map also gives its breaks and the entry of each class, for the loops below.
 */
type Colourer = {
  index: (v: number) => number;
  palette: number[];
  legend: LegendEntry[];
  classes?: { breaks: number[]; entries: Uint8Array };
};

function hex(c: string, alpha = 255): number {
  return ((parseInt(c.slice(1), 16) << 8) | alpha) >>> 0;
}

function classColourer(breaks: number[], labels: string[], colours: ReadonlyArray<string | null>): Colourer {
  // Entry 1 + j is class j (a class without a colour is transparent).
  const palette = [0, ...colours.map((c) => (c ? hex(c, 200) : 0))];
  const entries = Uint8Array.from({ length: breaks.length + 1 }, (_, j) => 1 + Math.min(j, colours.length - 1));
  return {
    classes: { breaks, entries },
    index: (v) => {
      if (v !== v) return 0;
      let j = 0;
      while (j < breaks.length && v >= breaks[j]) j++;
      return 1 + Math.min(j, colours.length - 1);
    },
    palette,
    legend: labels.map((label, j) => ({ label, colour: colours[Math.min(j, colours.length - 1)] ?? 'none' })),
  };
}

function colourerFor(args: RenderArgs): Colourer {
  switch (args.kind) {
    case 'hillshade':
      // Entry v is grey v (the hillshade's 0 is nodata: transparent).
      return {
        index: (v) => (v !== v ? 0 : v),
        palette: Array.from({ length: 256 }, (_, v) => (v === 0 ? 0 : (((v << 24) | (v << 16) | (v << 8) | 255) >>> 0))),
        legend: [{ label: 'shaded relief, light from the north-west', colour: '#808080' }],
      };
    case 'slope-classes': {
      const classes = args.slopeClasses ?? DEFAULT_SLOPE_CLASSES;
      // Six or more classes: the first (nearly level) is left untinted, the rest take the 5 colours.
      const colours: Array<string | null> = classes.length >= 6 ? [null, ...YLORBR_5] : YLORBR_5.slice(0, classes.length);
      const labels = classes.map((c) => `${c.name} (${c.maxPct === null ? `over ${c.minPct}` : `${c.minPct}–${c.maxPct}`} %)`);
      return classColourer(classes.slice(1).map((c) => c.minPct), labels, colours);
    }
    case 'ls':
      return classColourer(LS_BREAKS, ['LS under 0.5', 'LS 0.5–1', 'LS 1–2', 'LS 2–4', 'LS 4 and over'], YLORBR_5);
    case 'soil-loss': {
      const b = SOIL_LOSS_BREAKS_T_PER_HA_YR;
      const labels = [`under ${b[0]} t/ha/yr`, `${b[0]}–${b[1]} t/ha/yr`, `${b[1]}–${b[2]} t/ha/yr`, `${b[2]}–${b[3]} t/ha/yr`, `${b[3]} t/ha/yr and over`];
      return classColourer(b, labels, YLORBR_5);
    }
    case 'concentrated-flow': {
      const min = args.concentratedFlowMinAreaM2 ?? DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2;
      const blue = hex(FLOW_BLUE, 255);
      return { index: (v) => (v >= min ? 1 : 0), palette: [0, blue], legend: [{ label: `concentrated flow (over ${min / 10_000} ha draining to it)`, colour: FLOW_BLUE }] };
    }
    default:
      throw new Error(`unknown layer kind ${String(args.kind)}`);
  }
}

/** The legend in words of a layer kind, without drawing it. */
export function layerLegend(args: Pick<RenderArgs, 'kind' | 'slopeClasses' | 'concentratedFlowMinAreaM2'>): LegendEntry[] {
  return colourerFor(args as RenderArgs).legend;
}

/**
 * The colourer, and how each cell's value becomes its index, for the kind of values given: on
 * the value, the slope code or the mask bit (paint-rows.ts).
 */
function painterFor(args: RenderArgs): { colourer: Colourer; painter: Painter } {
  const { values } = args;
  if (values instanceof ContributingAreaMask) {
    if (args.kind !== 'concentrated-flow') throw new Error(`a ContributingAreaMask can only draw 'concentrated-flow', not '${args.kind}'`);
    if (args.concentratedFlowMinAreaM2 !== undefined && args.concentratedFlowMinAreaM2 !== values.minAreaM2) {
      throw new Error(`concentratedFlowMinAreaM2 is ${args.concentratedFlowMinAreaM2} m² but the mask was made at ${values.minAreaM2} m²`);
    }
    const colourer = colourerFor({ ...args, concentratedFlowMinAreaM2: values.minAreaM2 });
    return { colourer, painter: { kind: 'bit', bits: values.bits } };
  }
  const colourer = colourerFor(args);
  if (values instanceof SlopePctGrid) {
    if (args.kind !== 'slope-classes') throw new Error(`a SlopePctGrid can only draw 'slope-classes', not '${args.kind}'`);
    // The index of every code: the same classes as colourer.index on Float32 slope, tested on the codes.
    const classes = args.slopeClasses ?? DEFAULT_SLOPE_CLASSES;
    const codeBreaks = classes.slice(1).map((c) => slopeCodeAtLeast(c.minPct));
    const byClass = classes.map((c, j) => colourer.index(j === 0 ? -Infinity : c.minPct));
    const entryOfCode = new Uint8Array(SLOPE_CODE_NODATA + 1);
    for (let code = 0; code < SLOPE_CODE_NODATA; code++) {
      let j = 0;
      while (j < codeBreaks.length && code >= codeBreaks[j]) j++;
      entryOfCode[code] = byClass[j];
    }
    return { colourer, painter: { kind: 'code', codes: values.codes, entryOfCode } };
  }
  // Shaded relief: entry v is grey v, the value is its own index.
  if (values instanceof Uint8Array && args.kind === 'hillshade') return { colourer, painter: { kind: 'byte', values } };
  if (values instanceof Float32Array && colourer.classes) return { colourer, painter: { kind: 'float-classes', values, ...colourer.classes } };
  // Any other pairing (Float32 contributing area, a Float32 relief): one call per cell.
  return { colourer, painter: { kind: 'each', values, index: colourer.index } };
}

/**
 * Renders one layer. { ok: false } when the grid's CRS is unknown. The picture is drawn a row at
 * a time straight into the PNG's packed scanlines: besides them and the compressed bytes only
 * the rows' runs of source cells (~0.25 byte per pixel, kept while the caller keeps the grid
 * object, so a run's layers share them) and a row of indices are held.
 */
export function renderLayer(args: RenderArgs): RenderResult {
  const { grid, values } = args;
  const { width: w, height: h } = grid;
  if (values.length !== w * h) throw new Error(`values has ${values.length} cells, expected ${w * h}`);
  const framed = pictureFrame(grid, args.noWarp === true);
  if (!framed.ok) return framed;
  const { colourer, painter } = painterFor(args);
  // The rows' source cells first (kept for the run's other layers), then the scanlines.
  const runs = frameRuns(framed.frame);
  const lines = new PaletteScanlines(w, h, colourer.palette, { smooth: args.kind === 'hillshade', scratch: args.scratch });
  drawRows(runs, painter, lines);
  return { ok: true, png: lines.toPng(), width: w, height: h, bounds: { ...framed.frame.bounds }, legend: colourer.legend };
}
