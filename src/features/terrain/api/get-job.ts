// GET /api/jobs/:jobId — one background job; polled about once a second until it is done or failed.
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';

export type JobState = 'queued' | 'running' | 'done' | 'failed';

export type Job = {
  id: string;
  kind: 'terrain';
  state: JobState;
  /** 0..1 */
  progress: number;
  message: string | null;
};

/** How often a queued or running job is asked about, ms. */
export const JOB_POLL_MS = 700;

export const isJobActive = (state: JobState | undefined) => state === 'queued' || state === 'running';

export const getJob = (jobId: string) => api.get<Job>(`/api/jobs/${encodeURIComponent(jobId)}`);

export const getJobQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['jobs', jobId],
    queryFn: () => getJob(jobId),
    staleTime: 0,
    // Keep asking while the job is queued or running; stop once it has finished either way.
    refetchInterval: (query) => (query.state.data && !isJobActive(query.state.data.state) ? false : JOB_POLL_MS),
  });

export const useJob = (jobId: string | null) =>
  useQuery({ ...getJobQueryOptions(jobId ?? ''), enabled: jobId !== null });
