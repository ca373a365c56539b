// API benchmark (not a test): starts the real server as `npm start` does in a throwaway DATA_DIR,
// signs in as the demo farmer and measures, with autocannon on loopback at 50 connections,
// GET /api/health (the reference), the demo farm's board and field list; then generates an
// advisor with 200 client farms × 20 fields through the services and measures GET /api/board.
// Prints a table and writes the "API benchmark" section of docs/benchmarks.md.
//   npm run bench:api [-- --duration 10] [-- --farms 200] [-- --no-write]
import autocannon from 'autocannon';
import { cpus } from 'node:os';
import { parseArgs } from 'node:util';
import { createSequelize } from '../server/db/sequelize';
import { initModels } from '../server/models';
import { DEMO_ACCOUNTS, DEMO_FARM_NAME, DEMO_PASSWORD } from '../server/db/seeders/demo-farm';
import { getJson, signIn, waitForTerrain } from './bench-api/session';
import { startServer, type ServerProcess } from './bench-api/server-process';
import { makeAdvisorScenario } from './bench-api/advisor-scenario';
import { writeDocSection } from './doc-section';

const CONNECTIONS = 50;
const DOC = 'docs/benchmarks.md';

type Measured = { route: string; covers: string; connections: number; aloneMs: number; durationS: number; reqPerS: number; p50Ms: number; p99Ms: number; errors: number; requests: number; target?: string };

const { values: args } = parseArgs({
  options: { duration: { type: 'string', default: '10' }, farms: { type: 'string', default: '200' }, 'fields-per-farm': { type: 'string', default: '20' }, 'no-write': { type: 'boolean', default: false } },
});
const durationS = Number(args.duration);
const scenario = { farms: Number(args.farms), fieldsPerFarm: Number(args['fields-per-farm']), advisorEmail: 'bench-advisor@fieldshed.test', password: DEMO_PASSWORD };
const log = (line: string) => process.stderr.write(`${line}\n`);

async function timeOne(baseUrl: string, path: string, cookie: string): Promise<number> {
  const started = performance.now();
  await getJson(baseUrl, path, cookie);
  return performance.now() - started;
}

/**
 * autocannon over `path`. A fast route gets a 2 s warm-up first (JIT, pool, PostgreSQL caches)
 * that is not counted. A slow one (a single request over 200 ms, already warmed by that request)
 * gets no warm-up, whose unfinished requests would still load the server during the run, and a
 * run long enough for ~2 answers per connection (at most 180 s).
 */
async function measure(baseUrl: string, path: string, cookie: string | null, covers: string, target?: string, connections = CONNECTIONS): Promise<Measured> {
  const headers = cookie ? { cookie } : undefined;
  const singleMs = cookie ? await timeOne(baseUrl, path, cookie) : 0;
  const slow = singleMs > 200;
  const runS = slow ? Math.min(180, Math.max(durationS, Math.ceil((2 * connections * singleMs) / 1000))) : durationS;
  if (!slow) await autocannon({ url: `${baseUrl}${path}`, connections, duration: 2, headers });
  const r = await autocannon({ url: `${baseUrl}${path}`, connections, duration: runS, timeout: runS, headers });
  const m = { route: `GET ${path}`, covers, connections, aloneMs: singleMs, durationS: runS, reqPerS: r.requests.total / runS, p50Ms: r.latency.p50, p99Ms: r.latency.p99, errors: r.errors + r.non2xx, requests: r.requests.total, target };
  log(`  ${m.route} (${connections} connection${connections === 1 ? '' : 's'}): ${m.requests} answers in ${runS} s, ${m.reqPerS.toFixed(1)} req/s, p50 ${m.p50Ms} ms, p99 ${m.p99Ms} ms, errors ${m.errors}`);
  return m;
}

function table(rows: Measured[]): string {
  const health = rows[0];
  const lines = [
    '| route | what it covers | connections | one request alone, ms | run s | req/s | p50 ms | p99 ms | errors | p50 / health | p99 / health | target |',
    '|---|---|---:|---:|---:|---:|---:|---:|---:|---:|---:|---|',
    ...rows.map((m) => {
      const none = m.requests === 0;
      const ms = (v: number) => (none ? '—' : String(v));
      // A ratio only beside the reference measured at the same number of connections.
      const ratio = (v: number, ref: number) => (none || m.connections !== health.connections ? '—' : `${(v / ref).toFixed(1)}×`);
      const reqPerS = m.reqPerS >= 10 ? m.reqPerS.toFixed(0) : m.reqPerS.toFixed(2);
      const alone = m.aloneMs > 0 ? m.aloneMs.toFixed(0) : '—';
      return `| \`${m.route}\` | ${m.covers} | ${m.connections} | ${alone} | ${m.durationS} | ${reqPerS} | ${ms(m.p50Ms)} | ${ms(m.p99Ms)} | ${m.errors}${none ? ' (no answer within the run; unfinished requests time out)' : ` (${m.requests} answered)`} | ${ratio(m.p50Ms, health.p50Ms)} | ${ratio(m.p99Ms, health.p99Ms)} | ${m.target ?? (m === health ? 'reference' : '—')} |`;
    }),
  ];
  return lines.join('\n');
}

