import 'reflect-metadata';
import { dataSource } from './data-source.js';
import { logger } from './http/logger.js';
import { createBoss } from './jobs/boss.js';
import { JOBS } from './jobs/index.js';
import { registerJobs } from './jobs/register-jobs.js';
import { closeMailer } from './mail/mailer.js';
import { closeParsePool, warmParsePool } from './modules/readings-import/parse-pool.js';
import { closeEnginePool } from './modules/settlement-checks/engine-pool.js';
import { ensureBucket } from './storage/storage.js';

await dataSource.initialize();
await ensureBucket();
const boss = createBoss();
boss.on('error', (error) => logger.error({ err: error }, 'job queue error'));
await boss.start();
await warmParsePool();
await registerJobs(boss, JOBS);
logger.info({ jobs: JOBS.map((job) => job.name) }, 'Porestack worker started');

let stopping = false;
async function shutdown(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'worker shutting down');
  setTimeout(() => process.exit(1), 15_000).unref();
  // Let jobs in progress finish before the pool closes.
  await boss.stop({ graceful: true, wait: true });
  await closeParsePool();
  await closeEnginePool();
  closeMailer();
  await dataSource.destroy();
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
