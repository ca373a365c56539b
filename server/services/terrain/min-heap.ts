// A binary min-heap of (cell index, elevation) pairs kept in two parallel typed arrays, so the
// priority queue of Priority-Flood allocates no object per cell. Grows by doubling.
//
// The slot just past the last entry holds +Infinity, so pop() can pick the smaller child without
// asking whether the right one exists, and without a branch (a mispredicted comparison per level
// is most of a pop's time). The comparisons are the textbook ones (left child on equal keys, stop
// at the first child ≥ the moved key), so the same operations leave the same entries in the same
// places: the order of equal keys, which decides Priority-Flood+ε's steps on flats, is unchanged.

export class CellMinHeap {
  private keys: Float32Array;
  private cells: Int32Array;
  size = 0;

  constructor(initialCapacity = 1024) {
    this.keys = new Float32Array(Math.max(16, initialCapacity));
    this.cells = new Int32Array(Math.max(16, initialCapacity));
    this.peakBytes = this.keys.byteLength + this.cells.byteLength;
  }

  push(cell: number, key: number): void {
    if (this.size + 1 >= this.keys.length) this.grow(); // room for the sentinel
    const keys = this.keys, cells = this.cells;
    let i = this.size++;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      const pk = keys[parent];
      if (pk <= key) break;
      keys[i] = pk;
      cells[i] = cells[parent];
      i = parent;
    }
    keys[i] = key;
    cells[i] = cell;
  }

  /** Most bytes the backing arrays have held at once (old and new arrays while doubling). */
  peakBytes = 0;

  /** Key of the smallest entry (undefined behaviour when empty). */
  topKey(): number {
    return this.keys[0];
  }

  /** Removes the smallest entry and returns its cell index. Throws when empty. */
  pop(): number {
    if (this.size === 0) throw new Error('pop() on an empty heap');
    const keys = this.keys, cells = this.cells;
    const top = cells[0];
    const n = --this.size;
    if (n === 0) return top;
    const key = keys[n], cell = cells[n];
    keys[n] = Infinity; // the sentinel: a missing right child is never the smaller
    let i = 0;
    const half = n >> 1;
    while (i < half) {
      let child = 2 * i + 1;
      child += +(keys[child + 1] < keys[child]); // the right child only when strictly smaller
      const ck = keys[child];
      if (ck >= key) break;
      keys[i] = ck;
      cells[i] = cells[child];
      i = child;
    }
    keys[i] = key;
    cells[i] = cell;
    return top;
  }

  private grow(): void {
    const keys = new Float32Array(this.keys.length * 2);
    keys.set(this.keys);
    const cells = new Int32Array(this.cells.length * 2);
    cells.set(this.cells);
    this.peakBytes = Math.max(this.peakBytes, 3 * (this.keys.byteLength + this.cells.byteLength));
    this.keys = keys;
    this.cells = cells;
  }
}
