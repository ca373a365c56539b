// The terrain thread's plumbing: its code is a JavaScript bundle that starts in plain Node, and its
// result goes back to the main thread by transfer, a grid that is a view into a larger buffer
// (the file's own bytes) included, without a copy.
import { readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { MessageChannel, type MessagePort } from 'node:worker_threads';
import { describe, expect, it } from 'vitest';
import type { FarmTerrainOutput } from '../../../server/services/terrain/farm-terrain-run';
import { startTerrainThread } from '../../../server/services/terrain/run-in-thread';
import { terrainThreadFile } from '../../../server/services/terrain/thread-bundle';
import { forTransfer } from '../../../server/services/terrain/transfer-result';

const HEADER_BYTES = 304;
const W = 10, H = 10;

function result(): FarmTerrainOutput {
  // LS written over a file's elevations: a view after the file's header.
  const file = new ArrayBuffer(HEADER_BYTES + 4 * W * H);
  const ls = new Float32Array(file, HEADER_BYTES, W * H);
  ls.forEach((_, i) => (ls[i] = i / 4));
  const labels = Uint16Array.from({ length: W * H }, (_, i) => i % 3);
  const big = new Uint8Array(5000).fill(7);
  const small = Buffer.from([0x89, 0x50, 0x4e, 0x47]); // in Node's shared pool of small Buffers
  const layer = (png: Uint8Array) => ({ kind: 'hillshade' as const, png, bounds: { west: 0, south: 0, east: 1, north: 1 }, legend: [] });
  return { frame: { width: W, height: H, originX: 0, originY: H, cellSizeX: 1, cellSizeY: 1, epsg: 32615 }, ls, labels, layers: [layer(big), layer(small)], figures: [] };
}

const received = (port: MessagePort) => new Promise<FarmTerrainOutput>((resolve) => port.once('message', resolve));

describe('handing the result back from the terrain thread', () => {
  it('transfers a grid that is a view into a larger buffer as it is, and rebuilds it at its offset on the other side', async () => {
    const out = result();
    const lsValues = Array.from(out.ls);
    const labels = Array.from(out.labels);
    const { output, buffers } = forTransfer(out);
    expect(output.ls).toBe(out.ls);
    expect(output.labels).toBe(out.labels);
    expect(buffers).toContain(out.ls.buffer);
    const { port1, port2 } = new MessageChannel();
    const got = received(port2);
    port1.postMessage(output, buffers);
    const back = await got;
    port1.close();
    expect(out.ls.buffer.byteLength).toBe(0); // moved, not copied
    expect(back.ls.byteOffset).toBe(HEADER_BYTES);
    expect(Array.from(back.ls)).toEqual(lsValues);
    expect(Array.from(back.labels)).toEqual(labels);
    expect(Array.from(back.layers[0].png.subarray(0, 3))).toEqual([7, 7, 7]);
    expect(Array.from(back.layers[1].png)).toEqual([0x89, 0x50, 0x4e, 0x47]);
  });

  it('copies a small Buffer out of the shared pool instead of moving the pool, and lists a shared buffer once', () => {
    const out = result();
    const pool = out.layers[1].png.buffer;
    expect(pool.byteLength).toBeGreaterThan(2 * out.layers[1].png.byteLength);
    const { output, buffers } = forTransfer(out);
    expect(output.layers[1].png.buffer).not.toBe(pool);
    expect(buffers).not.toContain(pool);

    const shared = new ArrayBuffer(8 * 4);
    const twice = { ...result(), ls: new Float32Array(shared, 0, 4), labels: new Uint16Array(shared, 16, 8) };
    expect(forTransfer(twice).buffers.filter((b) => b === shared)).toHaveLength(1);
  });
});

describe('the terrain thread’s code', () => {
  it('is one JavaScript bundle named by a hash of its inputs, reused while they are unchanged, and the thread started from it says it is ready', async () => {
    const file = await terrainThreadFile();
    expect(path.basename(file)).toMatch(/^terrain-thread-[0-9a-f]{16}\.mjs$/);
    expect(file.split(path.sep)).toEqual(expect.arrayContaining(['node_modules', '.cache', 'fieldshed']));
    const built = statSync(file).mtimeMs;
    expect(await terrainThreadFile()).toBe(file);
    expect(statSync(file).mtimeMs).toBe(built);
    const code = readFileSync(file, 'utf8');
    expect(code).not.toMatch(/from ["'](zod|tsx)/);
    await expect(startTerrainThread()).resolves.toBeUndefined();
  });
});
