// Draws a map picture a row at a time: the runs of source cells of the row (picture-runs.ts), the
// palette index of each pixel from its cell's value, the row packed into the PNG's scanlines. Each kind of
// values has a loop of its own, with the class test made on what the cell holds:
//   - a byte that is its own index (shaded relief), written Sub-filtered into the 8-bit rows;
//   - a 2-byte slope code, through a table of the index of every code;
//   - a mask bit (concentrated flow), copied 8 at a time into the 1-bit rows;
//   - a Float32 value, through a table of the index of every float's top 16 bits (sign, exponent
//     and 7 bits of the significand: a range of floats within 1/128 of each other); a range in
//     which a class break or NaN falls is marked, and only its values are compared with the breaks.
import type { PaletteScanlines } from './palette-png';
import type { FrameRuns } from './picture-runs';

export type Painter =
  | { kind: 'byte'; values: Uint8Array }
  | { kind: 'code'; codes: Uint16Array; entryOfCode: Uint8Array }
  | { kind: 'bit'; bits: Uint8Array }
  | { kind: 'float-classes'; values: Float32Array; breaks: ReadonlyArray<number>; entries: Uint8Array }
  | { kind: 'each'; values: ArrayLike<number>; index: (v: number) => number };

/** Marks a range of floats whose values fall in more than one class. */
const MIXED = 255;

/** Index of class j (count of breaks at or below v, as a class colourer counts them); 0 for NaN. */
function classEntry(v: number, breaks: ReadonlyArray<number>, entries: Uint8Array): number {
  if (v !== v) return 0;
  let j = 0;
  while (j < breaks.length && v >= breaks[j]) j++;
  return entries[j];
}

/**
 * The index of every range of floats sharing their top 16 bits, MIXED where they differ. The
 * count of breaks passed only grows with v, so a range whose lowest and highest floats are in one
 * class is wholly in it.
 */
function floatClassTable(breaks: ReadonlyArray<number>, entries: Uint8Array): Uint8Array {
  const table = new Uint8Array(65536);
  const f = new Float32Array(2);
  const u = new Uint32Array(f.buffer);
  for (let top = 0; top < 65536; top++) {
    u[0] = top << 16;
    u[1] = (top << 16) | 0xffff;
    const lo = f[0], hi = f[1];
    if (lo !== lo && hi !== hi) continue; // NaN only: index 0
    // A range with NaN or an infinity at one end is compared value by value.
    const a = classEntry(lo, breaks, entries), b = classEntry(hi, breaks, entries);
    table[top] = a === b && lo === lo && hi === hi ? a : MIXED;
  }
  return table;
}

/** Draws every row of the picture into lines. */
export function drawRows(runs: FrameRuns, painter: Painter, lines: PaletteScanlines): void {
  const w = lines.width, h = lines.height;
  const idx = new Uint8Array(w);
  switch (painter.kind) {
    case 'byte':
      // Straight into the relief's Sub-filtered 8-bit scanlines
      if (!lines.subFiltered) throw new Error('a relief is drawn into Sub-filtered 8-bit scanlines');
      for (let py = 0; py < h; py++) paintBytesSub(runs, py, lines.rowBytes(py), painter.values);
      return;
    case 'code':
      for (let py = 0; py < h; py++) {
        paintCodes(runs, py, idx, painter.codes, painter.entryOfCode);
        lines.setRow(py, idx);
      }
      return;
    case 'bit':
      // A 1-bit picture, entry 1 where the bit is set: the mask's bits are copied 8 at a time.
      if (lines.depth !== 1) throw new Error(`a mask draws a 1-bit picture, not ${lines.depth}-bit`);
      for (let py = 0; py < h; py++) copyBits(runs, py, lines.packedRow(py), painter.bits);
      return;
    case 'float-classes': {
      const { values, breaks, entries } = painter;
      const table = floatClassTable(breaks, entries);
      const bits = new Uint32Array(values.buffer, values.byteOffset, values.length);
      for (let py = 0; py < h; py++) {
        paintFloatClasses(runs, py, idx, values, bits, table, breaks, entries);
        lines.setRow(py, idx);
      }
      return;
    }
    case 'each':
      for (let py = 0; py < h; py++) {
        for (let q = runs.rowStart[py], px = 0; q < runs.rowStart[py + 1]; px += runs.len[q++]) {
          const len = runs.len[q], s = runs.src[q];
          for (let i = 0; i < len; i++) idx[px + i] = s >= 0 ? painter.index(painter.values[s + i]) : 0;
        }
        lines.setRow(py, idx);
      }
      return;
  }
}

