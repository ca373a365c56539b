// API responsiveness during a terrain run (not a test): starts the real server as `npm start` does
// (its own PostgreSQL cluster, throwaway DATA_DIR, demo seed), signs in as the demo farmer, samples
// the demo farm's field list with a few connections while nothing else runs (idle), then uploads a
// 16 M-cell elevation model for the farm and samples the same list from the upload's answer until
// the run is done (during). Writes p50/p99/max idle and during to its section of docs/benchmarks.md.
//   tsx scripts/bench-api-terrain.ts [--cells-per-side 4000] [--idle-s 15] [--connections 4] [--no-write]
import { cpus, loadavg } from 'node:os';
import { parseArgs } from 'node:util';
import { DEMO_ACCOUNTS, DEMO_FARM_NAME } from '../server/db/seeders/demo-farm';
import { writeGeoTiff } from '../server/services/terrain';
import { startServer } from './bench-api/server-process';
import { getJson, signIn, waitForTerrain } from './bench-api/session';
import { writeDocSection } from './doc-section';

const { values: args } = parseArgs({
  options: { 'cells-per-side': { type: 'string', default: '4000' }, 'idle-s': { type: 'string', default: '15' }, connections: { type: 'string', default: '4' }, 'no-write': { type: 'boolean', default: false } },
});
const SIDE = Number(args['cells-per-side']);
const IDLE_S = Number(args['idle-s']);
const CONNECTIONS = Number(args.connections);
const CELL_M = 5;
const log = (line: string) => process.stderr.write(`${line}\n`);

/** Rolling hills with small pits, 5 m cells in UTM 15N, centred on the demo farm (extent 600000–601600 E, 4684000–4685200 N). */
function farmDem(side: number): Uint8Array {
  const z = new Float32Array(side * side);
  let s = 12345;
  for (let r = 0; r < side; r++) {
    for (let c = 0; c < side; c++) {
      s = (s * 16807) % 2147483647;
      z[r * side + c] = 300 + 25 * Math.sin(c / 140) * Math.cos(r / 170) + 8 * Math.sin((c + r) / 45) - 0.01 * r + (s / 2147483647) * 0.4;
    }
  }
  const half = (side * CELL_M) / 2;
  return writeGeoTiff({ width: side, height: side, samples: z, originX: 600800 - half, originY: 4684600 + half, cellSizeX: CELL_M, cellSizeY: CELL_M, epsg: 32615, nodata: -9999 });
}

type Sample = { startMs: number; ms: number; ok: boolean };

/** `connections` loops, each asking for `path` again as soon as it is answered, until `until()`; one sample per answer. */
async function sample(url: string, cookie: string, until: () => boolean): Promise<Sample[]> {
  const out: Sample[] = [];
  const loop = async () => {
    while (!until()) {
      const startMs = performance.now();
      // A request that fails outright (a socket closed under it) counts as a failed answer.
      const ok = await fetch(url, { headers: { cookie } }).then(
        async (res) => (await res.arrayBuffer(), res.status === 200),
        () => false,
      );
      out.push({ startMs, ms: performance.now() - startMs, ok });
    }
  };
  await Promise.all(Array.from({ length: CONNECTIONS }, loop));
  return out;
}

const pct = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
function summary(samples: Sample[]) {
  const ms = samples.map((s) => s.ms).sort((a, b) => a - b);
  return { count: ms.length, failed: samples.filter((s) => !s.ok).length, p50: pct(ms, 50), p99: pct(ms, 99), max: ms.at(-1)! };
}

