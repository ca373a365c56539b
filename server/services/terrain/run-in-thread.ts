// Runs a farm's terrain computation in a worker thread, so the process's event loop (the API,
// the job queue's polling, signal handling) stays free during a run of any size. The DEM's bytes
// are transferred in and the grids and pictures transferred out, never copied.
// Starting a thread costs ~0.5 s (loading the TypeScript through tsx), so one thread is kept
// while runs keep coming and ended after IDLE_MS without one, which hands its memory back.
// Runs take turns: one at a time per process, as the job queue hands them out.
import { Worker } from 'node:worker_threads';
import type { FarmTerrainInput, FarmTerrainOutput } from './farm-terrain-run';
import type { ThreadMessage } from './terrain-thread';
import type { ProgressFn } from './types';

/** An idle thread is ended after this long (ms). */
const IDLE_MS = 30_000;

let thread: Worker | null = null;
let idleTimer: NodeJS.Timeout | null = null;
let turn: Promise<unknown> = Promise.resolve();

function startThread(): Worker {
  // workerData must be an object: the web-worker package (loaded with geotiff) reads its fields
  // when imported inside any worker thread.
  const w = new Worker(new URL('./terrain-thread.mjs', import.meta.url), { workerData: {} });
  w.unref(); // an idle thread never keeps the process alive
  w.on('exit', () => {
    if (thread === w) thread = null;
  });
  return w;
}

function runNow(input: FarmTerrainInput, onProgress: ProgressFn): Promise<FarmTerrainOutput> {
  if (idleTimer) clearTimeout(idleTimer);
  const w = (thread ??= startThread());
  return new Promise<FarmTerrainOutput>((resolve, reject) => {
    const onMessage = (m: ThreadMessage) => {
      if (m.type === 'progress') return onProgress(m.fraction, m.stage);
      done();
      if (m.type === 'done') resolve(m.output);
      else reject(new Error(m.message));
    };
    const onError = (e: Error) => {
      done();
      reject(e);
    };
    const onExit = (code: number) => {
      done();
      reject(new Error(`The terrain thread stopped (exit code ${code}) before it finished.`));
    };
    const done = () => {
      w.off('message', onMessage).off('error', onError).off('exit', onExit);
      idleTimer = setTimeout(() => void thread?.terminate(), IDLE_MS).unref();
    };
    w.on('message', onMessage).on('error', onError).on('exit', onExit);
    w.postMessage(input, [input.demBytes]);
  });
}

/** Runs `runFarmTerrain(input)` in the terrain thread; `input.demBytes` is detached here. */
export function runFarmTerrainInThread(input: FarmTerrainInput, onProgress: ProgressFn): Promise<FarmTerrainOutput> {
  const run = turn.then(() => runNow(input, onProgress));
  turn = run.catch(() => undefined);
  return run;
}
