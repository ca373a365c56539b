// Fault benchmark (not a test): starts the real server as `npm start` does, keeps a steady write
// load on it (soil checks added by the demo farmer from several connections at once), stops its
// PostgreSQL in the middle of the load, starts it again a few seconds later, and counts:
//   - what the API answered while the database was down (503 with Retry-After is the promise),
//   - how long after PostgreSQL was back the first write succeeded again (target ≤ 5 s),
//   - acknowledged writes (201) and whether every one of them is in the database afterwards.
// Writes the "Faults" section of docs/benchmarks.md.
//   npm run bench:faults [-- --writers 8] [-- --seconds 24] [-- --down-seconds 4] [-- --no-write]
import { parseArgs } from 'node:util';
import { startLocalCluster, stopLocalCluster } from '../server/db/local-cluster';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../server/db/seeders/demo-farm';
import { startServer } from './bench-api/server-process';
import { writeDocSection } from './doc-section';

const { values: args } = parseArgs({
  options: {
    writers: { type: 'string', default: '8' },
    seconds: { type: 'string', default: '24' },
    'down-seconds': { type: 'string', default: '4' },
    'no-write': { type: 'boolean', default: false },
  },
});
const WRITERS = Number(args.writers);
const RUN_MS = Number(args.seconds) * 1000;
const DOWN_MS = Number(args['down-seconds']) * 1000;
const STOP_AT_MS = 6000;
const log = (line: string) => process.stderr.write(`${line}\n`);

type Answer = { label: string; sentAtMs: number; doneAtMs: number; status: number | 'no answer'; retryAfter: string | null };

async function signIn(baseUrl: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: DEMO_ACCOUNTS.find((a) => a.role === 'farmer')!.email, password: DEMO_PASSWORD }) });
  if (res.status !== 200) throw new Error(`sign-in answered ${res.status}: ${await res.text()}`);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

async function main() {
  log('Starting the server (local cluster, migrations, demo seed)…');
  const server = await startServer(log);
  const { baseUrl } = server;
  const headers = (cookie: string) => ({ cookie, origin: baseUrl, 'content-type': 'application/json' });
  try {
    const cookie = await signIn(baseUrl);
    const farms = (await (await fetch(`${baseUrl}/api/farms`, { headers: headers(cookie) })).json()) as { id: number }[];
    const fields = (await (await fetch(`${baseUrl}/api/farms/${farms[0].id}/fields`, { headers: headers(cookie) })).json()) as { features: { id: number }[] };
    const fieldId = fields.features[0].id;
    const t0 = performance.now();
    const now = () => performance.now() - t0;
    const answers: Answer[] = [];
    let seq = 0;
    let stoppedAtMs = 0;
    let restartedAtMs = 0;

    const writer = async (w: number) => {
      while (now() < RUN_MS) {
        const label = `fault-run ${w}-${seq++}`;
        const sentAtMs = now();
        const body = JSON.stringify({ kind: 'lab', label, depthTopCm: 0, depthBottomCm: 15, sandPct: 40, siltPct: 40, clayPct: 20 });
        try {
          const res = await fetch(`${baseUrl}/api/fields/${fieldId}/soil-samples`, { method: 'POST', headers: headers(cookie), body, signal: AbortSignal.timeout(15_000) });
          await res.arrayBuffer();
          answers.push({ label, sentAtMs, doneAtMs: now(), status: res.status, retryAfter: res.headers.get('retry-after') });
        } catch {
          answers.push({ label, sentAtMs, doneAtMs: now(), status: 'no answer', retryAfter: null });
        }
        if (answers.at(-1)!.status !== 201) await new Promise((r) => setTimeout(r, 100));
      }
    };
    const fault = async () => {
      await new Promise((r) => setTimeout(r, STOP_AT_MS));
      log(`  stopping PostgreSQL at ${(now() / 1000).toFixed(1)} s`);
      await stopLocalCluster(server.cluster.dir);
      stoppedAtMs = now();
      await new Promise((r) => setTimeout(r, DOWN_MS));
      log(`  starting PostgreSQL at ${(now() / 1000).toFixed(1)} s`);
      await startLocalCluster({ dir: server.cluster.dir, port: server.cluster.port, database: 'fieldshed', log: () => undefined });
      restartedAtMs = now();
    };
    log(`Write load: ${WRITERS} connections for ${RUN_MS / 1000} s; PostgreSQL down from ${STOP_AT_MS / 1000} s for ${DOWN_MS / 1000} s`);
    await Promise.all([...Array.from({ length: WRITERS }, (_, w) => writer(w)), fault()]);

    const acknowledged = answers.filter((a) => a.status === 201);
    const samples = (await (await fetch(`${baseUrl}/api/fields/${fieldId}/soil-samples`, { headers: headers(cookie) })).json()) as { label: string | null }[];
    const stored = new Set(samples.map((s) => s.label).filter((l): l is string => !!l?.startsWith('fault-run ')));
    const lost = acknowledged.filter((a) => !stored.has(a.label));
    const storedUnacknowledged = [...stored].filter((l) => !acknowledged.some((a) => a.label === l)).length;
    const down = answers.filter((a) => a.doneAtMs >= stoppedAtMs && a.sentAtMs <= restartedAtMs && a.status !== 201);
    const byStatus = new Map<string, number>();
    for (const a of down) byStatus.set(String(a.status), (byStatus.get(String(a.status)) ?? 0) + 1);
    const with503RetryAfter = down.filter((a) => a.status === 503 && a.retryAfter).length;
    const firstOkAfter = acknowledged.find((a) => a.sentAtMs >= restartedAtMs);
    const recoveryS = firstOkAfter ? (firstOkAfter.doneAtMs - restartedAtMs) / 1000 : null;

    const lines = [
      '## Faults: PostgreSQL stopped and started under a write load',
      '',
      `Command: \`npm run bench:faults\` (run ${new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC). The real server as \`npm start\` runs it, ` +
        `its own local PostgreSQL; ${WRITERS} connections each adding soil checks (POST /api/fields/:id/soil-samples, one row and an audit row per write) ` +
        `for ${RUN_MS / 1000} s; PostgreSQL stopped (pg_ctl -m fast) at ${STOP_AT_MS / 1000} s and started again ${DOWN_MS / 1000} s later.`,
      '',
      '| figure | value | target |',
      '|---|---|---|',
      `| writes sent | ${answers.length} | |`,
      `| acknowledged (201) | ${acknowledged.length} | |`,
      `| acknowledged but missing afterwards | ${lost.length} | 0 |`,
      `| stored without an acknowledgement (answer lost in the fault) | ${storedUnacknowledged} | |`,
      `| answers while the database was down, by status | ${[...byStatus].map(([s, n]) => `${s}: ${n}`).join(', ') || 'none'} | all 503 |`,
      `| of those, 503 with Retry-After | ${with503RetryAfter} | all |`,
      `| from PostgreSQL accepting connections to the first acknowledged write | ${recoveryS === null ? 'never' : `${recoveryS.toFixed(2)} s`} | ≤ 5 s, by itself |`,
    ];
    const text = lines.join('\n');
    log(`\n${text}\n`);
    if (!args['no-write']) writeDocSection('docs/benchmarks.md', 'faults', text);
    if (lost.length > 0) process.exitCode = 1;
  } finally {
    await server.stop();
  }
}

await main();
