// Background work on a PostgreSQL-backed queue (pg-boss), so more workers can run on other
// machines against the same database (`npm run worker`). What a person sees of a job (state,
// progress, message) lives in processing_jobs, which the worker updates as it goes. The row and
// the queue's job share one id and are written in one transaction, the caller's when it has one
// (the write that needs the job), so neither exists without the other.
import PgBoss from 'pg-boss';
import { randomUUID } from 'node:crypto';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { Farm, ProcessingJob, User } from '../../models';
import type { JobKind, JobState } from '../../models/processing-job.model';
import { BOSS_SCHEMA, bossSqlOn, pendingJobsWithQueueState, queueStateOf, type PendingJobWithQueueState } from '../../models/processing-job.queries';
import { conflict, tooMany } from '../../lib/http-error';
import { JOBS_PER_USER_MAX } from '../../../shared/limits';
import { settleJob, type JobEnd } from './job-settle';

export type { JobKind, JobState };
export { BOSS_SCHEMA };
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

const JOB_KINDS: JobKind[] = ['terrain'];
/** How long stopping waits for running jobs before it marks them failed. */
const STOP_WAIT_MS = 20_000;
/**
 * A terrain run within the cell limit takes well under a minute; one still active after 5 min
 * has lost its worker. pg-boss then fails it and tries once more, 30 s later.
 */
const TERRAIN_SEND = { retryLimit: 1, retryDelay: 30, expireInSeconds: 5 * 60 };
/** A mail server that is down delays mail: 10 tries, 30 s apart and doubling (about 8 h in all). */
const MAIL_RETRY = { retryLimit: 10, retryDelay: 30, retryBackoff: true, expireInSeconds: 120 };
/** Every day at 06:00 UTC. */
const DAILY_NOTICES_CRON = '0 6 * * *';
/** How often a working process looks for jobs whose worker died (besides once at start). */
const RECONCILE_EVERY_MS = 60_000;
const CUT_SHORT = {
  failed: 'Stopped before it finished because its worker shut down; run it again.',
  queued: 'Its worker shut down before it finished; it will be tried again shortly.',
};
const WORKER_LOST = {
  failed: 'Stopped before it finished: its worker stopped (a restart, or out of memory), so the figures shown are from an earlier run. Run it again.',
  queued: 'Its worker stopped before it finished (a restart, or out of memory); it will be tried again shortly.',
};

