// Where water gathers, kept as 1 bit per cell: whether a cell's contributing area reaches the
// concentrated-flow threshold (default 1 ha: common practice, no single source). It is all the
// field figures and the map need of the Float32 area grid, at 1/32 of its size.

export const DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2 = 10_000;

export class ContributingAreaMask {
  /** Bit (i & 7) of byte (i >> 3) is set when cell i drains at least minAreaM2. */
  readonly bits: Uint8Array;
  readonly length: number;
  readonly minAreaM2: number;

  constructor(length: number, minAreaM2: number, bits?: Uint8Array) {
    if (!Number.isInteger(length) || length < 0) throw new Error(`length must be a whole number >= 0, got ${length}`);
    if (!(minAreaM2 > 0)) throw new Error(`minAreaM2 must be > 0, got ${minAreaM2}`);
    const bytes = (length + 7) >> 3;
    if (bits && bits.length !== bytes) throw new Error(`bits has ${bits.length} bytes, expected ${bytes}`);
    this.length = length;
    this.minAreaM2 = minAreaM2;
    this.bits = bits ?? new Uint8Array(bytes);
  }

  /** True when cell i's contributing area is at least minAreaM2. */
  has(i: number): boolean {
    return ((this.bits[i >> 3] >> (i & 7)) & 1) === 1;
  }

  /** The mask of a contributing-area grid (m², NaN = nodata, never counted). */
  static fromArea(areaM2: Float32Array, minAreaM2 = DEFAULT_CONCENTRATED_FLOW_MIN_AREA_M2): ContributingAreaMask {
    const mask = new ContributingAreaMask(areaM2.length, minAreaM2);
    const bits = mask.bits;
    const n = areaM2.length;
    for (let b = 0, i = 0; i < n; b++) {
      let byte = 0;
      for (let k = 0; k < 8 && i < n; k++, i++) if (areaM2[i] >= minAreaM2) byte |= 1 << k;
      bits[b] = byte;
    }
    return mask;
  }
}
