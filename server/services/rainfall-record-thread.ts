// The worker thread that reads rainfall records: each message is one CSV's bytes, each answer R
// or the reason it cannot be worked out.
import { parentPort } from 'node:worker_threads';
import { rFromRainfallCsv, type RecordResult } from './rainfall-record';

export type RecordRequest = { id: number; bytes: Uint8Array; years?: number };
export type RecordAnswer = { id: number; result: RecordResult };

if (!parentPort) throw new Error('rainfall-record-thread.ts must run on a worker thread');
const port = parentPort;

port.on('message', ({ id, bytes, years }: RecordRequest) => {
  const result = rFromRainfallCsv(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength), years);
  port.postMessage({ id, result } satisfies RecordAnswer);
});
