// Runs a farm's terrain computation in a worker thread, so the process's event loop (the API,
// the job queue's polling, signal handling) stays free during a run of any size. The DEM's bytes
// are transferred in and the grids and pictures transferred out, never copied.
// The thread runs plain JavaScript: thread-bundle.ts bundles terrain-thread.ts into one file
// (rebuilt only when a source changed), and the thread is started without the main thread's
// loader flags (tsx's), so it starts in about a tenth of a second. Code that is itself a bundle
// (scripts/bench-terrain-job.ts builds one) finds the thread's bundle beside it instead.
// One thread is kept while runs keep coming and ended after IDLE_MS without one, which hands
// its memory back. Runs take turns: one at a time per process, as the job queue hands them out.
import { Worker } from 'node:worker_threads';
import type { FarmTerrainInput, FarmTerrainOutput } from './farm-terrain-run';
import type { ThreadMessage } from './terrain-thread';
import { terrainThreadFile } from './thread-bundle';
import type { ProgressFn } from './types';

/** An idle thread is ended after this long (ms). */
const IDLE_MS = 30_000;

/**
 * The thread's young generation, MB. Its work is in large typed arrays (outside the JS heap) and a
 * few small objects per field; V8's default young generation (up to 16 MB semispaces) grew by
 * ~20 MB of RSS at the end of a 16 M-cell run (scripts/bench-terrain-job.ts, per-stage RSS).
 */
const YOUNG_GENERATION_MB = 2;
/** Running from TypeScript sources (tsx, vitest) rather than from a bundle. */
const FROM_SOURCES = import.meta.url.endsWith('.ts');

type Thread = { worker: Worker; ready: Promise<void> };
let thread: Promise<Thread> | null = null;
let idleTimer: NodeJS.Timeout | null = null;
let turn: Promise<unknown> = Promise.resolve();

async function startThread(): Promise<Thread> {
  const file = FROM_SOURCES ? await terrainThreadFile() : new URL('./terrain-thread.mjs', import.meta.url);
  const worker = new Worker(file, { execArgv: [], resourceLimits: { maxYoungGenerationSizeMb: YOUNG_GENERATION_MB } });
  worker.unref(); // an idle thread never keeps the process alive
  const ready = new Promise<void>((resolve, reject) => {
    const onMessage = (m: ThreadMessage) => m.type === 'ready' && settle(resolve);
    const onError = (e: Error) => settle(() => reject(e));
    const onExit = (code: number) => settle(() => reject(new Error(`The terrain thread stopped (exit code ${code}) while it started.`)));
    const settle = (then: () => void) => {
      worker.off('message', onMessage).off('error', onError).off('exit', onExit);
      then();
    };
    worker.on('message', onMessage).on('error', onError).on('exit', onExit);
  });
  ready.catch(() => undefined); // a run started meanwhile hears of the failure itself
  return { worker, ready };
}

/** The running thread, started when there is none; forgotten when it stops, so the next run starts another. */
function currentThread(): Promise<Thread> {
  if (thread) return thread;
  const started = startThread();
  thread = started;
  const forget = () => {
    if (thread === started) thread = null;
  };
  started.then((t) => t.worker.once('exit', forget), forget);
  return started;
}

/** Starts the terrain thread now rather than with the first run, and resolves once it is ready. */
export async function startTerrainThread(): Promise<void> {
  await (await currentThread()).ready;
}

async function runNow(input: FarmTerrainInput, onProgress: ProgressFn): Promise<FarmTerrainOutput> {
  if (idleTimer) clearTimeout(idleTimer);
  const { worker: w } = await currentThread();
  return new Promise<FarmTerrainOutput>((resolve, reject) => {
    const onMessage = (m: ThreadMessage) => {
      if (m.type === 'ready') return;
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
      idleTimer = setTimeout(() => {
        thread = null; // a run that comes while it ends starts a new one
        void w.terminate();
      }, IDLE_MS).unref();
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
