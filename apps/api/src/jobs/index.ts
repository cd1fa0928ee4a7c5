import { analyseTestJob } from './analyse-test.job.js';
import { authMailJob } from './auth-mail.job.js';
import { deleteExpiredTokensJob } from './delete-expired-tokens.job.js';
import { generateReportJob } from './generate-report.job.js';
import { importReadingsJob } from './import-readings.job.js';
import type { JobDefinition } from './job-definition.js';
import { runCheckJob } from './run-check.job.js';

/** Every job the worker runs. */
export const JOBS: JobDefinition[] = [deleteExpiredTokensJob, analyseTestJob, importReadingsJob, authMailJob, generateReportJob(), runCheckJob];