async function main(): Promise<void> {
  // Made before the server starts: generating it blocks this process for seconds, and a pooled
  // connection left idle past the server's keep-alive time is closed under the next request.
  log(`Making a ${SIDE}×${SIDE} DEM …`);
  const tif = farmDem(SIDE);
  log('Starting the server (local cluster, migrations, demo seed) …');
  const server = await startServer(log);
  try {
    const { baseUrl } = server;
    const farmer = await signIn(baseUrl, DEMO_ACCOUNTS[0].email);
    const demo = (await getJson<{ id: number; name: string }[]>(baseUrl, '/api/farms', farmer)).find((f) => f.name === DEMO_FARM_NAME);
    if (!demo) throw new Error(`${DEMO_FARM_NAME} is not among the farmer's farms`);
    await waitForTerrain(baseUrl, demo.id, farmer);
    const url = `${baseUrl}/api/farms/${demo.id}/fields`;
    const fieldCount = (await getJson<{ features: unknown[] }>(baseUrl, `/api/farms/${demo.id}/fields`, farmer)).features.length;

    log(`Idle: ${CONNECTIONS} connections for ${IDLE_S} s (after 2 s of warm-up) …`);
    let stopAt = performance.now() + 2000;
    await sample(url, farmer, () => performance.now() > stopAt);
    const idleLoad = loadavg()[0];
    stopAt = performance.now() + IDLE_S * 1000;
    const idle = summary(await sample(url, farmer, () => performance.now() > stopAt));

    const form = new FormData();
    form.append('file', new Blob([tif as Uint8Array<ArrayBuffer>], { type: 'image/tiff' }), 'bench-16m.tif');
    const uploadStart = performance.now();
    const up = await fetch(`${baseUrl}/api/farms/${demo.id}/dems`, { method: 'POST', headers: { cookie: farmer }, body: form });
    if (up.status !== 202) throw new Error(`the upload answered ${up.status}: ${await up.text()}`);
    const { jobId } = (await up.json()) as { jobId: string };
    const uploadMs = performance.now() - uploadStart;

    log('During the run …');
    let job = { state: 'queued', progress: 0, message: '' };
    const runStart = performance.now();
    const poll = (async () => {
      while (job.state !== 'done' && job.state !== 'failed') {
        job = await getJson(baseUrl, `/api/jobs/${jobId}`, farmer);
        await new Promise((r) => setTimeout(r, 250));
      }
    })();
    const loads: number[] = [];
    const loadTimer = setInterval(() => loads.push(loadavg()[0]), 5000);
    const duringSamples = await sample(url, farmer, () => job.state === 'done' || job.state === 'failed');
    clearInterval(loadTimer);
    await poll;
    const runS = (performance.now() - runStart) / 1000;
    if (job.state !== 'done') throw new Error(`the terrain run failed: ${job.message}`);
    const during = summary(duringSamples);
    const ratio = during.p99 / idle.p99;

    const cpu = cpus();
    const f = (x: number) => x.toFixed(0);
    const section = [
      '# API during a terrain run',
      '',
      `Run with \`npm run bench:api-terrain\` (scripts/bench-api-terrain.ts) on ${cpu.length} × ${cpu[0]?.model.trim() ?? 'unknown CPU'}, Node ${process.version};`,
      `load average ${idleLoad.toFixed(1)} while idle was sampled, ${loads.length ? `${Math.min(...loads).toFixed(1)}–${Math.max(...loads).toFixed(1)}` : 'not sampled'} during the run (the benchmark's own client and the server share the two cores).`,
      'The real server started as `npm start` does (its own PostgreSQL cluster, throwaway DATA_DIR, demo seed, the job worker in',
      'the same process, the terrain computation in its worker thread). Sampled route: `GET /api/farms/:id/fields`, the demo farm\'s',
      `field list as its farmer (${fieldCount} fields, GeoJSON with areas and overlaps), from ${CONNECTIONS} connections in the benchmark's process,`,
      'each asking again as soon as it is answered; a sample is one request from first byte sent to the whole body read.',
      `- **idle**: ${IDLE_S} s after a 2 s warm-up, nothing else running in the server.`,
      `- **during**: from the upload's 202 answer until the job reads done: a ${SIDE}×${SIDE} (${f((SIDE * SIDE) / 1e6)} M-cell) Float32 GeoTIFF`,
      `  (${(tif.byteLength / 1e6).toFixed(0)} MB, 5 m cells) around the demo farm: storing the file, the thread's decode, fill, flow, slope, LS,`,
      '  pictures and field figures, then the database writes of the figures, pictures and the LS grid, and the refresh of the',
      `  farm's assessments. The upload itself (${f(uploadMs)} ms for the request) is not inside either window.`,
      '',
      '| window | seconds | answers | failed | p50 ms | p99 ms | max ms |',
      '|---|---:|---:|---:|---:|---:|---:|',
      `| idle | ${IDLE_S} | ${idle.count} | ${idle.failed} | ${f(idle.p50)} | ${f(idle.p99)} | ${f(idle.max)} |`,
      `| during the ${f((SIDE * SIDE) / 1e6)} M-cell run | ${runS.toFixed(1)} | ${during.count} | ${during.failed} | ${f(during.p50)} | ${f(during.p99)} | ${f(during.max)} |`,
      '',
      `p99 during ÷ p99 idle: **${ratio.toFixed(2)}×** (target ≤ 2×: ${ratio <= 2 ? 'met' : 'not met'}).`,
    ];
    console.log(section.join('\n'));
    if (!args['no-write']) writeDocSection('docs/benchmarks.md', 'api-terrain-benchmark', section.join('\n'));
  } finally {
    await server.stop();
  }
}

main().catch((e: unknown) => {
  console.error(e instanceof Error ? `${e.stack}${e.cause ? `\ncaused by: ${String((e.cause as Error).stack ?? e.cause)}` : ''}` : e);
  process.exit(1);
});
