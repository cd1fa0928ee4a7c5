import { DomainError } from '../errors/domain-error.js';
import { logger } from '../http/logger.js';
import { runAnalysis } from '../modules/analyses/analyses.service.js';
import { jobRuns } from '../modules/job-runs/job-runs.service.js';
import { ANALYSE_TEST_QUEUE, type AnalyseTestJobData } from './analyse-test-queue.js';
import type { JobDefinition } from './job-definition.js';

/**
 * Analyses one test and mirrors its state in job_runs. A failure a person can act on
 * (no readings, incomplete specimen…) ends the job as failed with that message and is not
 * retried; anything else is logged, marked failed and rethrown so pg-boss retries once.
 */
export async function analyseTest(data: AnalyseTestJobData): Promise<void> {
  await jobRuns.update(data.jobRunId, { state: 'running', progress: 0.05, message: 'Starting the analysis.' });
  try {
    const analysis = await runAnalysis(data.orgId, data.testId, data.requestedById, (progress, message) =>
      jobRuns.update(data.jobRunId, { progress, message }),
    );
    await jobRuns.update(data.jobRunId, {
      state: 'succeeded',
      progress: 1,
      message: `Analysed: ${analysis.warningCount} warning${analysis.warningCount === 1 ? '' : 's'}.`,
      result: { analysisId: analysis.id },
    });
  } catch (error) {
    if (error instanceof DomainError) {
      await jobRuns.update(data.jobRunId, { state: 'failed', message: error.message });
      return;
    }
    logger.error({ err: error, job: ANALYSE_TEST_QUEUE, testId: data.testId }, 'analysis failed');
    await jobRuns.update(data.jobRunId, {
      state: 'failed',
      message: 'The analysis stopped because of a problem on our side. It is tried once more; if it fails again, tell your administrator.',
    });
    throw error;
  }
}

export const analyseTestJob: JobDefinition = {
  name: ANALYSE_TEST_QUEUE,
  // A technician waits on the page for the result after every import and pick: pick it up quickly.
  pollingIntervalSeconds: 0.5,
  // The queue carries only what enqueueAnalysis sent.
  handler: (data) => analyseTest(data as AnalyseTestJobData),
};
