import type PgBoss from 'pg-boss';
import type { JobDefinition } from './job-definition.js';

/** Creates each job's queue, subscribes its handler and sets its schedule. */
export async function registerJobs(boss: PgBoss, jobs: JobDefinition[]): Promise<void> {
  for (const job of jobs) {
    await boss.createQueue(job.name);
    await boss.work<object>(job.name, { pollingIntervalSeconds: job.pollingIntervalSeconds ?? 2 }, async (batch) => {
      for (const item of batch) await job.handler(item.data);
    });
    if (job.schedule) await boss.schedule(job.name, job.schedule);
  }
}
