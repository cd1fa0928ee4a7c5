import { JobRunSchema, type JobRun } from '@porestack/types';

/** Analysis endpoints answer with the job, or with `{ job, ... }`; either way the page follows the job. */
export const JobAnswer = {
  parse: (value: unknown): JobRun | null => {
    if (value === undefined || value === null) return null;
    const body = value as { job?: unknown };
    const candidate = typeof body === 'object' && 'job' in body ? body.job : value;
    const parsed = JobRunSchema.safeParse(candidate);
    return parsed.success ? parsed.data : null;
  },
};
