// What a person sees of a background job. A landowner sees the state and progress but not the
// worker's message, which speaks of the whole farm (how many fields it has, which were covered).
import type { ProcessingJob } from '../models';
import type { Role } from '../../shared/schemas/auth';

const PLAIN_STATE: Record<string, string> = { queued: 'Waiting to start', running: 'Working', done: 'Finished', failed: 'Could not finish' };

export function presentJob(job: ProcessingJob, role: Role) {
  const message = role === 'landowner' ? (PLAIN_STATE[job.state] ?? job.state) : job.message;
  return { id: job.id, kind: job.kind, state: job.state, progress: job.progress, message };
}
