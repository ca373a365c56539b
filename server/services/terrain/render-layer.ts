// Colours a grid into a palette PNG (palette-png.ts) for a Leaflet ImageOverlay. The image is resampled (nearest
// cell) onto a Web Mercator (EPSG:3857) aligned frame, the frame Leaflet draws in, so the overlay
// lines up with the map even though the DEM's grid is rotated against it; the source position of
// each pixel is interpolated bilinearly from a coarse lattice of exact proj4 transforms.
// Colours: ColorBrewer YlOrBr 5-class (Brewer, colorbrewer2.org), a colour-blind-safe sequential
// scheme; concentrated flow in dark blue; nodata transparent.
// Slope classes may be drawn from the pipeline's 2-byte slope codes and concentrated flow from
// its 1-bit mask: the class tests on codes give the same pixels as on Float32 slope.
import { encodePalettePng } from './palette-png';
import { ContributingAreaMask, DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2 } from './contributing-area-mask';
import { converterBetween } from './reproject';
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
export type BoundsWgs84 = { west: number; south: number; east: number; north: number };

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
};

export type RenderResult =
  | { ok: true; png: Buffer; width: number; height: number; bounds: BoundsWgs84; legend: LegendEntry[] }
  | { ok: false; reason: string };

/**
 * How a layer's values become palette indices: `palette` holds the colours packed 0xRRGGBBAA,
 * entry 0 transparent (nodata and "nothing to draw"); `index(v)` picks the entry for a value.
 */
type Colourer = { index: (v: number) => number; palette: number[]; legend: LegendEntry[] };

function hex(c: string, alpha = 255): number {
  return ((parseInt(c.slice(1), 16) << 8) | alpha) >>> 0;
}

