// A binary min-heap of (cell index, elevation) pairs kept in two parallel typed arrays, so the
// priority queue of Priority-Flood allocates no object per cell. Grows by doubling.

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
    if (this.size === this.keys.length) this.grow();
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
    let i = 0;
    const half = n >> 1;
    while (i < half) {
      let child = 2 * i + 1;
      let ck = keys[child];
      const right = child + 1;
      if (right < n && keys[right] < ck) {
        child = right;
        ck = keys[right];
      }
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
