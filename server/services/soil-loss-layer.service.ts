// Per-cell soil loss for the map: A = R·K·C·P of each field's assessment (for a season) times
// the cell's LS from the last terrain run (RUSLE, AH-703 ch. 1). Drawn on request, so it follows
// cropping, soil and climate changes without another terrain run; cells outside assessed
// fields stay transparent.
import type { Sequelize } from 'sequelize';
import { TerrainGrid } from '../models';
import type { FileStorage } from './storage/file-storage';
import { renderLayer, type RenderResult } from './terrain';
import { storedEstimates } from './assessments/read-assessments';

/** The kept grids of the farm's newest terrain run, or null before any run. */
export async function keptGrids(farmId: number): Promise<{ ls: TerrainGrid; labels: TerrainGrid } | null> {
  const grids = await TerrainGrid.ofFarm(farmId);
  const ls = grids.find((g) => g.kind === 'ls');
  const labels = grids.find((g) => g.kind === 'field-labels');
  return ls && labels ? { ls, labels } : null;
}

/** Field labels as stored: Uint16 (2 bytes per cell), or Int32 from runs before labels were Uint16. */
function labelGrid(buf: Buffer, cells: number): Uint16Array | Int32Array {
  const copy = buf.buffer.slice(buf.byteOffset, buf.byteOffset + buf.byteLength);
  if (buf.byteLength === 2 * cells) return new Uint16Array(copy);
  if (buf.byteLength === 4 * cells) return new Int32Array(copy);
  throw new Error(`the field-label grid has ${buf.byteLength} bytes for ${cells} cells`);
}

export async function renderSoilLossLayer(
  deps: { sequelize: Sequelize; storage: FileStorage },
  farmId: number,
  season: { id: number; label: string },
): Promise<RenderResult | null> {
  const grids = await keptGrids(farmId);
  if (!grids) return null;
  const lsBuf = await deps.storage.get(grids.ls.fileKey);
  const labelBuf = await deps.storage.get(grids.labels.fileKey);
  const ls = new Float32Array(lsBuf.buffer.slice(lsBuf.byteOffset, lsBuf.byteOffset + lsBuf.byteLength));
  const labels = labelGrid(labelBuf, ls.length);
  const ids = grids.labels.detail.fieldIdsByLabel ?? [];
  const estimates = await storedEstimates(deps.sequelize, farmId, season.id);
  // Label k (1-based) → R·K·C·P of that field's stored assessment, NaN when it cannot be assessed.
  const factor = new Float64Array(ids.length + 1).fill(NaN);
  for (const [i, id] of ids.entries()) {
    const e = estimates.get(id);
    if (e) factor[i + 1] = e.factors.r.value * e.factors.k.value * e.factors.c.value * e.factors.p.value;
  }
  const values = new Float32Array(ls.length);
  for (let i = 0; i < ls.length; i++) values[i] = ls[i] * factor[labels[i]];
  return renderLayer({ kind: 'soil-loss', grid: grids.ls.frame, values });
}
