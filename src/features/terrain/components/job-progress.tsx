// A real progress bar for a background job: the share done as a bar, a number and words.
import type { Job } from '../api/get-job';

const STATE_WORDS: Record<Job['state'], string> = {
  queued: 'Waiting to start',
  running: 'Working',
  done: 'Done',
  failed: 'Stopped',
};

export function JobProgress({ job, label }: { job: Pick<Job, 'state' | 'progress' | 'message'>; label: string }) {
  const pct = Math.round(Math.min(Math.max(job.progress, 0), 1) * 100);
  return (
    <div className="flex flex-col gap-1">
      <div className="flex items-baseline justify-between gap-2 text-sm">
        <span className="font-medium">
          {label}: {STATE_WORDS[job.state]}
        </span>
        <span className="num text-ink-soft">{pct} %</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        aria-valuetext={`${pct} %${job.message ? `: ${job.message}` : ''}`}
        data-testid="terrain-progress"
        data-state={job.state}
        className="h-3 w-full overflow-hidden rounded-full border border-ink-faint bg-white/70"
      >
        <div className="h-full bg-clay transition-[width] duration-500" style={{ width: `${pct}%` }} />
      </div>
      {job.message && job.message !== STATE_WORDS[job.state] ? <p className="text-sm text-ink-soft">{job.message}</p> : null}
    </div>
  );
}
