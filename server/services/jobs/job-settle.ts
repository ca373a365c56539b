// How a job row ends, in one place: done, failed with a message (a terrain run that did not
// finish leaves the farm's figures marked stale, since they no longer follow its inputs), or
// waiting again for the queue's retry. When inputs changed while it ran, the run that follows it
// is queued in the same transaction that ends it, so the farm is never left without one.
import type { Transaction } from 'sequelize';
import { FieldTerrain, ProcessingJob } from '../../models';
import type { JobKind } from '../../models/processing-job.model';

export type JobEnd = { state: 'done'; message: string } | { state: 'failed'; message: string } | { state: 'queued'; message: string };

/** Sends the follow-up run (job-queue.ts supplies it: row and queue job in the transaction). */
export type FollowUp = (kind: JobKind, farmId: number, userId: number | null, transaction: Transaction) => Promise<string>;

/**
 * Ends a waiting or running job row; a row already ended (by a stop or a reconciliation) is left
 * as it is. Returns whether the row was ended here.
 */
export async function settleJob(id: string, end: JobEnd, followUp: FollowUp): Promise<boolean> {
  return ProcessingJob.sequelize!.transaction(async (t) => {
    const job = await ProcessingJob.findOne({ where: { id, state: ['queued', 'running'] }, transaction: t, lock: t.LOCK.UPDATE });
    if (!job) return false;
    if (end.state === 'queued') {
      await job.update({ state: 'queued', progress: 0, message: end.message }, { transaction: t });
      return true;
    }
    const rerun = job.rerunRequested;
    await job.update({ state: end.state, message: end.message, ...(end.state === 'done' ? { progress: 1 } : {}), rerunRequested: false }, { transaction: t });
    if (end.state === 'failed' && job.kind === 'terrain') await FieldTerrain.markFarmStale(job.farmId, t);
    if (rerun) await followUp(job.kind, job.farmId, job.createdBy, t);
    return true;
  });
}