// Each painter: a transparent run is filled with index 0; a run of cells is read in order.

/** Each cell's byte, written minus the one to its left (PNG specification 9.2, Sub). */
function paintBytesSub(runs: FrameRuns, py: number, out: Uint8Array, values: Uint8Array): void {
  const { len: lens, src: srcs } = runs;
  let left = 0;
  for (let q = runs.rowStart[py], px = 0; q < runs.rowStart[py + 1]; px += lens[q++]) {
    const len = lens[q], s = srcs[q];
    if (s < 0) {
      out[px] = -left;
      out.fill(0, px + 1, px + len);
      left = 0;
      continue;
    }
    for (let i = 0; i < len; i++) {
      const v = values[s + i];
      out[px + i] = v - left;
      left = v;
    }
  }
}

function paintCodes(runs: FrameRuns, py: number, idx: Uint8Array, codes: Uint16Array, entryOfCode: Uint8Array): void {
  const { len: lens, src: srcs } = runs;
  for (let q = runs.rowStart[py], px = 0; q < runs.rowStart[py + 1]; px += lens[q++]) {
    const len = lens[q], s = srcs[q];
    if (s < 0) idx.fill(0, px, px + len);
    else for (let i = 0; i < len; i++) idx[px + i] = entryOfCode[codes[s + i]];
  }
}

/** Byte b with its bits in the opposite order (the mask counts from the low bit, PNG rows from the high bit). */
const REVERSED = Uint8Array.from({ length: 256 }, (_, b) => {
  let r = 0;
  for (let k = 0; k < 8; k++) r |= ((b >> k) & 1) << (7 - k);
  return r;
});

/** Copies the mask bits of each run of cells into a 1-bit packed row (all zero before). */
function copyBits(runs: FrameRuns, py: number, out: Uint8Array, bits: Uint8Array): void {
  const { len: lens, src: srcs } = runs;
  const last = bits.length - 1;
  for (let q = runs.rowStart[py], px = 0; q < runs.rowStart[py + 1]; px += lens[q++]) {
    const len = lens[q], s = srcs[q];
    if (s < 0) continue;
    for (let i = 0; i < len; i += 8) {
      const c = s + i, at = c >> 3;
      // The next 8 cells' bits, cell c lowest; those past the run's end cleared.
      let v = ((bits[at] | (at < last ? bits[at + 1] << 8 : 0)) >> (c & 7)) & 0xff;
      const take = Math.min(8, len - i);
      if (take < 8) v &= (1 << take) - 1;
      const r = REVERSED[v]; // cell c highest
      const p = px + i, shift = p & 7;
      out[p >> 3] |= r >> shift;
      if (shift > 0 && take > 8 - shift) out[(p >> 3) + 1] |= (r << (8 - shift)) & 0xff;
    }
  }
}

function paintFloatClasses(runs: FrameRuns, py: number, idx: Uint8Array, values: Float32Array, bits: Uint32Array, table: Uint8Array, breaks: ReadonlyArray<number>, entries: Uint8Array): void {
  const { len: lens, src: srcs } = runs;
  for (let q = runs.rowStart[py], px = 0; q < runs.rowStart[py + 1]; px += lens[q++]) {
    const len = lens[q], s = srcs[q];
    if (s < 0) {
      idx.fill(0, px, px + len);
      continue;
    }
    for (let i = 0; i < len; i++) {
      const e = table[bits[s + i] >>> 16];
      idx[px + i] = e !== MIXED ? e : classEntry(values[s + i], breaks, entries);
    }
  }
}
