// Background work on a PostgreSQL-backed queue (pg-boss), so more workers can run on other
// machines against the same database (`npm run worker`). What a person sees of a job (state,
// progress, message) lives in processing_jobs, which the worker updates as it goes.
import PgBoss from 'pg-boss';
import { randomUUID } from 'node:crypto';
import { ProcessingJob } from '../../models';
import type { JobKind, JobState } from '../../models/processing-job.model';

export type { JobKind, JobState };
export type JobStatus = {
  id: string;
  farmId: number;
  kind: JobKind;
  state: JobState;
  progress: number;
  message: string;
  payload: Record<string, unknown>;
  /** Who asked for the job; null once their account is gone. */
  createdBy: number | null;
};
export type JobHandler = (job: JobStatus, report: (progress: number, message: string) => Promise<void>) => Promise<string>;
export type JobHandlers = Partial<Record<JobKind, JobHandler>>;

/** Work with no processing_jobs row (nobody watches a progress bar for it). */
export type TaskHandlers = {
  /** Sends one mail of the outbox; a throw is tried again later. */
  mail?: (mailId: number) => Promise<void>;
  /** Once a day: reminders before planned actions and the digest of an advisor's changes. */
  dailyNotices?: () => Promise<void>;
};

export const BOSS_SCHEMA = 'pgboss';
const JOB_KINDS: JobKind[] = ['terrain'];
/** How long stopping waits for running jobs before it marks them failed. */
const STOP_WAIT_MS = 20_000;
/** A mail server that is down delays mail: 10 tries, 30 s apart and doubling (about 8 h in all). */
const MAIL_RETRY = { retryLimit: 10, retryDelay: 30, retryBackoff: true, expireInSeconds: 120 };
/** Every day at 06:00 UTC. */
const DAILY_NOTICES_CRON = '0 6 * * *';
const CUT_SHORT_MESSAGE = 'Stopped before it finished because its worker shut down; run it again.';

const statusOf = (j: ProcessingJob): JobStatus => ({
  id: j.id,
  farmId: j.farmId,
  kind: j.kind,
  state: j.state,
  progress: j.progress,
  message: j.message,
  payload: j.payload,
  createdBy: j.createdBy,
});

export class JobQueue {
  /** Jobs this process is working on now, so a stop can mark the ones it cuts short. */
  private readonly running = new Set<string>();

  private constructor(
    private readonly boss: PgBoss,
    private readonly prefix: string,
  ) {}

  /**
   * Starts pg-boss; with `handlers` this process also works the queues. `queuePrefix` keeps
   * separate sets of workers apart on one database (each test file has its own file storage).
   * `tasks` are worked here too: mail (only where a mail transport is open) and the daily notices.
   */
  static async start(url: string, handlers?: JobHandlers, queuePrefix = '', tasks: TaskHandlers = {}): Promise<JobQueue> {
    const working = !!handlers || !!tasks.mail || !!tasks.dailyNotices;
    const boss = new PgBoss({ connectionString: url, schema: BOSS_SCHEMA, max: 3, supervise: working, schedule: !!tasks.dailyNotices });
    boss.on('error', (e) => console.error('job queue:', e));
    await boss.start();
    const q = new JobQueue(boss, queuePrefix);
    for (const kind of JOB_KINDS) {
      const name = `${queuePrefix}${kind}`;
      await boss.createQueue(name).catch(() => undefined); // exists already
      const handler = handlers?.[kind];
      if (handler) {
        await boss.work<{ jobId: string }>(name, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => q.run(job.data.jobId, handler));
      }
    }
    const mailQueue = `${queuePrefix}mail`;
    await boss.createQueue(mailQueue).catch(() => undefined);
    const sendMail = tasks.mail;
    if (sendMail) await boss.work<{ mailId: number }>(mailQueue, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => sendMail(job.data.mailId));
    const dailyQueue = `${queuePrefix}daily-notices`;
    await boss.createQueue(dailyQueue).catch(() => undefined);
    const daily = tasks.dailyNotices;
    if (daily) {
      await boss.schedule(dailyQueue, DAILY_NOTICES_CRON, {}, { tz: 'UTC' });
      await boss.work(dailyQueue, { pollingIntervalSeconds: 30, batchSize: 1 }, async () => daily());
    }
    return q;
  }

  /** Hands one outbox mail to whichever worker sends mail. */
  async sendMail(mailId: number): Promise<void> {
    await this.boss.send(`${this.prefix}mail`, { mailId }, MAIL_RETRY);
  }

  async enqueue(kind: JobKind, farmId: number, userId: number | null, payload: Record<string, unknown>): Promise<string> {
    const id = randomUUID();
    await ProcessingJob.create({ id, farmId, kind, createdBy: userId, payload });
    await this.boss.send(`${this.prefix}${kind}`, { jobId: id }, { retryLimit: 0, expireInSeconds: 15 * 60 });
    return id;
  }

  static async status(id: string): Promise<JobStatus | null> {
    const job = await ProcessingJob.findByPk(id);
    return job ? statusOf(job) : null;
  }

  /** Updates a running job; a job a stop has already marked failed stays failed. */
  private async update(id: string, fields: Partial<Pick<JobStatus, 'state' | 'progress' | 'message'>>): Promise<void> {
    await ProcessingJob.update(fields, { where: { id, state: 'running' } });
  }

  /** Runs one job: running → done with the handler's closing message, or failed with the error's. */
  private async run(id: string, handler: JobHandler): Promise<void> {
    const job = await JobQueue.status(id);
    if (!job) return;
    this.running.add(id);
    try {
      await ProcessingJob.update({ state: 'running', progress: 0, message: 'Starting' }, { where: { id } });
      const message = await handler(job, (progress, msg) => this.update(id, { progress: Math.max(0, Math.min(1, progress)), message: msg }));
      await this.update(id, { state: 'done', progress: 1, message });
    } catch (e) {
      console.error(`job ${id} (${job.kind}) failed:`, e);
      await this.update(id, { state: 'failed', message: e instanceof Error ? e.message : String(e) });
    } finally {
      this.running.delete(id);
    }
  }

  /** Waits until the job is done or failed (tests and scripts). */
  static async waitFor(id: string, timeoutMs = 60_000): Promise<JobStatus> {
    const until = Date.now() + timeoutMs;
    for (;;) {
      const s = await JobQueue.status(id);
      if (s && (s.state === 'done' || s.state === 'failed')) return s;
      if (Date.now() > until) throw new Error(`job ${id} did not finish in ${timeoutMs} ms (state ${s?.state})`);
      await new Promise((r) => setTimeout(r, 100));
    }
  }

  /** Takes no new jobs, lets running ones finish for a while, and marks any still running as failed. */
  async stop(waitMs = STOP_WAIT_MS): Promise<void> {
    await this.boss.stop({ graceful: true, wait: true, timeout: waitMs }).catch((e: unknown) => console.error('job queue: stopping:', e));
    const cutShort = [...this.running];
    if (cutShort.length) await ProcessingJob.update({ state: 'failed', message: CUT_SHORT_MESSAGE }, { where: { id: cutShort } });
  }
}
