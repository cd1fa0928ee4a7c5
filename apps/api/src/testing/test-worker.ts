import type PgBoss from 'pg-boss';
import { dataSource } from '../data-source.js';
import { BOSS_SCHEMA, createBoss } from '../jobs/boss.js';
import type { JobDefinition } from '../jobs/job-definition.js';
import { registerJobs } from '../jobs/register-jobs.js';

/**
 * The real pg-boss worker, in the test's own process, for `jobs`. Test files run one after
 * another, and most run no worker: jobs of these queues still waiting now were left by earlier
 * files and would only delay this file's own (a backlog of analyses took longer than a test's
 * wait on a loaded machine), so they are dropped first (once pg-boss has made its schema: a
 * file run on its own against a fresh database finds none yet). Stop it with `boss.stop()` and
 * `stopJobQueue()` in afterAll.
 */
export async function startTestWorker(jobs: JobDefinition[]): Promise<PgBoss> {
  const boss = createBoss();
  boss.on('error', () => undefined);
  await boss.start();
  await dataSource.query(`DELETE FROM ${BOSS_SCHEMA}.job WHERE name = ANY($1) AND state IN ('created', 'retry')`, [jobs.map((job) => job.name)]);
  await registerJobs(boss, jobs);
  return boss;
}
