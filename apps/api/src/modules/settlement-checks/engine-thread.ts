import type { CheckOptions, FootingRow, GroundModelContent } from '@porestack/types';
import { DomainError } from '../../errors/domain-error.js';
import { runCheckEngine, type EngineRun } from './run-check-engine.js';

export interface EngineTask {
  content: GroundModelContent;
  footings: FootingRow[];
  options: CheckOptions;
}

/** What crosses back from the thread: the run, or the message of input the engine refused (errors lose their class on the way). */
export type EngineAnswer = { kind: 'run'; run: EngineRun } | { kind: 'refused'; message: string };

/**
 * The body of an engine thread (see engine-pool.ts): geo-core on plain data, nothing that
 * touches the database, storage or the environment.
 */
export default function runEngineInThread(task: EngineTask): EngineAnswer {
  try {
    return { kind: 'run', run: runCheckEngine(task.content, task.footings, task.options) };
  } catch (error) {
    if (error instanceof DomainError) return { kind: 'refused', message: error.message };
    throw error;
  }
}
