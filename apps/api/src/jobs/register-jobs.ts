import type PgBoss from 'pg-boss';
import type { JobDefinition } from './job-definition.js';

/** Creates each job's queue, subscribes its handler and sets its schedule. */
export async function registerJobs(boss: PgBoss, jobs: JobDefinition[]): Promise<void> {
  for (const job of jobs) {
    await boss.createQueue(job.name);
    // pg-boss 10 has no concurrency setting: each work() subscription takes one job at a time.
    for (let slot = 0; slot < (job.concurrency ?? 1); slot += 1) {
      await boss.work<object>(job.name, { pollingIntervalSeconds: job.pollingIntervalSeconds ?? 2 }, async (batch) => {
        for (const item of batch) await job.handler(item.data);
      });
    }
    if (job.schedule) await boss.schedule(job.name, job.schedule);
  }
}
