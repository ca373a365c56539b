// Per-cell LS: Desmet & Govers (1996, J. Soil Water Conserv. 51:427) L from the upslope area at
// the cell inlet, times RUSLE S (AH-703 eq. 4-4) from the cell's Horn slope. The formulas are
// those of shared/erosion/slope-length.ts; the hot loop below inlines them (calling the
// functions per cell with their argument checks costs ~3× more) and
// tests/unit/terrain/ls-grid.test.ts proves the loop equals those functions cell by cell.
// Cell size D = √(dx·dy) for rectangular cells; x from the D8 direction (1 or √2).
// Slope comes as Float32 values (S and m worked out per cell) or as the pipeline's 2-byte codes
// (slope-pct-grid.ts): then S and m are looked up per code, worked out once at the code's
// middle slope (code 0 at 0 %), within 0.0025 % slope of the Float32 value.
import { UNIT_PLOT_LENGTH_M, type RillRatio } from '../../../shared/erosion/slope-length';
import { D8_DIR_FACTOR } from './flow-d8';
import { SLOPE_CODE_NODATA } from './slope-pct-grid';
import type { DemGrid } from './types';

type GridShape = Pick<DemGrid, 'width' | 'height' | 'rowCellSizeXM' | 'rowCellSizeYM'>;

/** Writes row r's slope % into out[0..width-1]; called once per row, rows in order. */
export type SlopeRowFn = (r: number, out: Float32Array) => void;
/** Writes row r's labels into out[0..width-1]; called once per row, rows in order. */
export type LabelRowFn = (r: number, out: Uint16Array) => void;

export type LsGridArgs = {
  grid: GridShape;
  /** The slope grid, or a function giving it row by row (so no whole grid need be kept). */
  slopePct?: Float32Array | SlopeRowFn;
  /** Or the slope as 2-byte codes (slope-pct-grid.ts). */
  slopeCodes?: Uint16Array;
  /** Contributing area including the cell (flowAccumulationM2). */
  contributingAreaM2: Float32Array;
  /** Write LS here; may be contributingAreaM2 itself (each cell is read before it is written). */
  out?: Float32Array;
  flowDir: Uint8Array;
  rillRatio?: RillRatio;
  /**
   * Longest slope length the L factor may reach, m. RUSLE's slope-length relations were fitted
   * to plots and hillslopes up to about 305 m (1000 ft, AH-703 ch. 4); past that, overland flow
   * has gathered into channels, which RUSLE does not model. Default 305 m.
   */
  maxSlopeLengthM?: number;
  /**
   * A longest slope length per label (index = label, e.g. a field's typed slope length where
   * terraces, diversions or field roads interrupt flow), used with `labels`; NaN = no own cap.
   */
  maxSlopeLengthMByLabel?: Float64Array;
  /** Each cell's label, as a grid or row by row. */
  labels?: Int32Array | Uint16Array | LabelRowFn;
};

export const DEFAULT_MAX_SLOPE_LENGTH_M = 305;

const BETA_SCALE: Record<RillRatio, number> = { low: 0.5, moderate: 1, high: 2 };

/** ln k for small whole k: upslope areas in whole cells are the common case. */
const LN_WHOLE = Float64Array.from({ length: 4097 }, (_, k) => Math.log(k));
const lnOf = (x: number): number => {
  const k = x | 0;
  return k === x && k <= 4096 ? LN_WHOLE[k] : Math.log(x);
};

/**
 * S and m of slope s % into sOut[at], mOut[at] (m = 0 exactly when the slope is 0: then L = 1).
 * NaN S for a slope that is nodata.
 */
function slopeTerms(s: number, betaScale: number, sOut: Float64Array, mOut: Float64Array, at: number): void {
  if (!(s >= 0)) { sOut[at] = NaN; return; }
  // θ = atan(s/100), so sin θ = s / √(s² + 100²)
  const sin = s / Math.sqrt(s * s + 10000);
  // AH-703 eq. 4-4: S = 10.8 sin θ + 0.03 (s < 9 %), 16.8 sin θ − 0.50 (s ≥ 9 %)
  sOut[at] = s < 9 ? 10.8 * sin + 0.03 : 16.8 * sin - 0.5;
  if (sin === 0) { mOut[at] = 0; return; }
  // AH-703 eq. 4-3 and 4-2: β = (sin θ/0.0896)/(3.0 sin^0.8 θ + 0.56), m = β/(1 + β)
  const beta = (betaScale * sin) / 0.0896 / (3.0 * Math.exp(0.8 * Math.log(sin)) + 0.56);
  mOut[at] = beta / (1 + beta);
}

const codeTables = new Map<number, { s: Float64Array; m: Float64Array }>();
/** S and m of every slope code, at the code's middle slope (code 0: 0 %), per rill ratio. */
function termsByCode(betaScale: number): { s: Float64Array; m: Float64Array } {
  let t = codeTables.get(betaScale);
  if (!t) {
    t = { s: new Float64Array(SLOPE_CODE_NODATA + 1), m: new Float64Array(SLOPE_CODE_NODATA + 1) };
    for (let code = 0; code < SLOPE_CODE_NODATA; code++) slopeTerms(code === 0 ? 0 : (code + 0.5) / 200, betaScale, t.s, t.m, code);
    t.s[SLOPE_CODE_NODATA] = NaN;
    codeTables.set(betaScale, t);
  }
  return t;
}

