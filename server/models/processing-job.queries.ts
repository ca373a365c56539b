// What the job rows (processing_jobs) and the queue's own jobs (pg-boss, schema `pgboss`) say
// together, and the queue's SQL run on a Sequelize transaction's connection, so a job is sent
// in the same transaction as the write that needs it.
import { QueryTypes, type Transaction } from 'sequelize';
import type PgBoss from 'pg-boss';
import { ProcessingJob } from './processing-job.model';

/** The schema pg-boss keeps its tables in, in the app's own database. */
export const BOSS_SCHEMA = 'pgboss';

/**
 * pg-boss's database adapter on the transaction's connection: its insert commits or rolls back
 * with the transaction. pg-boss leaves unset parameters undefined; PostgreSQL takes them as NULL.
 */
export function bossSqlOn(transaction: Transaction): PgBoss.Db {
  return {
    executeSql: async (text, values) => {
      const rows = await ProcessingJob.sequelize!.query(text, { bind: values.map((v) => (v === undefined ? null : v)), transaction, type: QueryTypes.SELECT });
      return { rows };
    },
  };
}

/** A job row waiting or running, with the state of the queue's job of the same id (null: none). */
export type PendingJobWithQueueState = {
  id: string;
  farmId: number;
  kind: ProcessingJob['kind'];
  state: 'queued' | 'running';
  queueName: string | null;
  queueState: 'created' | 'retry' | 'active' | 'completed' | 'cancelled' | 'failed' | null;
  /** Active longer than its expiry: the worker that took it is gone (or far too slow). */
  expired: boolean;
};

/** Every job row waiting or running, beside its queue job (live or archived). */
export function pendingJobsWithQueueState(): Promise<PendingJobWithQueueState[]> {
  return ProcessingJob.sequelize!.query<PendingJobWithQueueState>(
    `SELECT p.id, p.farm_id AS "farmId", p.kind, p.state,
            COALESCE(j.name, a.name) AS "queueName", COALESCE(j.state, a.state)::text AS "queueState",
            COALESCE(j.state = 'active' AND j.started_on + j.expire_in < now(), false) AS expired
       FROM processing_jobs p
       LEFT JOIN ${BOSS_SCHEMA}.job j ON j.id = p.id
       LEFT JOIN ${BOSS_SCHEMA}.archive a ON a.id = p.id AND j.id IS NULL
      WHERE p.state IN ('queued', 'running')`,
    { type: QueryTypes.SELECT },
  );
}

/** The queue's state of one job now (after a fail: 'retry' or 'failed'). */
export async function queueStateOf(id: string): Promise<PendingJobWithQueueState['queueState']> {
  const [row] = await ProcessingJob.sequelize!.query<{ state: PendingJobWithQueueState['queueState'] }>(
    `SELECT state::text AS state FROM ${BOSS_SCHEMA}.job WHERE id = :id`,
    { replacements: { id }, type: QueryTypes.SELECT },
  );
  return row?.state ?? null;
}
