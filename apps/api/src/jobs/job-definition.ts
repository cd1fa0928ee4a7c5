/**
 * One background job: its queue name, its handler and, for housekeeping, a cron schedule.
 * Register new jobs in `jobs/index.ts`; the worker creates each queue and works it.
 */
export interface JobDefinition<Data extends object = object> {
  name: string;
  handler: (data: Data) => Promise<void>;
  /** cron, in UTC */
  schedule?: string;
}
