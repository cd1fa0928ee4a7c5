import { fileURLToPath } from 'node:url';
import Piscina from 'piscina';
import { DomainError } from '../../errors/domain-error.js';
import type { EngineAnswer, EngineTask } from './engine-thread.js';
import type { EngineRun } from './run-check-engine.js';

// Running from TypeScript sources (tsx, vitest), the thread registers tsx's loader first.
const FROM_SOURCE = import.meta.url.endsWith('.ts');
const WORKER_FILE = fileURLToPath(new URL(FROM_SOURCE ? './engine-thread-from-source.mjs' : './engine-thread.js', import.meta.url));

let pool: Piscina<EngineTask, EngineAnswer> | undefined;

/**
 * Runs a large check's engine on its own thread, so the worker process keeps taking imports
 * and analyses while a 1,000-footing check computes for tens of seconds. Small checks run
 * in the request itself (a thread's start would cost more than they take).
 * @throws DomainError when geo-core refuses the input, as runCheckEngine does.
 */
export async function runEngineOffThread(task: EngineTask): Promise<EngineRun> {
  pool ??= new Piscina<EngineTask, EngineAnswer>({ filename: WORKER_FILE, minThreads: 0, maxThreads: 1, idleTimeout: 30_000, maxQueue: 'auto' });
  const answer = await pool.run(task);
  if (answer.kind === 'refused') throw new DomainError('validation_failed', answer.message);
  return answer.run;
}

/** Lets a worker or a test end without waiting for the idle thread's timeout. */
export async function closeEnginePool(): Promise<void> {
  const closing = pool;
  pool = undefined;
  await closing?.destroy();
}
