// A monotone priority queue of grid cells keyed by Float32 elevation, for Priority-Flood, which
// pops keys in non-decreasing order and never pushes a key below the last one popped. It is a
// radix heap (Ahuja, Mehlhorn, Orlin & Tarjan 1990, "Faster algorithms for the shortest path
// problem", Journal of the ACM 37:213) with base 256 instead of 2, laid out as multi-level
// buckets (Denardo & Fox 1979, "Shortest-route methods: 1. Reaching, pruning, and buckets",
// Operations Research 27:161).
//
// Keys are the Float32 bit patterns mapped to unsigned integers in the same order (positive
// values: sign bit set; negative values: all bits inverted), so -0 sorts just below +0. `floor`
// is a lower bound of every key held. A key sits at the level of the highest byte in which it
// differs from `floor` (level 0: only the low byte differs), in the bucket of that byte's value.
// When level 0 is empty, the first non-empty bucket of the lowest non-empty level is opened:
// `floor` takes its byte (lower bytes 0) and its entries are dealt into lower levels. Each entry
// moves at most three times; one bit per bucket and one per 32 buckets find the first non-empty
// bucket without a scan; no two keys are ever compared. Equal keys leave last in, first out.
//
// Memory: buckets are stacks of 8-entry chunks (a link, then cell and key: 8.5 bytes per entry)
// from one pool, so an emptied bucket gives its room back to the others. The pool grows by
// 4.25 kB segments that are never copied or freed; `peakBytes` counts them all, so it bounds the
// queue's bytes from above.

const CHUNK = 8; // entries per chunk
const STRIDE = 1 + 2 * CHUNK; // a chunk: the link to the chunk below it, then cell, key, cell, key, …
const SEG_SHIFT = 6;
const SEG_CHUNKS = 1 << SEG_SHIFT; // chunks per segment (4.25 kB)
const BUCKETS = 4 * 256; // four byte levels

/** The monotone unsigned key of Float32 bits `bits` (read as an Int32). */
export function orderedKey(bits: number): number {
  return (bits >= 0 ? bits ^ 0x80000000 : ~bits) >>> 0;
}

/** Index of the lowest set bit of x (x ≠ 0). */
function lowestBit(x: number): number {
  return 31 - Math.clz32(x & -x);
}

export class MonotoneCellQueue {
  size = 0;
  /** Most bytes the pool has held at once (the chunk links counted old and new while doubling). */
  peakBytes = 0;
  private readonly segments: Int32Array[] = []; // SEG_CHUNKS chunks each; a link is −1 at a stack's bottom
  private freeChunk = -1;
  private usedChunks = 0; // chunks ever handed out (the rest of the pool is fresh)
  private readonly top = new Int32Array(BUCKETS).fill(-1); // per bucket: its top chunk, or −1
  private readonly fill = new Int32Array(BUCKETS); // per bucket: entries in its top chunk
  private readonly nonEmpty = new Int32Array(BUCKETS / 32); // one bit per bucket
  private nonEmptyWords = 0; // one bit per word of nonEmpty that is not 0
  private floor = 0; // a lower bound of every key held (the last key popped, or below it)


  /** Adds a cell with key `orderedKey(bits)`; throws when the key is below the last one popped. */
  push(cell: number, key: number): void {
    if (key < this.floor) throw new Error(`key ${key} below the last key popped (${this.floor}): the queue is monotone`);
    this.add(this.bucketOf(key), cell, key);
    this.size++;
  }

  /**
   * True when a key ≤ `limit` is held (then pop() returns one). Only buckets that may hold such
   * keys are opened, so keys ≥ `limit` may still be pushed afterwards.
   */
  hasKeyAtMost(limit: number): boolean {
    if (this.size === 0 || limit < this.floor) return false;
    for (;;) {
      const b0 = this.firstInLevel(0);
      if (b0 >= 0) return ((this.floor & ~0xff) | b0) >>> 0 <= limit;
      const b = this.lowestBucket();
      if (this.lowerBound(b) > limit) return false;
      this.open(b);
    }
  }

