// The worker thread's side of a farm's terrain runs (started by run-in-thread.ts through
// terrain-thread.mjs): takes one FarmTerrainInput at a time, posts progress while it works, and
// posts the result with its large buffers transferred, not copied.
import { parentPort } from 'node:worker_threads';
import { runFarmTerrain, type FarmTerrainInput, type FarmTerrainOutput } from './farm-terrain-run';

export type ThreadMessage =
  | { type: 'progress'; fraction: number; stage: string }
  | { type: 'done'; output: FarmTerrainOutput }
  | { type: 'error'; message: string };

/** A view that owns its whole buffer (a small Buffer may sit in Node's shared pool, which must not move). */
function ownBuffer<T extends Uint8Array | Uint16Array | Float32Array>(a: T): T {
  return a.byteOffset === 0 && a.byteLength === a.buffer.byteLength ? a : (a.slice() as T);
}

/** The result with every large array owning its buffer, and those buffers, to hand over instead of copying. */
function forTransfer(out: FarmTerrainOutput): { output: FarmTerrainOutput; buffers: ArrayBuffer[] } {
  const output = { ...out, ls: ownBuffer(out.ls), labels: ownBuffer(out.labels), layers: out.layers.map((l) => ({ ...l, png: ownBuffer(new Uint8Array(l.png.buffer, l.png.byteOffset, l.png.byteLength)) })) };
  const buffers = [output.ls.buffer, output.labels.buffer, ...output.layers.map((l) => l.png.buffer)] as ArrayBuffer[];
  return { output, buffers };
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
