// Which field each cell belongs to, kept as the fields' row runs (polygonSpans) instead of a
// 2-byte label per cell: a few numbers per field row, written out one grid row at a time when a
// stage needs labels (flow breaks at field borders, each field's slope-length cap) and as a
// whole grid only at the end. Where fields overlap, the later field's label wins, as when the
// runs are written into a grid field by field.

export class FieldLabelRows {
  readonly width: number;
  readonly height: number;
  /** Runs of row r are runs[rowStart[r] .. rowStart[r + 1]), each (first column, end column, label), labels ascending. */
  private readonly rowStart: Int32Array;
  private readonly runs: Int32Array;

  /** `spansByField[k]` holds field k's runs (pairs of row-major [first, end) cell indices); its label is k + 1. */
  constructor(width: number, height: number, spansByField: ReadonlyArray<Int32Array | null>) {
    this.width = width;
    this.height = height;
    const perRow = new Int32Array(height + 1);
    for (const spans of spansByField) {
      if (!spans) continue;
      for (let k = 0; k < spans.length; k += 2) perRow[Math.floor(spans[k] / width) + 1]++;
    }
    for (let r = 0; r < height; r++) perRow[r + 1] += perRow[r];
    this.rowStart = perRow.slice();
    const fillAt = perRow; // next free run of each row
    this.runs = new Int32Array(3 * this.rowStart[height]);
    spansByField.forEach((spans, field) => {
      if (!spans) return;
      for (let k = 0; k < spans.length; k += 2) {
        const r = Math.floor(spans[k] / width);
        const at = 3 * fillAt[r]++;
        this.runs[at] = spans[k] - r * width;
        this.runs[at + 1] = spans[k + 1] - r * width;
        this.runs[at + 2] = field + 1;
      }
    });
  }

  /** Writes row r's labels (0 outside every field) into out[0..width-1]. */
  fillRow(r: number, out: Uint16Array | Int32Array): void {
    out.fill(0, 0, this.width);
    const runs = this.runs;
    for (let j = this.rowStart[r], end = this.rowStart[r + 1]; j < end; j++) out.fill(runs[3 * j + 2], runs[3 * j], runs[3 * j + 1]);
  }

  /** Every cell's label, written into `out` (width × height). */
  toGrid(out: Uint16Array): Uint16Array {
    if (out.length !== this.width * this.height) throw new Error(`out has ${out.length} cells, expected ${this.width * this.height}`);
    for (let r = 0; r < this.height; r++) this.fillRow(r, out.subarray(r * this.width, (r + 1) * this.width));
    return out;
  }
}
