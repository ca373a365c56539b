// Background work on a PostgreSQL-backed queue (pg-boss), so more workers can run on other
// machines against the same database. What a person sees of a job (state, progress, message)
// lives in processing_jobs, which the worker updates as it goes.
import PgBoss from 'pg-boss';
import { randomUUID } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';

export type JobKind = 'terrain';
export type JobState = 'queued' | 'running' | 'done' | 'failed';
export type JobStatus = { id: string; farmId: number; kind: JobKind; state: JobState; progress: number; message: string; payload: Record<string, unknown> };
export type JobHandler = (job: JobStatus, report: (progress: number, message: string) => Promise<void>) => Promise<string>;

export const BOSS_SCHEMA = 'pgboss';

export class JobQueue {
  private constructor(
    private readonly sequelize: Sequelize,
    private readonly boss: PgBoss,
    private readonly prefix: string,
  ) {}

  /**
   * Starts pg-boss; with `handlers` this process also works the queues. `queuePrefix` keeps
   * separate sets of workers apart on one database (each test file has its own file storage).
   */
  static async start(sequelize: Sequelize, url: string, handlers?: Partial<Record<JobKind, JobHandler>>, queuePrefix = ''): Promise<JobQueue> {
    const boss = new PgBoss({ connectionString: url, schema: BOSS_SCHEMA, max: 3, supervise: !!handlers, schedule: false });
    boss.on('error', (e) => console.error('job queue:', e));
    await boss.start();
    const q = new JobQueue(sequelize, boss, queuePrefix);
    for (const kind of ['terrain'] as JobKind[]) {
      const name = `${queuePrefix}${kind}`;
      await boss.createQueue(name).catch(() => undefined); // exists already
      const handler = handlers?.[kind];
      if (handler) {
        await boss.work<{ jobId: string }>(name, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => q.run(job.data.jobId, handler));
      }
    }
    return q;
  }

  async enqueue(kind: JobKind, farmId: number, userId: number | null, payload: Record<string, unknown>): Promise<string> {
    const id = randomUUID();
    await this.sequelize.query(
      `INSERT INTO processing_jobs (id, farm_id, kind, created_by, payload) VALUES (:id, :farmId, :kind, :userId, :payload)`,
      { replacements: { id, farmId, kind, userId, payload: JSON.stringify(payload) } },
    );
    await this.boss.send(`${this.prefix}${kind}`, { jobId: id }, { retryLimit: 0, expireInSeconds: 15 * 60 });
    return id;
  }

  static async status(sequelize: Sequelize, id: string): Promise<JobStatus | null> {
    const rows = await sequelize.query<JobStatus & { farm_id: number }>(
      `SELECT id, farm_id, kind, state, progress, message, payload FROM processing_jobs WHERE id = :id`,
      { replacements: { id }, type: QueryTypes.SELECT },
    );
    const r = rows[0];
    return r ? { id: r.id, farmId: r.farm_id, kind: r.kind, state: r.state, progress: r.progress, message: r.message, payload: r.payload } : null;
  }

  private async update(id: string, fields: Partial<Pick<JobStatus, 'state' | 'progress' | 'message'>>): Promise<void> {
    const sets = Object.keys(fields).map((k) => `${k} = :${k}`);
    await this.sequelize.query(`UPDATE processing_jobs SET ${sets.join(', ')}, updated_at = now() WHERE id = :id`, { replacements: { id, ...fields } });
  }

  /** Runs one job: running → done with the handler's closing message, or failed with the error's. */
  private async run(id: string, handler: JobHandler): Promise<void> {
    const job = await JobQueue.status(this.sequelize, id);
    if (!job) return;
    await this.update(id, { state: 'running', progress: 0, message: 'Starting' });
    try {
      const message = await handler(job, (progress, msg) => this.update(id, { progress: Math.max(0, Math.min(1, progress)), message: msg }));
      await this.update(id, { state: 'done', progress: 1, message });
    } catch (e) {
      console.error(`job ${id} (${job.kind}) failed:`, e);
      await this.update(id, { state: 'failed', message: e instanceof Error ? e.message : String(e) });
    }
  }

  /** Waits until the job is done or failed (tests and scripts). */
  static async waitFor(sequelize: Sequelize, id: string, timeoutMs = 60_000): Promise<JobStatus> {
    const until = Date.now() + timeoutMs;
    for (;;) {
      const s = await JobQueue.status(sequelize, id);
      if (s && (s.state === 'done' || s.state === 'failed')) return s;
      if (Date.now() > until) throw new Error(`job ${id} did not finish in ${timeoutMs} ms (state ${s?.state})`);
      await new Promise((r) => setTimeout(r, 100));
    }
  }

  async stop(): Promise<void> {
    await this.boss.stop({ graceful: false, wait: true, timeout: 2000 }).catch(() => undefined);
  }
}
