// Reads rainfall records on one long-lived worker thread, started with the first record, so a
// large record (hundreds of thousands of rows to parse, then every storm's EI30) never holds up
// the API's event loop. Records take turns on it. One that takes longer than the time limit is
// refused with a message and its thread stopped; the records waiting behind it are asked to be
// sent again, and the next record starts a new thread. The thread does not keep the process alive.
import { Worker } from 'node:worker_threads';
import type { RecordResult } from './rainfall-record';
import type { RecordAnswer, RecordRequest } from './rainfall-record-thread';

/** How long one record may take on the thread, in seconds. */
export const RAINFALL_RECORD_MAX_SECONDS = 60;

type Pending = { resolve: (r: RecordResult) => void; reject: (e: Error) => void; bytes: Uint8Array; years?: number };

let worker: Worker | null = null;
let nextId = 1;
const pending = new Map<number, Pending>();
let timer: NodeJS.Timeout | null = null;
let current: number | null = null;

const busy = (): RecordResult => ({ ok: false, status: 503, error: 'busy', message: 'Another rainfall record took too long and was stopped; send this one again.' });

function stopWorker(): void {
  const w = worker;
  worker = null;
  current = null;
  if (timer) clearTimeout(timer);
  timer = null;
  void w?.terminate();
}

/** Sends the oldest waiting record to the thread, with its time limit. */
function sendNext(maxSeconds: number): void {
  if (current !== null || pending.size === 0) return;
  const w = started(maxSeconds);
  const [id, p] = pending.entries().next().value as [number, Pending];
  current = id;
  timer = setTimeout(() => {
    pending.delete(id);
    p.resolve({ ok: false, status: 422, error: 'record_too_long_to_read', message: `The rainfall record took longer than ${maxSeconds} s to work out; upload a shorter record (fewer years).` });
    for (const other of pending.values()) other.resolve(busy());
    pending.clear();
    stopWorker();
  }, maxSeconds * 1000);
  w.postMessage({ id, bytes: p.bytes, years: p.years } satisfies RecordRequest);
}

function started(maxSeconds: number): Worker {
  if (worker) return worker;
  const w = new Worker(new URL('./rainfall-record-thread.mjs', import.meta.url));
  w.unref();
  w.on('message', ({ id, result }: RecordAnswer) => {
    if (id !== current) return;
    if (timer) clearTimeout(timer);
    timer = null;
    current = null;
    pending.get(id)?.resolve(result);
    pending.delete(id);
    sendNext(maxSeconds);
  });
  const fail = (e: Error) => {
    if (worker !== w) return;
    for (const p of pending.values()) p.reject(e);
    pending.clear();
    stopWorker();
  };
  w.on('error', fail);
  w.on('exit', (code) => fail(new Error(`the rainfall record's thread stopped (exit code ${code})`)));
  worker = w;
  return w;
}

export function rFromRainfallCsvInThread(bytes: Buffer, years?: number, maxSeconds = RAINFALL_RECORD_MAX_SECONDS): Promise<RecordResult> {
  return new Promise<RecordResult>((resolve, reject) => {
    pending.set(nextId++, { resolve, reject, bytes: new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength), years });
    sendNext(maxSeconds);
  });
}
