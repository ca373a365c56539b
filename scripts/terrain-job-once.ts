// One farm terrain job's computation in a process of its own, for scripts/bench-terrain-job.ts:
// reads a GeoTIFF and the benchmark farm's fields over it (scripts/bench-fields.ts), and runs what
// the terrain job runs — in the terrain worker thread, as the app does: decode, fill, flow, slope
// and LS, hillshade, the four map pictures, each field's figures.
// Prints one JSON line: time per stage, whole time (wall clock and CPU), the thread's start, the
// RSS before the job and at its peak.
// Usage: tsx scripts/terrain-job-once.ts <dem.tif> <originX> <originY> <cells per side>, or
// <dem.tif> <fields.json> with the fields written beforehand, as the benchmark does so that this
// process does not load proj4 only to lay them out; the same arguments to `node` with the bundle
// scripts/bench-terrain-job.ts builds of this file.
import { readFileSync } from 'node:fs';
import { runFarmTerrainInThread, startTerrainThread } from '../server/services/terrain/run-in-thread';
import { DEFAULT_SLOPE_CLASSES } from '../server/services/terrain/slope-classes';
import type { BenchField } from './bench-fields';

const args = process.argv.slice(2);
const file = args[0];
const fields: BenchField[] =
  args.length === 2 ? (JSON.parse(readFileSync(args[1], 'utf8')) as BenchField[]) : (await import('./bench-fields')).benchFields(Number(args[1]), Number(args[2]), Number(args[3]));

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
// Progress names the stage just finished (pipeline-in-place.ts); 'decoding', 'drawing map layers' and 'working out each field' name the one starting.
const at = new Map<string, number>();
// The process's peak RSS so far, as each stage ends (progress messages arrive as the thread posts them).
const peakRssAt = new Map<string, number>();
const out = await runFarmTerrainInThread({ demBytes, fields, slopeClasses: [...DEFAULT_SLOPE_CLASSES] }, (_f, stage) => {
  at.set(stage, performance.now() - t0);
  peakRssAt.set(stage, process.resourceUsage().maxRSS * 1024);
});
const wholeMs = performance.now() - t0;
const cpu = process.cpuUsage(cpu0);
const between = (from: string, to: string) => (at.get(to) ?? wholeMs) - (at.get(from) ?? 0);
const maxRssBytes = process.resourceUsage().maxRSS * 1024;
const stage = (name: string, from: string, to: string) => ({ stage: name, ms: between(from, to), peakRssBytes: to ? (peakRssAt.get(to) ?? maxRssBytes) : maxRssBytes });
const stages = [
  stage('start thread, read file', '', 'decoding'),
  stage('decode', 'decoding', 'read'),
  stage('field outlines to cells', 'read', 'start'),
  stage('relief and its picture, slope', 'start', 'slope and relief'),
  stage('fill', 'slope and relief', 'fill'),
  stage('flow directions (D8)', 'fill', 'flow-direction'),
  stage('contributing area, twice', 'flow-direction', 'flow-accumulation'),
  stage('LS', 'flow-accumulation', 'ls'),
  stage('three other map pictures', 'drawing map layers', 'working out each field'),
  stage("each field's figures, hand-back", 'working out each field', ''),
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
  maxRssBytes,
}));
process.exit(0);
