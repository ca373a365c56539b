// One farm terrain job's computation in a process of its own, for scripts/bench-terrain-job.ts:
// reads a GeoTIFF, lays out fields of 1 km² (200 × 200 cells of 5 m, 10-cell lanes between them)
// over it, and runs what the terrain job runs — in the terrain worker thread, as the app does:
// decode, fill, flow, slope and LS, hillshade, the four map pictures, each field's figures.
// Prints one JSON line: time per stage, whole time (wall clock and CPU), the thread's start, the
// RSS before the job and at its peak.
// Usage: tsx scripts/terrain-job-once.ts <dem.tif> <originX> <originY> <cells per side>, or the
// same arguments to `node` with the bundle scripts/bench-terrain-job.ts builds of this file.
import { readFileSync } from 'node:fs';
import proj4 from 'proj4';
import { runFarmTerrainInThread, startTerrainThread } from '../server/services/terrain/run-in-thread';
import { DEFAULT_SLOPE_CLASSES } from '../server/services/terrain';

const [file, ox, oy, side] = process.argv.slice(2);
const originX = Number(ox), originY = Number(oy), n = Number(side);
const UTM15N = '+proj=utm +zone=15 +datum=WGS84 +units=m +no_defs';
const CELL_M = 5;

const fields: Array<{ id: number; geometry: GeoJSON.Polygon; typedSlopeLengthM: number | null }> = [];
const per = Math.floor(n / 210);
for (let fr = 0; fr < per; fr++) {
  for (let fc = 0; fc < per; fc++) {
    const e0 = originX + fc * 210 * CELL_M, n1 = originY - fr * 210 * CELL_M, s = 200 * CELL_M;
    const ring = [[e0, n1 - s], [e0 + s, n1 - s], [e0 + s, n1], [e0, n1], [e0, n1 - s]].map((p) => proj4(UTM15N, 'WGS84', p));
    // Every third field has a typed slope length of 60 m (terraces), as in scripts/bench-terrain.ts.
    fields.push({ id: fields.length + 1, geometry: { type: 'Polygon', coordinates: [ring] }, typedSlopeLengthM: fields.length % 3 === 2 ? 60 : null });
  }
}

const baselineRssBytes = process.memoryUsage().rss;
const t0 = performance.now();
const cpu0 = process.cpuUsage();
// The thread is started first, as the job's first run in a process starts it (after the file is
// read there; the order changes no time), so its start and memory can be told apart.
await startTerrainThread();
const threadStartMs = performance.now() - t0;
const threadRssBytes = process.memoryUsage().rss;
const bytes = readFileSync(file);
// A file this large has a buffer of its own: hand it over as it is, as the job does.
const demBytes = (bytes.byteOffset === 0 && bytes.byteLength === bytes.buffer.byteLength ? bytes.buffer : bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength)) as ArrayBuffer;
// Progress names the runTerrain stage just finished; 'decoding', 'drawing map layers' and 'working out each field' name the one starting.
const at = new Map<string, number>();
const out = await runFarmTerrainInThread({ demBytes, fields, slopeClasses: [...DEFAULT_SLOPE_CLASSES] }, (_f, stage) => at.set(stage, performance.now() - t0));
const wholeMs = performance.now() - t0;
const cpu = process.cpuUsage(cpu0);
const between = (from: string, to: string) => (at.get(to) ?? wholeMs) - (at.get(from) ?? 0);
const stages = [
  { stage: 'start thread, read file', ms: between('', 'decoding') },
  { stage: 'decode', ms: between('decoding', 'read') },
  { stage: 'fill', ms: between('start', 'fill') },
  { stage: 'flow directions (D8)', ms: between('fill', 'flow-direction') },
  { stage: 'contributing area, twice', ms: between('flow-direction', 'flow-accumulation') },
  { stage: 'slope and LS', ms: between('flow-accumulation', 'ls') },
  { stage: 'hillshade', ms: between('ls', 'hillshade') },
  { stage: 'four map pictures', ms: between('drawing map layers', 'working out each field') },
  { stage: "each field's figures, hand-back", ms: between('working out each field', '') },
];
console.log(JSON.stringify({
  wholeMs,
  // The app keeps the thread between runs: the job's own time, from the thread taking the file.
  inThreadMs: wholeMs - (at.get('decoding') ?? 0),
  // CPU time of the whole process over the same span (the main thread only waits meanwhile), which
  // a busy machine stretches far less than the wall-clock time.
  cpuMs: (cpu.user + cpu.system) / 1000,
  stages,
  fields: fields.length,
  fieldsWithFigures: out.figures.length,
  layerBytes: out.layers.reduce((a, l) => a + l.png.byteLength, 0),
  threadStartMs,
  // RSS of the process before the job (Node and the modules loaded), and with the thread started.
  baselineRssBytes,
  threadRssBytes,
  maxRssBytes: process.resourceUsage().maxRSS * 1024,
}));
process.exit(0);