function writeSection(rows: Measured[], fieldsOnDemo: number): void {
  const cpu = cpus();
  const section = [
    '# API benchmark',
    '',
    `Run with \`npm run bench:api\` (scripts/bench-api.ts) on ${cpu.length} × ${cpu[0]?.model.trim() ?? 'unknown CPU'} (shared with other work), Node ${process.version}.`,
    `The real server started as \`npm start\` does (tsx server/index.ts, its own PostgreSQL cluster and DATA_DIR, demo seed, terrain run finished),`,
    `autocannon in the benchmark's own process on loopback (the same two cores as the server and PostgreSQL), ${CONNECTIONS} connections unless the table says`,
    `otherwise, ${durationS} s per route after a 2 s warm-up that is not counted`,
    '(a route whose single request takes over 200 ms runs without warm-up and long enough for ~2 answers per connection, at most 180 s).',
    'req/s is answers in the run divided by its length.',
    'Latencies are autocannon\'s per-request times (first byte sent to last byte read, whole JSON body), so they include the',
    'session check, the membership check, the queries and the JSON; "errors" counts socket errors, timeouts and non-2xx answers.',
    '"One request alone" is a single signed-in request just before the run (the health check has none).',
    `The demo farm (Alder Run Farm) has ${fieldsOnDemo} fields and one season; the advisor scenario is generated by the benchmark`,
    `(${scenario.farms} invented farms × ${scenario.fieldsPerFarm} fields of 4–36 ha, each with climate, typed ground, cropping and a lab soil sample, written through`,
    'the services, assessments refreshed farm by farm) and read by its own advisor, so the board ranks every one of those fields.',
    '',
    table(rows),
    '',
  ].join('\n');
  writeDocSection(DOC, 'api-benchmark', section);
  log(`Wrote the API benchmark section of ${DOC}.`);
}

async function main(): Promise<void> {
  log('Starting the server (local cluster, migrations, demo seed) …');
  const server: ServerProcess = await startServer(log);
  try {
    const { baseUrl } = server;
    const farmer = await signIn(baseUrl, DEMO_ACCOUNTS[0].email);
    const farms = await getJson<{ id: number; name: string }[]>(baseUrl, '/api/farms', farmer);
    const demo = farms.find((f) => f.name === DEMO_FARM_NAME);
    if (!demo) throw new Error(`${DEMO_FARM_NAME} is not among the farmer's farms`);
    log('Waiting for the demo terrain run …');
    await waitForTerrain(baseUrl, demo.id, farmer);
    const fieldCount = (await getJson<{ features: unknown[] }>(baseUrl, `/api/farms/${demo.id}/fields`, farmer)).features.length;

    log(`Measuring (${CONNECTIONS} connections, ${durationS} s each) …`);
    const rows: Measured[] = [await measure(baseUrl, '/api/health', null, 'no session; one trivial database round trip')];
    rows.push(await measure(baseUrl, `/api/farms/${demo.id}/board`, farmer, `demo farm's priority board, as its farmer (${fieldCount} fields, newest season)`, 'p99 ≤ 50 ms'));
    rows.push(await measure(baseUrl, `/api/farms/${demo.id}/fields`, farmer, `demo farm's field list as GeoJSON with areas and overlaps, as its farmer (${fieldCount} fields)`, 'p99 ≤ 50 ms'));

    log(`Generating the advisor's ${scenario.farms} farms × ${scenario.fieldsPerFarm} fields …`);
    const sequelize = createSequelize(server.databaseUrl);
    initModels(sequelize);
    const started = Date.now();
    try {
      await makeAdvisorScenario(sequelize, scenario, (done) => {
        const s = (Date.now() - started) / 1000;
        process.stderr.write(`\r  ${done}/${scenario.farms} farms (${done * scenario.fieldsPerFarm} fields) in ${s.toFixed(0)} s, about ${((scenario.farms - done) * s / done).toFixed(0)} s left   `);
      });
    } finally {
      await sequelize.close();
    }
    log('');
    const advisor = await signIn(baseUrl, scenario.advisorEmail);
    const rowsOnBoard = (await getJson<{ rows: unknown[] }>(baseUrl, '/api/board', advisor)).rows.length;
    const covers = `advisor's board across ${scenario.farms} client farms (${rowsOnBoard} fields ranked)`;
    rows.push(await measure(baseUrl, '/api/board', advisor, `${covers}, one advisor asking again and again`, 'p50 ≤ 150 ms', 1));
    rows.push(await measure(baseUrl, '/api/board', advisor, `${covers}, ${CONNECTIONS} requests at once`));

    console.log(`\n${table(rows)}\n`);
    if (!args['no-write']) writeSection(rows, fieldCount);
  } finally {
    await server.stop();
  }
}

main().catch((e: unknown) => {
  console.error(e instanceof Error ? e.stack : e);
  process.exit(1);
});
