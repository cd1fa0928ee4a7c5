import PgBoss from 'pg-boss';
import { env } from '../config/env.js';

/** pg-boss keeps its queue tables in their own schema, next to the app's. */
export const BOSS_SCHEMA = 'pgboss';

export function createBoss(): PgBoss {
  return new PgBoss({
    connectionString: env().DATABASE_URL,
    schema: BOSS_SCHEMA,
    application_name: 'porestack-jobs',
    // Expired jobs (a worker that died mid-job) are failed and retried at the next maintenance:
    // every 10 s instead of pg-boss's 2 minutes, so a killed import is retried within a minute.
    maintenanceIntervalSeconds: 10,
  });
}

let sender: Promise<PgBoss> | undefined;

/**
 * A started pg-boss for the API process, used only to enqueue (`send`); the worker
 * process (src/worker.ts) does the work.
 */
export function jobQueue(): Promise<PgBoss> {
  sender ??= (async () => {
    const boss = createBoss();
    boss.on('error', () => undefined);
    await boss.start();
    return boss;
  })();
  return sender;
}

export async function stopJobQueue(): Promise<void> {
  if (!sender) return;
  const boss = await sender;
  sender = undefined;
  await boss.stop({ graceful: true, wait: true });
}