/** What a job row left waiting or running becomes, from its queue job's state; null: leave it. */
function endAfterWorkerLoss(row: PendingJobWithQueueState, queueState: PendingJobWithQueueState['queueState']): JobEnd | null {
  if (queueState === null || queueState === 'failed' || queueState === 'cancelled' || queueState === 'completed') return { state: 'failed', message: WORKER_LOST.failed };
  if (row.state === 'running' && (queueState === 'created' || queueState === 'retry')) return { state: 'queued', message: WORKER_LOST.queued };
  return null;
}

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
  private reconcileTimer: NodeJS.Timeout | null = null;
  /** Set by stop(): a handler that ends after it leaves its row to what the stop decided. */
  private stopping = false;

  private constructor(
    private readonly boss: PgBoss,
    private readonly prefix: string,
    private readonly jobsPerUserMax: number,
  ) {}

  /**
   * Starts pg-boss; with `handlers` this process also works the queues, and first ends the job
   * rows that dead workers left running (then again every minute). `queuePrefix` keeps separate
   * sets of workers apart on one database (each test file has its own file storage). `tasks` are
   * worked here too: mail (only where a mail transport is open) and the daily notices.
   */
  static async start(
    url: string,
    handlers?: JobHandlers,
    queuePrefix = '',
    tasks: TaskHandlers = {},
    limits: { jobsPerUserMax: number } = { jobsPerUserMax: JOBS_PER_USER_MAX },
  ): Promise<JobQueue> {
    const working = !!handlers || !!tasks.mail || !!tasks.dailyNotices;
    const boss = new PgBoss({ connectionString: url, schema: BOSS_SCHEMA, max: 3, supervise: working, schedule: !!tasks.dailyNotices });
    boss.on('error', (e) => console.error('job queue:', e));
    await boss.start();
    const q = new JobQueue(boss, queuePrefix, limits.jobsPerUserMax);
    for (const kind of JOB_KINDS) {
      const name = `${queuePrefix}${kind}`;
      await boss.createQueue(name).catch(() => undefined); // exists already
      const handler = handlers?.[kind];
      if (handler) {
        await boss.work<{ jobId: string }>(name, { pollingIntervalSeconds: 0.5, batchSize: 1 }, async ([job]) => q.run(job.data.jobId, handler));
      }
    }
    if (handlers) {
      await q.reconcile();
      q.reconcileTimer = setInterval(() => void q.reconcile().catch((e: unknown) => console.error('job queue: reconciling:', e)), RECONCILE_EVERY_MS);
      q.reconcileTimer.unref();
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

  /**
   * Queues a job someone asked for: 409 with the pending job's id when the farm already has one
   * of this kind waiting or running, 429 when the person has their limit of jobs at once. Inside
   * `transaction` when given (the write that needs the job), else in one of its own.
   */
  async enqueue(kind: JobKind, farmId: number, userId: number | null, payload: Record<string, unknown>, transaction?: Transaction): Promise<string> {
    if (!transaction) return ProcessingJob.sequelize!.transaction((t) => this.enqueue(kind, farmId, userId, payload, t));
    await Farm.findByPk(farmId, { attributes: ['id'], transaction, lock: transaction.LOCK.NO_KEY_UPDATE });
    const pending = await ProcessingJob.pendingOfFarm(farmId, kind, transaction);
    if (pending) {
      const doing = pending.state === 'running' ? 'running' : 'waiting to start';
      throw conflict('job_pending', `A ${kind} run for this farm is already ${doing} (job ${pending.id}); a farm has one at a time. Wait for it to finish, then try again.`, { jobId: pending.id });
    }
    await this.checkUserLimit(userId, transaction);
    return this.send(kind, farmId, userId, payload, transaction);
  }

  /**
   * Asks for a run because its inputs changed, inside the write's transaction: a run still
   * waiting will read the new inputs; a running one gets another run after it; else one is queued.
   */
  async requestRun(kind: JobKind, farmId: number, userId: number | null, payload: Record<string, unknown>, transaction: Transaction): Promise<string> {
    await Farm.findByPk(farmId, { attributes: ['id'], transaction, lock: transaction.LOCK.NO_KEY_UPDATE });
    const pending = await ProcessingJob.pendingOfFarm(farmId, kind, transaction);
    if (pending) {
      if (pending.state === 'running' && !pending.rerunRequested) await pending.update({ rerunRequested: true }, { transaction });
      return pending.id;
    }
    await this.checkUserLimit(userId, transaction);
    return this.send(kind, farmId, userId, payload, transaction);
  }

  private async checkUserLimit(userId: number | null, transaction: Transaction): Promise<void> {
    if (userId === null) return;
    // One person's requests take turns here, so two at once cannot both pass the count.
    await User.findByPk(userId, { attributes: ['id'], transaction, lock: transaction.LOCK.NO_KEY_UPDATE });
    const n = await ProcessingJob.pendingCountOfUser(userId, transaction);
    if (n >= this.jobsPerUserMax) {
      throw tooMany('too_many_jobs', `You have ${n} background jobs waiting or running; the limit is ${this.jobsPerUserMax} at once. Wait for one to finish, then try again.`);
    }
  }

  /** The job row and the queue's job, same id, same transaction. */
  private async send(kind: JobKind, farmId: number, userId: number | null, payload: Record<string, unknown>, transaction: Transaction): Promise<string> {
    const id = randomUUID();
    try {
      await ProcessingJob.create({ id, farmId, kind, createdBy: userId, payload }, { transaction });
    } catch (e) {
      if (e instanceof UniqueConstraintError) throw conflict('job_pending', `A ${kind} run for this farm is already waiting or running; wait for it to finish, then try again.`);
      throw e;
    }
    await this.boss.send(`${this.prefix}${kind}`, { jobId: id }, { ...TERRAIN_SEND, id, db: bossSqlOn(transaction) });
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

  private readonly followUp = (kind: JobKind, farmId: number, userId: number | null, t: Transaction) =>
    this.send(kind, farmId, userId, { reason: 'inputs changed during the previous run' }, t);

  /**
   * Runs one job: running → done with the handler's closing message, or failed with the error's.
   * A row already ended (a stop or a reconciliation failed it) is not run again.
   */
  private async run(id: string, handler: JobHandler): Promise<void> {
    const [started] = await ProcessingJob.update({ state: 'running', progress: 0, message: 'Starting' }, { where: { id, state: ['queued', 'running'] } });
    const job = started ? await JobQueue.status(id) : null;
    if (!job) return;
    this.running.add(id);
    try {
      const message = await handler(job, (progress, msg) => this.update(id, { progress: Math.max(0, Math.min(1, progress)), message: msg }));
      if (!this.stopping) await settleJob(id, { state: 'done', message }, this.followUp);
    } catch (e) {
      console.error(`job ${id} (${job.kind}) failed:`, e);
      if (!this.stopping) await settleJob(id, { state: 'failed', message: e instanceof Error ? e.message : String(e) }, this.followUp);
    } finally {
      this.running.delete(id);
    }
  }

  /**
   * Ends the job rows a dead worker left waiting or running: a queue job active past its expiry
   * is failed in the queue (which tries it again while tries are left); the row then waits again
   * or is failed with a message, and a failed terrain run marks its farm's figures stale.
   * Returns how many rows it ended.
   */
  async reconcile(): Promise<number> {
    let ended = 0;
    for (const row of await pendingJobsWithQueueState()) {
      let queueState = row.queueState;
      if (row.expired && row.queueName) {
        await this.boss.fail(row.queueName, row.id, { message: 'worker lost: active past its expiry' });
        queueState = await queueStateOf(row.id);
      }
      const end = endAfterWorkerLoss(row, queueState);
      if (end && (await settleJob(row.id, end, this.followUp))) ended++;
    }
    return ended;
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

  /**
   * Takes no new jobs and lets running ones finish for a while; pg-boss fails a job still running
   * in the queue as it stops (tried again later while tries are left), and its row then waits
   * again or is failed with a message.
   */
  async stop(waitMs = STOP_WAIT_MS): Promise<void> {
    if (this.reconcileTimer) clearInterval(this.reconcileTimer);
    await this.boss.stop({ graceful: true, wait: true, timeout: waitMs }).catch((e: unknown) => console.error('job queue: stopping:', e));
    this.stopping = true;
    for (const id of this.running) {
      const end: JobEnd = (await queueStateOf(id)) === 'retry' ? { state: 'queued', message: CUT_SHORT.queued } : { state: 'failed', message: CUT_SHORT.failed };
      await settleJob(id, end, this.followUp);
    }
  }
}
