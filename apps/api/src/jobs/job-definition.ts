/**
 * One background job: its queue name, its handler and, for housekeeping, a cron schedule.
 * Register new jobs in `jobs/index.ts`; the worker creates each queue and works it.
 */
export interface JobDefinition<Data extends object = object> {
  name: string;
  handler: (data: Data) => Promise<void>;
  /** cron, in UTC */
  schedule?: string;
  /** How often an idle worker looks for new jobs (pg-boss default 2 s, minimum 0.5 s); lower for jobs a page waits on. */
  pollingIntervalSeconds?: number;
  /** Jobs of this queue one process works at once (default 1). */
  concurrency?: number;
}
