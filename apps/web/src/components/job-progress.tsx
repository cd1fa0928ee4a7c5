import type { JobRun } from '@porestack/types';
import { Alert } from './alert';
import { ProgressBar } from './progress-bar';

const STATE_WORDS: Record<JobRun['state'], string> = {
  queued: 'Waiting to start',
  running: 'Working',
  succeeded: 'Done',
  failed: 'Failed',
};

/** A background job's state and progress in words; a failed job says why and what to do. */
export function JobProgress({ job, what }: { job: JobRun; what: string }) {
  if (job.state === 'failed') {
    return (
      <Alert tone="error" title={`${what} failed`}>
        {/* The job's own message already says what to fix; only a silent failure needs advice. */}
        {job.message ?? 'The job stopped without saying why. Try again; nothing from the failed attempt was kept.'}
      </Alert>
    );
  }
  if (job.state === 'succeeded') {
    const message = job.message ? ` — ${job.message}` : '';
    return <Alert tone="success">{what}: done{message}{/[.!?]$/.test(message) ? '' : '.'}</Alert>;
  }
  return (
    <div className="space-y-1" data-testid="job-progress">
      <ProgressBar label={`${what}: ${STATE_WORDS[job.state]}`} fraction={job.state === 'queued' ? 0 : job.progress} />
      {job.message ? <p className="text-xs text-slate-600">{job.message}</p> : null}
    </div>
  );
}
