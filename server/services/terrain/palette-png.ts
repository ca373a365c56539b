// Writes an indexed-colour (palette) PNG (PNG specification, W3C 2003, colour type 3): one index
// per pixel packed at 1, 2, 4 or 8 bits, a PLTE chunk of RGB entries and a tRNS chunk of their
// alphas. Rows are packed one at a time into the image's filtered scanlines (the only full-size
// buffer, at most 1 byte per pixel), then deflated once with fast settings.
// Filters (PNG specification, section 9): class maps use type 0 (none), which the specification
// recommends for palette images; an image whose neighbouring indices are close numbers (the
// shaded relief, whose entry v is grey v) uses type 1 (Sub, the difference from the pixel to the
// left), which turns smooth relief into small numbers that Huffman coding packs well.
import { constants as zlibConstants, crc32, deflateSync } from 'node:zlib';

export type PaletteImage = {
  width: number;
  height: number;
  /** One palette index per pixel, row-major from the top-left. */
  indices: Uint8Array;
  /** Colours packed 0xRRGGBBAA, at most 256. */
  palette: ArrayLike<number>;
};

export type ScanlineOptions = {
  /**
   * Neighbouring indices are close numbers (entry v a grey ramp): 8-bit rows are Sub-filtered and
   * Huffman-coded. Default false: no filter.
   */
  smooth?: boolean;
  /**
   * A spent buffer to hold the scanlines instead of a new one (used when it is large enough;
   * zeroed first), so a picture drawn in the middle of a run adds no full-size buffer.
   */
  scratch?: Uint8Array;
};

/**
 * Deflate settings, from the benchmark's 4 M-cell layers: class maps (1–4 bits per pixel, long
 * runs of one index) with run-length matching only (Z_RLE), which was both faster (0.6×) and
 * smaller (0.9×) than zlib level 3; unfiltered 8-bit images at level 1. The Sub-filtered shaded
 * relief with Huffman coding only: 0.4× the time of unfiltered level 1 and 0.8× the bytes.
 */
const DEFLATE_CLASSES = { level: 1, strategy: zlibConstants.Z_RLE };
const DEFLATE_8_BIT = { level: 1 };
const DEFLATE_SMOOTH = { level: 1, strategy: zlibConstants.Z_HUFFMAN_ONLY };
const SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

/** Fewest bits per pixel that hold every palette index. */
function bitDepthFor(entries: number): 1 | 2 | 4 | 8 {
  return entries <= 2 ? 1 : entries <= 4 ? 2 : entries <= 16 ? 4 : 8;
}

/** A palette image's scanlines, filled a row at a time with setRow, then encoded by toPng. */
export class PaletteScanlines {
  readonly width: number;
  readonly height: number;
  readonly depth: 1 | 2 | 4 | 8;
  private readonly palette: ArrayLike<number>;
  private readonly smooth: boolean;
  private readonly bytesPerRow: number;
  private raw: Uint8Array;

  constructor(width: number, height: number, palette: ArrayLike<number>, options: ScanlineOptions = {}) {
    if (palette.length < 1 || palette.length > 256) throw new Error(`a palette has 1 to 256 colours, got ${palette.length}`);
    this.width = width;
    this.height = height;
    this.palette = palette;
    this.depth = bitDepthFor(palette.length);
    this.smooth = options.smooth === true && this.depth === 8;
    this.bytesPerRow = Math.ceil((width * this.depth) / 8);
    // Each row: the filter byte, then the indices packed high bits first.
    const bytes = (this.bytesPerRow + 1) * height;
    this.raw = options.scratch && options.scratch.length >= bytes ? options.scratch.subarray(0, bytes).fill(0) : new Uint8Array(bytes);
  }

  /** True when 8-bit rows are stored Sub-filtered (PNG specification 9.2, filter type 1). */
  get subFiltered(): boolean {
    return this.smooth;
  }

  /**
   * Row y's bytes after its filter byte, for an 8-bit image, to be written in place: one index
   * per pixel, or when subFiltered each index minus the one to its left (0 left of the row),
   * modulo 256.
   */
  rowBytes(y: number): Uint8Array {
    if (this.depth !== 8) throw new Error(`rowBytes is for 8-bit images, this one has ${this.depth} bits per pixel`);
    const start = y * (this.bytesPerRow + 1);
    this.raw[start] = this.smooth ? 1 : 0;
    return this.raw.subarray(start + 1, start + 1 + this.width);
  }

  /**
   * Row y's packed bytes after its filter byte (0, none), all zero until written: pixel px's
   * index goes in at bit px·depth, counted from the high bit of the row's first byte.
   */
  packedRow(y: number): Uint8Array {
    if (this.smooth) throw new Error('packedRow is for unfiltered images');
    const start = y * (this.bytesPerRow + 1);
    this.raw[start] = 0;
    return this.raw.subarray(start + 1, start + 1 + this.bytesPerRow);
  }

