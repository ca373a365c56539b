// The worker thread that draws plan reports: each message is one report's data, each answer
// the PDF's bytes or the error's message.
import { parentPort } from 'node:worker_threads';
import { renderPlanReport } from './pdf/render-plan-report';
import type { ReportData } from './report-data';

export type RenderRequest = { id: number; data: ReportData };
export type RenderAnswer = { id: number; ok: true; pdf: Uint8Array } | { id: number; ok: false; message: string };

if (!parentPort) throw new Error('render-worker.ts must run on a worker thread');
const port = parentPort;

port.on('message', async ({ id, data }: RenderRequest) => {
  try {
    // Buffers cross the thread boundary as plain Uint8Arrays; pdfkit takes images as Buffers.
    const relief = data.relief ? { ...data.relief, png: Buffer.from(data.relief.png.buffer, data.relief.png.byteOffset, data.relief.png.byteLength) } : null;
    const pdf = await renderPlanReport({ ...data, relief });
    port.postMessage({ id, ok: true, pdf } satisfies RenderAnswer);
  } catch (e) {
    port.postMessage({ id, ok: false, message: e instanceof Error ? (e.stack ?? e.message) : String(e) } satisfies RenderAnswer);
  }
});