function classColourer(breaks: number[], labels: string[], colours: ReadonlyArray<string | null>): Colourer {
  // Entry 1 + j is class j (a class without a colour is transparent).
  const palette = [0, ...colours.map((c) => (c ? hex(c, 200) : 0))];
  return {
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
 * The palette index of every grid cell, for the kind of values given, each kind in a loop of its
 * own (one call per cell through a closure of four shapes cost more than the loop itself). A
 * hillshade is its own index grid (entry v is grey v), so it is used as it is.
 */
function cellIndices(args: RenderArgs): { colourer: Colourer; cells: Uint8Array } {
  const { values } = args;
  const n = values.length;
  if (values instanceof ContributingAreaMask) {
    if (args.kind !== 'concentrated-flow') throw new Error(`a ContributingAreaMask can only draw 'concentrated-flow', not '${args.kind}'`);
    if (args.concentratedFlowMinAreaM2 !== undefined && args.concentratedFlowMinAreaM2 !== values.minAreaM2) {
      throw new Error(`concentratedFlowMinAreaM2 is ${args.concentratedFlowMinAreaM2} m² but the mask was made at ${values.minAreaM2} m²`);
    }
    const colourer = colourerFor({ ...args, concentratedFlowMinAreaM2: values.minAreaM2 });
    const on = colourer.index(Infinity);
    const cells = new Uint8Array(n);
    const bits = values.bits;
    for (let i = 0; i < n; i++) if ((bits[i >> 3] >> (i & 7)) & 1) cells[i] = on;
    return { colourer, cells };
  }
  const colourer = colourerFor(args);
  if (values instanceof SlopePctGrid) {
    if (args.kind !== 'slope-classes') throw new Error(`a SlopePctGrid can only draw 'slope-classes', not '${args.kind}'`);
    // The same classes as colourer.index on Float32 slope, tested on the codes.
    const classes = args.slopeClasses ?? DEFAULT_SLOPE_CLASSES;
    const codeBreaks = classes.slice(1).map((c) => slopeCodeAtLeast(c.minPct));
    const byClass = classes.map((c, j) => colourer.index(j === 0 ? -Infinity : c.minPct));
    const codes = values.codes;
    const cells = new Uint8Array(n);
    for (let i = 0; i < n; i++) {
      const code = codes[i];
      if (code === SLOPE_CODE_NODATA) continue;
      let j = 0;
      while (j < codeBreaks.length && code >= codeBreaks[j]) j++;
      cells[i] = byClass[j];
    }
    return { colourer, cells };
  }
  if (values instanceof Uint8Array && args.kind === 'hillshade') return { colourer, cells: values };
  const cells = new Uint8Array(n);
  for (let i = 0; i < n; i++) cells[i] = colourer.index(values[i]);
  return { colourer, cells };
}

/** Renders one layer. { ok: false } when the grid's CRS is unknown. */
export function renderLayer(args: RenderArgs): RenderResult {
  const { grid, values } = args;
  const { width: w, height: h } = grid;
  if (values.length !== w * h) throw new Error(`values has ${values.length} cells, expected ${w * h}`);
  const toWgs = converterBetween(grid.epsg, 4326);
  if (!toWgs.ok) return toWgs;
  const toMerc = converterBetween(grid.epsg, 3857);
  if (!toMerc.ok) return toMerc;
  const { colourer, cells } = cellIndices(args);
  const x0 = grid.originX, y0 = grid.originY, x1 = x0 + w * grid.cellSizeX, y1 = y0 - h * grid.cellSizeY;
  // Envelope of the grid's edge in Web Mercator (sampled along the edges, not just corners).
  let mx0 = Infinity, my0 = Infinity, mx1 = -Infinity, my1 = -Infinity;
  const steps = 16;
  for (let k = 0; k <= steps; k++) {
    const t = k / steps;
    for (const p of [[x0 + t * (x1 - x0), y0], [x0 + t * (x1 - x0), y1], [x0, y0 + t * (y1 - y0)], [x1, y0 + t * (y1 - y0)]] as Array<[number, number]>) {
      const [mx, my] = args.noWarp ? p : toMerc.converter.forward(p);
      mx0 = Math.min(mx0, mx); my0 = Math.min(my0, my); mx1 = Math.max(mx1, mx); my1 = Math.max(my1, my);
    }
  }
  // 0: transparent. Unwarped, the cells' indices are the picture.
  const indices = args.noWarp ? cells : new Uint8Array(w * h);
  if (!args.noWarp) {
    // Lattice of source (col, row) positions for output pixels, every `step` pixels.
    const step = 32;
    const lw = Math.ceil(w / step) + 1, lh = Math.ceil(h / step) + 1;
    const latticeC = new Float64Array(lw * lh), latticeR = new Float64Array(lw * lh);
    for (let j = 0; j < lh; j++) {
      for (let k = 0; k < lw; k++) {
        const mx = mx0 + ((k * step) / w) * (mx1 - mx0);
        const my = my1 - ((j * step) / h) * (my1 - my0);
        const [sx, sy] = toMerc.converter.inverse([mx, my]);
        latticeC[j * lw + k] = (sx - x0) / grid.cellSizeX;
        latticeR[j * lw + k] = (y0 - sy) / grid.cellSizeY;
      }
    }
    for (let py = 0; py < h; py++) {
      const fj = (py + 0.5) / step, j = Math.min(lh - 2, Math.floor(fj)), tj = fj - j;
      for (let px = 0; px < w; px++) {
        const fk = (px + 0.5) / step, k = Math.min(lw - 2, Math.floor(fk)), tk = fk - k;
        const a = j * lw + k, b = a + lw;
        const c = (1 - tj) * ((1 - tk) * latticeC[a] + tk * latticeC[a + 1]) + tj * ((1 - tk) * latticeC[b] + tk * latticeC[b + 1]);
        const r = (1 - tj) * ((1 - tk) * latticeR[a] + tk * latticeR[a + 1]) + tj * ((1 - tk) * latticeR[b] + tk * latticeR[b + 1]);
        const ci = Math.floor(c), ri = Math.floor(r);
        if (ci < 0 || ri < 0 || ci >= w || ri >= h) continue;
        indices[py * w + px] = cells[ri * w + ci];
      }
    }
  }
  const sw = args.noWarp ? toWgs.converter.forward([mx0, my0]) : toMerc.converter.inverse([mx0, my0]);
  const ne = args.noWarp ? toWgs.converter.forward([mx1, my1]) : toMerc.converter.inverse([mx1, my1]);
  const swWgs = args.noWarp ? sw : toWgs.converter.forward(sw);
  const neWgs = args.noWarp ? ne : toWgs.converter.forward(ne);
  return {
    ok: true,
    png: encodePalettePng({ width: w, height: h, indices, palette: colourer.palette }),
    width: w,
    height: h,
    bounds: { west: swWgs[0], south: swWgs[1], east: neWgs[0], north: neWgs[1] },
    legend: colourer.legend,
  };
}
