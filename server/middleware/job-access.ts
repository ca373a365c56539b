// For /api/jobs/:jobId: a job is seen only by members of its farm; to everyone else it does not exist.
import type { RequestHandler } from 'express';
import { ProcessingJob } from '../models';
import { badRequest, notFound } from '../lib/http-error';
import { membershipOf } from './farm-access';

// A UUID in its canonical 8-4-4-4-12 form (RFC 9562): anything else is not a job id, and PostgreSQL's uuid type would refuse it.
const JOB_ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Sets res.locals.job and res.locals.jobRole (the caller's role on the job's farm). */
export const loadJobForMember: RequestHandler = async (req, res, next) => {
  const id = String(req.params.jobId);
  if (!JOB_ID.test(id)) throw badRequest('invalid_id', 'jobId must be a job id.');
  const job = await ProcessingJob.findByPk(id);
  const membership = job ? await membershipOf(req.user!.id, job.farmId) : null;
  if (!job || !membership) throw notFound('That job');
  res.locals.job = job;
  res.locals.jobRole = membership.role;
  next();
};
