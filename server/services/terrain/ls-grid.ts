// Per-cell LS: Desmet & Govers (1996, J. Soil Water Conserv. 51:427) L from the upslope area at
// the cell inlet, times RUSLE S (AH-703 eq. 4-4) from the cell's Horn slope. The formulas are
// those of shared/erosion/slope-length.ts; the hot loop below inlines them (calling the
// functions per cell with their argument checks costs ~3× more) and
// tests/unit/terrain/ls-grid.test.ts proves the loop equals those functions cell by cell.
// Cell size D = √(dx·dy) for rectangular cells; x from the D8 direction (1 or √2).
import { UNIT_PLOT_LENGTH_M, type RillRatio } from '../../../shared/erosion/slope-length';
import { D8_DIR_FACTOR } from './flow-d8';
import type { DemGrid } from './types';

type GridShape = Pick<DemGrid, 'width' | 'height' | 'rowCellSizeXM' | 'rowCellSizeYM'>;

/** Writes row r's slope % into out[0..width-1]; called once per row, rows in order. */
export type SlopeRowFn = (r: number, out: Float32Array) => void;

export type LsGridArgs = {
  grid: GridShape;
  /** The slope grid, or a function giving it row by row (so no whole grid need be kept). */
  slopePct: Float32Array | SlopeRowFn;
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
  labels?: Int32Array | Uint16Array;
};

export const DEFAULT_MAX_SLOPE_LENGTH_M = 305;

const BETA_SCALE: Record<RillRatio, number> = { low: 0.5, moderate: 1, high: 2 };

/** LS of every cell (NaN where slope or area is nodata). */
export function lsGrid(args: LsGridArgs): Float32Array {
  const { grid, slopePct, contributingAreaM2: acc, flowDir } = args;
  const rill = args.rillRatio ?? 'moderate';
  const betaScale = BETA_SCALE[rill];
  if (betaScale === undefined) throw new Error(`rillRatio must be 'low', 'moderate' or 'high', got ${String(rill)}`);
  const { width: w, height: h } = grid;
  if (args.out && args.out.length !== w * h) throw new Error(`out has ${args.out.length} cells, expected ${w * h}`);
  const out = args.out ?? new Float32Array(w * h);
  const rowFn = typeof slopePct === 'function' ? slopePct : null;
  const slopeRow = rowFn ? new Float32Array(w) : (slopePct as Float32Array);
  // ln(D / (x·22.13)) per direction code, per row: L = (D/(x·22.13))^m · [(u+1)^(m+1) − u^(m+1)]
  // with u = A_in/D², the Desmet–Govers formula divided through by D^(2m+2).
  const lnScale = new Float64Array(9);
  for (let r = 0; r < h; r++) {
    const cellAreaM2 = grid.rowCellSizeXM[r] * grid.rowCellSizeYM[r];
    const d = Math.sqrt(cellAreaM2);
    for (let k = 0; k < 9; k++) lnScale[k] = Math.log(d / (D8_DIR_FACTOR[k] * UNIT_PLOT_LENGTH_M));
    const invArea = 1 / cellAreaM2;
    // A_in = λ·D for a flow strip one cell wide, so u = A_in/D² = λ/D: cap u at λmax/D.
    const maxLen = args.maxSlopeLengthM ?? DEFAULT_MAX_SLOPE_LENGTH_M;
    const uMax = maxLen / d;
    const byLabel = args.maxSlopeLengthMByLabel && args.labels ? args.maxSlopeLengthMByLabel : null;
    const labels = args.labels;
    // Index of cell i in slopeRow: i − sOff (the row buffer starts at the row's first cell).
    const sOff = rowFn ? r * w : 0;
    if (rowFn) rowFn(r, slopeRow);
    for (let i = r * w, end = i + w; i < end; i++) {
      const s = slopeRow[i - sOff];
      const a = acc[i] - cellAreaM2;
      if (!(s >= 0) || !(a >= -1e-3 * cellAreaM2)) { out[i] = NaN; continue; }
      let cap = uMax;
      let ownLenM = NaN;
      if (byLabel) {
        const own = byLabel[labels![i]];
        if (own === own && own < maxLen) {
          cap = own / d;
          ownLenM = own;
        }
      }
      const u = a > 0 ? Math.min(a * invArea, cap) : 0;
      // θ = atan(s/100), so sin θ = s / √(s² + 100²)
      const sin = s / Math.sqrt(s * s + 10000);
      // AH-703 eq. 4-4: S = 10.8 sin θ + 0.03 (s < 9 %), 16.8 sin θ − 0.50 (s ≥ 9 %)
      const sFactor = s < 9 ? 10.8 * sin + 0.03 : 16.8 * sin - 0.5;
      if (sin === 0) { out[i] = sFactor; continue; } // m = 0 → L = 1
      // AH-703 eq. 4-3 and 4-2: β = (sin θ/0.0896)/(3.0 sin^0.8 θ + 0.56), m = β/(1 + β)
      const beta = (betaScale * sin) / 0.0896 / (3.0 * Math.exp(0.8 * Math.log(sin)) + 0.56);
      const m = beta / (1 + beta);
      // Desmet & Govers 1996 eq. 6: L = [(A + D²)^(m+1) − A^(m+1)] / [D^(m+2) · x^m · 22.13^m]
      if (ownLenM === ownLenM && a * invArea > cap) {
        // Past a label's own slope length, flow starts again (terraces, diversions, roads), so
        // the cells there stand for a whole slope of that length: L = (λ/22.13)^m (AH-703 eq. 4-1).
        out[i] = Math.exp(m * Math.log(ownLenM / UNIT_PLOT_LENGTH_M)) * sFactor;
        continue;
      }
      const c = m * lnScale[flowDir[i]];
      const m1 = m + 1;
      const l = u > 0 ? Math.exp(c + m1 * Math.log(u + 1)) - Math.exp(c + m1 * Math.log(u)) : Math.exp(c);
      out[i] = l * sFactor;
    }
  }
  return out;
}
