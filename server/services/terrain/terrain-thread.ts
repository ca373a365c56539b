// The worker thread's side of a farm's terrain runs (started by run-in-thread.ts from the bundle
// thread-bundle.ts makes of this file): says it is ready once loaded, then takes one
// FarmTerrainInput at a time, posts progress while it works, and posts the result with its large
// buffers transferred, not copied.
import { parentPort } from 'node:worker_threads';
import { runFarmTerrain, type FarmTerrainInput, type FarmTerrainOutput } from './farm-terrain-run';

export type ThreadMessage =
  | { type: 'ready' }
  | { type: 'progress'; fraction: number; stage: string }
  | { type: 'done'; output: FarmTerrainOutput }
  | { type: 'error'; message: string };

/**
 * The array to hand over, its buffer added to `buffers`. A view that fills at least half its
 * buffer goes as it is, with the whole buffer: the other side gets the same view at the same
 * offset (e.g. a grid written into the file's own bytes, its header before it). A smaller one is
 * copied first: it may be a Buffer in Node's shared pool (always under half of it), which must
 * not move, and a copy costs little there.
 */
function handOver<T extends Uint8Array | Uint16Array | Float32Array>(a: T, buffers: Set<ArrayBuffer>): T {
  const own = a.byteLength * 2 >= a.buffer.byteLength ? a : (a.slice() as T);
  buffers.add(own.buffer as ArrayBuffer);
  return own;
}

/** The result, and the buffers to transfer with it (each once, even when arrays share one). */
function forTransfer(out: FarmTerrainOutput): { output: FarmTerrainOutput; buffers: ArrayBuffer[] } {
  const buffers = new Set<ArrayBuffer>();
  const output = {
    ...out,
    ls: handOver(out.ls, buffers),
    labels: handOver(out.labels, buffers),
    layers: out.layers.map((l) => ({ ...l, png: handOver(new Uint8Array(l.png.buffer, l.png.byteOffset, l.png.byteLength), buffers) })),
  };
  return { output, buffers: [...buffers] };
}

const port = parentPort;
if (!port) throw new Error('terrain-thread.ts must run as a worker thread');
port.on('message', (input: FarmTerrainInput) => {
  const post = (m: ThreadMessage, transfer: ArrayBuffer[] = []) => port.postMessage(m, transfer);
  runFarmTerrain(input, (fraction, stage) => post({ type: 'progress', fraction, stage })).then(
    (out) => {
      const { output, buffers } = forTransfer(out);
      post({ type: 'done', output }, buffers);
    },
    (e: unknown) => post({ type: 'error', message: e instanceof Error ? e.message : String(e) }),
  );
});
port.postMessage({ type: 'ready' } satisfies ThreadMessage);