  /** Removes an entry with the smallest key and returns its cell. Throws when empty. */
  pop(): number {
    if (this.size === 0) throw new Error('pop() on an empty queue');
    let b = this.firstInLevel(0);
    while (b < 0) {
      this.open(this.lowestBucket());
      b = this.firstInLevel(0);
    }
    this.floor = ((this.floor & ~0xff) | b) >>> 0;
    this.size--;
    const chunk = this.top[b];
    const slot = --this.fill[b];
    const segment = this.segments[chunk >> SEG_SHIFT];
    const base = (chunk & (SEG_CHUNKS - 1)) * STRIDE;
    const cell = segment[base + 1 + 2 * slot];
    if (slot === 0) {
      this.top[b] = segment[base];
      segment[base] = this.freeChunk;
      this.freeChunk = chunk;
      if (this.top[b] < 0) this.markEmpty(b);
      else this.fill[b] = CHUNK;
    }
    return cell;
  }

  /** The bucket of `key` (≥ floor): its level × 256 + the value of its byte at that level. */
  private bucketOf(key: number): number {
    const diff = key ^ this.floor;
    const level = diff === 0 ? 0 : (31 - Math.clz32(diff)) >> 3;
    return (level << 8) | ((key >>> (level << 3)) & 0xff);
  }

  private add(b: number, cell: number, key: number): void {
    let chunk = this.top[b];
    let slot = this.fill[b];
    if (chunk < 0 || slot === CHUNK) {
      const fresh = this.takeChunk();
      this.segments[fresh >> SEG_SHIFT][(fresh & (SEG_CHUNKS - 1)) * STRIDE] = chunk;
      if (chunk < 0) {
        this.nonEmpty[b >> 5] |= 1 << (b & 31);
        this.nonEmptyWords |= 1 << (b >> 5);
      }
      this.top[b] = chunk = fresh;
      slot = 0;
    }
    const at = (chunk & (SEG_CHUNKS - 1)) * STRIDE + 1 + 2 * slot;
    const segment = this.segments[chunk >> SEG_SHIFT];
    segment[at] = cell;
    segment[at + 1] = key;
    this.fill[b] = slot + 1;
  }

  /** The first non-empty bucket of a level, or −1. */
  private firstInLevel(level: number): number {
    const words = this.nonEmptyWords & (0xff << (level << 3));
    if (words === 0) return -1;
    const w = lowestBit(words);
    return (w << 5) | lowestBit(this.nonEmpty[w]);
  }

  /** The first bucket of the lowest non-empty level above 0 (call only when level 0 is empty and size > 0). */
  private lowestBucket(): number {
    const w = lowestBit(this.nonEmptyWords & ~0xff);
    return (w << 5) | lowestBit(this.nonEmpty[w]);
  }

  private markEmpty(b: number): void {
    const w = b >> 5;
    if ((this.nonEmpty[w] &= ~(1 << (b & 31))) === 0) this.nonEmptyWords &= ~(1 << w);
  }

  /** The smallest key bucket b (above level 0) can hold: floor's higher bytes, b's byte, zeroes below. */
  private lowerBound(b: number): number {
    const shift = (b >> 8) << 3;
    const high = shift + 8 === 32 ? 0 : (this.floor >>> (shift + 8)) << (shift + 8);
    return (high | ((b & 0xff) << shift)) >>> 0;
  }

  /** Makes bucket b's lower bound the floor and deals its entries into lower levels. */
  private open(b: number): void {
    this.floor = this.lowerBound(b);
    let chunk = this.top[b], n = this.fill[b];
    this.top[b] = -1;
    this.fill[b] = 0;
    this.markEmpty(b);
    while (chunk >= 0) {
      const segment = this.segments[chunk >> SEG_SHIFT];
      const base = (chunk & (SEG_CHUNKS - 1)) * STRIDE;
      for (let at = base + 1, end = at + 2 * n; at < end; at += 2) {
        const key = segment[at + 1] >>> 0;
        this.add(this.bucketOf(key), segment[at], key);
      }
      const next = segment[base];
      segment[base] = this.freeChunk;
      this.freeChunk = chunk;
      chunk = next;
      n = CHUNK;
    }
  }

  private takeChunk(): number {
    if (this.freeChunk >= 0) {
      const chunk = this.freeChunk;
      this.freeChunk = this.segments[chunk >> SEG_SHIFT][(chunk & (SEG_CHUNKS - 1)) * STRIDE];
      return chunk;
    }
    if (this.usedChunks === this.segments.length * SEG_CHUNKS) {
      this.segments.push(new Int32Array(SEG_CHUNKS * STRIDE));
      this.peakBytes += SEG_CHUNKS * STRIDE * 4;
    }
    return this.usedChunks++;
  }
}
