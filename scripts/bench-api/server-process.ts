// Starts the real server the way `npm start` does (tsx server/index.ts: local cluster, migrations,
// demo seed, client build), in a throwaway DATA_DIR on free loopback ports, and stops it again.
import { spawn, type ChildProcess } from 'node:child_process';
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { connectionUrl } from '../../server/db/local-cluster';

export type ServerProcess = {
  baseUrl: string;
  databaseUrl: string;
  /** The server's local PostgreSQL cluster: its folder and port (a fault benchmark stops and starts it). */
  cluster: { dir: string; port: number };
  stop: () => Promise<void>;
};

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

function exited(child: ChildProcess): Promise<void> {
  return child.exitCode !== null ? Promise.resolve() : new Promise((resolve) => child.once('exit', () => resolve()));
}

export async function startServer(log: (line: string) => void): Promise<ServerProcess> {
  const dataDir = mkdtempSync(join(tmpdir(), 'fieldshed-bench-'));
  // The cluster runs as the postgres system user when we are root: it must be able to enter the folder.
  chmodSync(dataDir, 0o755);
  const [port, pgPort] = [await freePort(), await freePort()];
  const child = spawn(join('node_modules', '.bin', 'tsx'), ['server/index.ts'], {
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, LOCAL_PG_PORT: String(pgPort), SEED_DEMO: 'true', NODE_ENV: 'development' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  const ready = new Promise<void>((resolve, reject) => {
    const onData = (d: Buffer) => {
      output += d.toString();
      for (const line of d.toString().split('\n')) if (line.trim()) log(`  server: ${line.trim()}`);
      if (output.includes('Fieldshed is running at')) resolve();
    };
    child.stdout!.on('data', onData);
    child.stderr!.on('data', onData);
    child.once('exit', (code) => reject(new Error(`the server exited (code ${code}) before it was ready:\n${output.slice(-2000)}`)));
  });
  let stopping = false;
  const stop = async () => {
    // Requests still running when the server stops fail noisily; that is not news.
    stopping = true;
    if (child.exitCode === null) {
      child.kill('SIGTERM');
      await exited(child);
    }
    rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await ready;
  } catch (e) {
    await stop();
    throw e;
  }
  child.stdout!.removeAllListeners('data');
  child.stderr!.removeAllListeners('data');
  // Keep draining the pipes so a chatty server never blocks on a full pipe.
  child.stdout!.resume();
  child.stderr!.on('data', (d: Buffer) => {
    if (!stopping) process.stderr.write(`  server: ${d.toString()}`);
  });
  return { baseUrl: `http://127.0.0.1:${port}`, databaseUrl: connectionUrl(pgPort, 'fieldshed'), cluster: { dir: join(dataDir, 'postgres'), port: pgPort }, stop };
}
