// The 3x3 window around a cell for cells on the grid border or next to nodata, the way
// gdaldem fills it with -compute_edges (GDAL gdaldem_lib.cpp [memory, checked cell by cell
// against Debian's gdaldem 3.6 in tests/unit/terrain]): a neighbour outside the grid is
// extrapolated linearly from the two cells inward (2a − b), except that in the first and last
// rows a column outside the grid repeats the centre's column (so corners extrapolate the
// rows only); a neighbour that is nodata (or cannot be extrapolated) takes the centre's value.

/** Fills win[0..8] (row-major from north-west) for cell (r, c). Returns false if the centre is nodata. */
export function edgeWindow(z: Float32Array, width: number, height: number, r: number, c: number, win: Float64Array): boolean {
  const centre = z[r * width + c];
  if (centre !== centre) return false;
  const rowEdge = r === 0 || r === height - 1;
  for (let dr = -1; dr <= 1; dr++) {
    for (let dc = -1; dc <= 1; dc++) {
      const cc = rowEdge && (c + dc < 0 || c + dc >= width) ? c : c + dc;
      let v = at(z, width, height, r + dr, cc, dr, cc - c);
      if (v !== v) v = centre;
      win[(dr + 1) * 3 + dc + 1] = v;
    }
  }
  return true;
}

function inside(width: number, height: number, r: number, c: number): boolean {
  return r >= 0 && r < height && c >= 0 && c < width;
}

function at(z: Float32Array, width: number, height: number, r: number, c: number, dr: number, dc: number): number {
  if (inside(width, height, r, c)) return z[r * width + c];
  // Step back toward the centre along the axes that are outside: a = one step in, b = two steps in.
  const sr = r < 0 || r >= height ? -dr : 0;
  const sc = c < 0 || c >= width ? -dc : 0;
  const ra = r + sr, ca = c + sc, rb = r + 2 * sr, cb = c + 2 * sc;
  if (!inside(width, height, ra, ca) || !inside(width, height, rb, cb)) return NaN;
  return 2 * z[ra * width + ca] - z[rb * width + cb];
}
