// What a person sees of a background job.
import type { ProcessingJob } from '../models';

export function presentJob(job: ProcessingJob) {
  return { id: job.id, kind: job.kind, state: job.state, progress: job.progress, message: job.message };
}
