// The worker thread's side of a farm's terrain runs (started by run-in-thread.ts from the bundle
// thread-bundle.ts makes of this file): says it is ready once loaded, then takes one
// FarmTerrainInput at a time, posts progress while it works, and posts the result with its large
// buffers transferred, not copied.
import { parentPort } from 'node:worker_threads';
import { runFarmTerrain, type FarmTerrainInput, type FarmTerrainOutput } from './farm-terrain-run';
import { forTransfer } from './transfer-result';

export type ThreadMessage =
  | { type: 'ready' }
  | { type: 'progress'; fraction: number; stage: string }
  | { type: 'done'; output: FarmTerrainOutput }
  | { type: 'error'; message: string };

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
