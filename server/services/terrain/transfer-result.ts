// A farm's terrain result made ready to post from the terrain thread with its large buffers
// transferred, not copied (terrain-thread.ts).
import type { FarmTerrainOutput } from './farm-terrain-run';

/**
 * The array to hand over, its buffer added to `buffers`. A view that fills at least half its
 * buffer goes as it is, with the whole buffer: the other side gets the same view at the same
 * offset (e.g. a grid written into the file's own bytes, its header before it). A smaller one is
 * copied first: it may be a Buffer in Node's shared pool (always under half of it), which must
 * not move, and a copy costs little there. (No Buffer itself: a Buffer's slice is no copy.)
 */
function handOver<T extends Uint8Array | Uint16Array | Float32Array>(a: T, buffers: Set<ArrayBuffer>): T {
  const own = a.byteLength * 2 >= a.buffer.byteLength ? a : (a.slice() as T);
  buffers.add(own.buffer as ArrayBuffer);
  return own;
}

/** The result, and the buffers to transfer with it (each once, even when arrays share one). */
export function forTransfer(out: FarmTerrainOutput): { output: FarmTerrainOutput; buffers: ArrayBuffer[] } {
  const buffers = new Set<ArrayBuffer>();
  const output = {
    ...out,
    ls: handOver(out.ls, buffers),
    labels: handOver(out.labels, buffers),
    layers: out.layers.map((l) => ({ ...l, png: handOver(new Uint8Array(l.png.buffer, l.png.byteOffset, l.png.byteLength), buffers) })),
  };
  return { output, buffers: [...buffers] };
}
