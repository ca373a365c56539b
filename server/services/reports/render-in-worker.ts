// Draws plan reports on one long-lived worker thread, started on the first report, so a report
// never holds up the API's event loop. Reports wait their turn on it; a worker that dies fails
// the reports it held and a new one starts with the next. The thread does not keep the process
// alive.
import { Worker } from 'node:worker_threads';
import type { ReportData } from './report-data';
import type { RenderAnswer } from './render-worker';

type Pending = { resolve: (pdf: Buffer) => void; reject: (e: Error) => void };

let worker: Worker | null = null;
let nextId = 1;
const pending = new Map<number, Pending>();

function failAll(e: Error): void {
  for (const p of pending.values()) p.reject(e);
  pending.clear();
  worker = null;
}

function started(): Worker {
  if (worker) return worker;
  const w = new Worker(new URL('./render-worker.mjs', import.meta.url));
  w.unref();
  w.on('message', (answer: RenderAnswer) => {
    const p = pending.get(answer.id);
    if (!p) return;
    pending.delete(answer.id);
    if (answer.ok) p.resolve(Buffer.from(answer.pdf.buffer, answer.pdf.byteOffset, answer.pdf.byteLength));
    else p.reject(new Error(`the plan report could not be drawn: ${answer.message}`));
  });
  w.on('error', (e) => failAll(e));
  w.on('exit', (code) => failAll(new Error(`the report worker stopped (exit code ${code})`)));
  worker = w;
  return w;
}

export function renderInWorker(data: ReportData): Promise<Buffer> {
  const w = started();
  const id = nextId++;
  return new Promise<Buffer>((resolve, reject) => {
    pending.set(id, { resolve, reject });
    w.postMessage({ id, data });
  });
}
