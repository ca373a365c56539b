// Accounts the typed-array bytes a run holds, by construction: each buffer is entered when it
// is allocated (or handed in) and dropped when its last stage is done. `mark` is called where
// memory peaks locally; the ledger keeps the highest sum seen.

export type MemoryFn = (point: string, liveBytes: number) => void;

export class ByteLedger {
  private readonly held = new Map<string, number>();
  private liveBytes = 0;
  peakBytes = 0;
  private readonly onMark?: MemoryFn;

  constructor(onMark?: MemoryFn) {
    this.onMark = onMark;
  }

  hold(name: string, bytes: number): void {
    if (this.held.has(name)) throw new Error(`${name} is already held`);
    this.held.set(name, bytes);
    this.liveBytes += bytes;
  }

  drop(name: string): void {
    const bytes = this.held.get(name);
    if (bytes === undefined) throw new Error(`${name} is not held`);
    this.held.delete(name);
    this.liveBytes -= bytes;
  }

  /** Records a local peak: the held bytes plus `transientBytes` freed inside the stage just run. */
  mark(point: string, transientBytes = 0): void {
    const bytes = this.liveBytes + transientBytes;
    if (bytes > this.peakBytes) this.peakBytes = bytes;
    this.onMark?.(point, bytes);
  }
}