/** LS of every cell (NaN where slope or area is nodata). */
export function lsGrid(args: LsGridArgs): Float32Array {
  const { grid, slopePct, slopeCodes, contributingAreaM2: acc, flowDir } = args;
  const rill = args.rillRatio ?? 'moderate';
  const betaScale = BETA_SCALE[rill];
  if (betaScale === undefined) throw new Error(`rillRatio must be 'low', 'moderate' or 'high', got ${String(rill)}`);
  if ((slopePct === undefined) === (slopeCodes === undefined)) throw new Error('give exactly one of slopePct and slopeCodes');
  const { width: w, height: h } = grid;
  if (args.out && args.out.length !== w * h) throw new Error(`out has ${args.out.length} cells, expected ${w * h}`);
  const out = args.out ?? new Float32Array(w * h);
  const rowFn = typeof slopePct === 'function' ? slopePct : null;
  const slopeRow = rowFn ? new Float32Array(w) : (slopePct as Float32Array | undefined);
  const byCode = slopeCodes ? termsByCode(betaScale) : null;
  const sRow = new Float64Array(w), mRow = new Float64Array(w);
  const byLabel = args.maxSlopeLengthMByLabel && args.labels ? args.maxSlopeLengthMByLabel : null;
  const labelFn = typeof args.labels === 'function' ? args.labels : null;
  const labelRow = byLabel ? (labelFn ? new Uint16Array(w) : null) : null;
  const labelGrid = labelFn ? null : (args.labels as Int32Array | Uint16Array | undefined);
  const maxLen = args.maxSlopeLengthM ?? DEFAULT_MAX_SLOPE_LENGTH_M;
  // ln(D / (x·22.13)) per direction code, per row: L = (D/(x·22.13))^m · [(u+1)^(m+1) − u^(m+1)]
  // with u = A_in/D², the Desmet–Govers formula divided through by D^(2m+2).
  const lnScale = new Float64Array(16);
  for (let r = 0; r < h; r++) {
    const cellAreaM2 = grid.rowCellSizeXM[r] * grid.rowCellSizeYM[r];
    const d = Math.sqrt(cellAreaM2);
    for (let k = 0; k < 9; k++) lnScale[k] = Math.log(d / (D8_DIR_FACTOR[k] * UNIT_PLOT_LENGTH_M));
    const invArea = 1 / cellAreaM2;
    // A_in = λ·D for a flow strip one cell wide, so u = A_in/D² = λ/D: cap u at λmax/D.
    const uMax = maxLen / d;
    const base = r * w;
    if (byCode) {
      for (let c = 0; c < w; c++) {
        const code = slopeCodes![base + c];
        sRow[c] = byCode.s[code];
        mRow[c] = byCode.m[code];
      }
    } else {
      if (rowFn) rowFn(r, slopeRow!);
      const sOff = rowFn ? 0 : base;
      for (let c = 0; c < w; c++) slopeTerms(slopeRow![sOff + c], betaScale, sRow, mRow, c);
    }
    if (labelFn && labelRow) labelFn(r, labelRow);
    for (let c = 0; c < w; c++) {
      const i = base + c;
      const sFactor = sRow[c];
      const a = acc[i] - cellAreaM2;
      if (sFactor !== sFactor || !(a >= -1e-3 * cellAreaM2)) { out[i] = NaN; continue; }
      let cap = uMax;
      let ownLenM = NaN;
      if (byLabel) {
        const own = byLabel[labelRow ? labelRow[c] : labelGrid![i]];
        if (own === own && own < maxLen) {
          cap = own / d;
          ownLenM = own;
        }
      }
      const m = mRow[c];
      if (m === 0) { out[i] = sFactor; continue; } // flat: m = 0 → L = 1
      // Desmet & Govers 1996 eq. 6: L = [(A + D²)^(m+1) − A^(m+1)] / [D^(m+2) · x^m · 22.13^m]
      if (ownLenM === ownLenM && a * invArea > cap) {
        // Past a label's own slope length, flow starts again (terraces, diversions, roads), so
        // the cells there stand for a whole slope of that length: L = (λ/22.13)^m (AH-703 eq. 4-1).
        out[i] = Math.exp(m * Math.log(ownLenM / UNIT_PLOT_LENGTH_M)) * sFactor;
        continue;
      }
      const u = a > 0 ? Math.min(a * invArea, cap) : 0;
      const k = m * lnScale[flowDir[i] & 15];
      const m1 = m + 1;
      const l = u > 0 ? Math.exp(k + m1 * lnOf(u + 1)) - Math.exp(k + m1 * lnOf(u)) : Math.exp(k);
      out[i] = l * sFactor;
    }
  }
  return out;
}
