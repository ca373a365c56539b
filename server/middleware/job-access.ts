// For /api/jobs/:jobId: a job is seen only by members of its farm; to everyone else it does not exist.
import type { RequestHandler } from 'express';
import { ProcessingJob } from '../models';
import { badRequest, notFound } from '../lib/http-error';
import { membershipOf } from './farm-access';

const JOB_ID = /^[0-9a-f-]{36}$/i;

/** Sets res.locals.job. */
export const loadJobForMember: RequestHandler = async (req, res, next) => {
  const id = String(req.params.jobId);
  if (!JOB_ID.test(id)) throw badRequest('invalid_id', 'jobId must be a job id.');
  const job = await ProcessingJob.findByPk(id);
  if (!job || !(await membershipOf(req.user!.id, job.farmId))) throw notFound('That job');
  res.locals.job = job;
  next();
};
