import { dataSource } from '../data-source.js';
import { DomainError } from '../errors/domain-error.js';
import { logger } from '../http/logger.js';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import { GroundModelRevisionEntity } from '../modules/ground-models/ground-model-revision.entity.js';
import { executeSnapshot } from '../modules/settlement-checks/check-runs.service.js';
import { SettlementCheckEntity } from '../modules/settlement-checks/settlement-check.entity.js';
import type { JobDefinition } from './job-definition.js';
import { RUN_SETTLEMENT_CHECK_QUEUE, type RunCheckJobData } from './run-check-queue.js';

/**
 * Runs a large settlement check and mirrors its state in job_runs. However it ends, the check's
 * pending mark is cleared so the designer can run it again; a failure says why.
 */
export async function runSettlementCheckJob(data: RunCheckJobData): Promise<void> {
  const count = data.snapshot.footings.length.toLocaleString('en-GB');
  await jobRuns.update(data.jobRunId, { state: 'running', progress: 0.05, message: `Computing the settlement of ${count} footings with their neighbours.` });
  const started = performance.now();
  try {
    const groundModel = await dataSource.getRepository(GroundModelRevisionEntity).findOneByOrFail({ id: data.snapshot.groundModelRevisionId });
    const revision = await executeSnapshot(data.orgId, data.projectId, data.snapshot, groundModel, data.actorId, (progress, message) => jobRuns.update(data.jobRunId, { progress, message }), 'thread');
    const seconds = ((performance.now() - started) / 1000).toFixed(1);
    await jobRuns.update(data.jobRunId, {
      state: 'succeeded',
      progress: 1,
      message: `Revision ${revision.revision} is ready: ${count} footings in ${seconds} s.`,
      result: { checkId: data.snapshot.checkId, revision: revision.revision, revisionId: revision.id, seconds: Number(seconds) },
    });
  } catch (error) {
    await dataSource.getRepository(SettlementCheckEntity).update({ id: data.snapshot.checkId, pendingJobId: data.jobRunId }, { pendingJobId: null });
    if (error instanceof DomainError) {
      await jobRuns.update(data.jobRunId, { state: 'failed', message: error.message });
      return;
    }
    logger.error({ err: error, job: RUN_SETTLEMENT_CHECK_QUEUE, checkId: data.snapshot.checkId }, 'settlement check failed');
    await jobRuns.update(data.jobRunId, { state: 'failed', message: 'The check stopped because of a problem on our side; nothing was saved. Run it again; if it keeps failing, tell your administrator.' });
  }
}

export const runCheckJob: JobDefinition = {
  name: RUN_SETTLEMENT_CHECK_QUEUE,
  // A designer waits on the page for the result.
  pollingIntervalSeconds: 0.5,
  handler: (data) => runSettlementCheckJob(data as RunCheckJobData),
};