  /** Packs row y from one index per pixel (idx[0..width)). */
  setRow(y: number, idx: Uint8Array): void {
    const { raw, width, depth } = this;
    let p = y * (this.bytesPerRow + 1);
    if (depth === 8) {
      if (!this.smooth) {
        raw[p] = 0;
        raw.set(idx.subarray(0, width), p + 1);
        return;
      }
      raw[p++] = 1; // Sub: each byte minus the one to its left (0 left of the row), modulo 256
      let left = 0;
      for (let i = 0; i < width; i++) {
        const v = idx[i];
        raw[p++] = v - left;
        left = v;
      }
      return;
    }
    raw[p++] = 0;
    // Whole bytes first, in a loop per depth, then the row's last, partly filled byte.
    const perByte = 8 / depth;
    const whole = (width / perByte) | 0;
    const end = whole * perByte;
    let i = 0;
    if (depth === 4) for (; i < end; i += 2) raw[p++] = (idx[i] << 4) | idx[i + 1];
    else if (depth === 2) for (; i < end; i += 4) raw[p++] = (idx[i] << 6) | (idx[i + 1] << 4) | (idx[i + 2] << 2) | idx[i + 3];
    else {
      for (; i < end; i += 8) {
        raw[p++] = (idx[i] << 7) | (idx[i + 1] << 6) | (idx[i + 2] << 5) | (idx[i + 3] << 4) | (idx[i + 4] << 3) | (idx[i + 5] << 2) | (idx[i + 6] << 1) | idx[i + 7];
      }
    }
    const left = width - end;
    if (left > 0) {
      let byte = 0;
      for (let k = 0; k < perByte; k++) byte = (byte << depth) | (k < left ? idx[i + k] : 0);
      raw[p] = byte;
    }
  }

  /** The PNG file; the scanlines are released (the image cannot be encoded twice). */
  toPng(): Buffer {
    const { palette, depth } = this;
    const idat = deflateSync(this.raw, depth < 8 ? DEFLATE_CLASSES : this.smooth ? DEFLATE_SMOOTH : DEFLATE_8_BIT);
    this.raw = new Uint8Array(0);
    let alphas = palette.length; // trailing opaque entries may be left out of tRNS
    while (alphas > 0 && (palette[alphas - 1] & 255) === 255) alphas--;
    const n = palette.length;
    const size = SIGNATURE.length + (12 + 13) + (12 + 3 * n) + (alphas > 0 ? 12 + alphas : 0) + (12 + idat.length) + 12;
    // One buffer for the whole file: each chunk is written in place, its CRC over type and data.
    const out = Buffer.allocUnsafe(size);
    out.set(SIGNATURE, 0);
    let at = SIGNATURE.length;
    const open = (type: string, length: number): number => {
      out.writeUInt32BE(length, at);
      out.write(type, at + 4, 'latin1');
      return at + 8;
    };
    const close = (start: number, length: number, crc = crc32(out.subarray(start - 4, start + length))): void => {
      out.writeUInt32BE(crc >>> 0, start + length);
      at = start + length + 4;
    };
    let d = open('IHDR', 13);
    out.writeUInt32BE(this.width, d);
    out.writeUInt32BE(this.height, d + 4);
    out[d + 8] = depth;
    out[d + 9] = 3; // colour type: indexed
    out.fill(0, d + 10, d + 13); // deflate, filters of method 0, no interlace
    close(d, 13);
    d = open('PLTE', 3 * n);
    for (let k = 0; k < n; k++) {
      const c = palette[k];
      out[d + 3 * k] = c >>> 24;
      out[d + 3 * k + 1] = (c >>> 16) & 255;
      out[d + 3 * k + 2] = (c >>> 8) & 255;
    }
    close(d, 3 * n);
    if (alphas > 0) {
      d = open('tRNS', alphas);
      for (let k = 0; k < alphas; k++) out[d + k] = palette[k] & 255;
      close(d, alphas);
    }
    d = open('IDAT', idat.length);
    out.set(idat, d);
    // The CRC of the compressed data is taken where it lies, continued from the chunk type's.
    close(d, idat.length, crc32(idat, crc32('IDAT')));
    close(open('IEND', 0), 0);
    return out;
  }
}

/** Encodes a whole image given one index per pixel. */
export function encodePalettePng({ width, height, indices, palette }: PaletteImage, options: ScanlineOptions = {}): Buffer {
  if (indices.length !== width * height) throw new Error(`indices has ${indices.length} pixels, expected ${width * height}`);
  const lines = new PaletteScanlines(width, height, palette, options);
  for (let y = 0; y < height; y++) lines.setRow(y, indices.subarray(y * width, (y + 1) * width));
  return lines.toPng();
}
