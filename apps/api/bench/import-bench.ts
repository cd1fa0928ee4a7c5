/**
 * End-to-end import benchmark: a 200,000-reading CSV goes through the real HTTP upload
 * (multer → content sniffing → SHA-256 → object storage → uploads row + job), the pg-boss
 * import job (papaparse → strict validation → COPY into readings in one transaction) and
 * the analysis job R's markReadingsUploaded queues (geo-core on the stored readings).
 *
 * Runs the API and the worker's job handlers in this process, against the running services
 * of .run/services.env (PostgreSQL, S3 fake). Migrates DATABASE_URL first.
 *   source .run/services.env && pnpm --filter @porestack/api bench:import
 * BENCH_READINGS (default 200000) sets the size; BENCH_FORMAT=xlsx sends the canonical workbook instead of the CSV.
 */
import './bench-env.js';
import 'reflect-metadata';
import type { JobRun, Upload } from '@porestack/types';
import { createApp } from '../src/app.js';
import { dataSource } from '../src/data-source.js';
import { createBoss, stopJobQueue } from '../src/jobs/boss.js';
import { JOBS } from '../src/jobs/index.js';
import { registerJobs } from '../src/jobs/register-jobs.js';
import { canonicalXlsxTemplate } from '../src/modules/readings-import/demo-files.js';
import { CANONICAL_MAPPING } from '../src/modules/readings-import/detect-layout.js';
import { demoReadings, demoReadingsCsv } from '../src/modules/readings-import/demo-readings.js';
import { importLimits } from '../src/modules/readings-import/import-limits.js';
import { parseCsvTable } from '../src/modules/readings-import/parse-csv-table.js';
import { readReadings } from '../src/modules/readings-import/read-readings.js';
import { ensureBucket } from '../src/storage/storage.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../src/testing/browser.js';
import { draftTest } from '../src/testing/lab-fixtures.js';

const READINGS = Number(process.env['BENCH_READINGS'] ?? 200_000);
const INCREMENTS = 10;
const FORMAT = process.env['BENCH_FORMAT'] === 'xlsx' ? 'xlsx' : 'csv';

/** Log-spaced times from 0.01 to 1440 min (plus 0): a logger writing every few seconds. */
function denseTimes(count: number): number[] {
  const times = [0];
  for (let i = 0; i < count - 1; i += 1) times.push(0.01 * (144_000 ** (i / (count - 2))));
  return times;
}

interface Observed {
  job: JobRun;
  /** ms since the poll started at which each progress message was first seen. */
  phases: Array<{ atMs: number; message: string }>;
}

async function follow(browser: Browser, orgId: string, jobId: string): Promise<Observed> {
  const started = performance.now();
  const phases: Observed['phases'] = [];
  for (;;) {
    const job = (await browser.get(`/api/orgs/${orgId}/jobs/${jobId}`).expect(200)).body as JobRun;
    if (job.message && phases.at(-1)?.message !== job.message) phases.push({ atMs: performance.now() - started, message: job.message });
    if (job.state === 'succeeded' || job.state === 'failed') return { job, phases };
    if (performance.now() - started > 300_000) throw new Error(`job ${jobId} did not finish in 5 min`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

const ms = (value: number) => `${value.toFixed(0).padStart(6)} ms`;

await dataSource.initialize();
await dataSource.runMigrations({ transaction: 'each' });
await ensureBucket();
const boss = createBoss();
boss.on('error', () => undefined);
await boss.start();
await registerJobs(boss, JOBS.filter((job) => !job.schedule));

const [backlog] = (await dataSource.query(`SELECT count(*)::int AS n FROM pgboss.job WHERE state IN ('created', 'retry', 'active')`)) as Array<{ n: number }>;
if ((backlog?.n ?? 0) > 0) {
  process.stdout.write(`Note: ${backlog?.n} jobs were already waiting in the queue; the analysis waits behind them (shown as its queue wait). Use a fresh database for clean figures.\n`);
}

const app = createApp();
const admin = await signUpAdmin(app, 'bench-admin');
const tech = await createMember(admin.orgId, 'technician', 'bench-tech');
const technician = await signedInBrowser(app, tech.email);
const { testId } = await draftTest(admin.orgId, tech.userId);

const readings = demoReadings(denseTimes(READINGS / INCREMENTS));
const csv = Buffer.from(demoReadingsCsv(readings));
const file = FORMAT === 'xlsx' ? await canonicalXlsxTemplate(readings) : csv;
process.stdout.write(`File: ${readings.length.toLocaleString('en-GB')} readings in ${INCREMENTS} increments, ${(file.length / 1024 / 1024).toFixed(1)} MB ${FORMAT.toUpperCase()}\n\n`);

// In-process parts, for the breakdown.
let t = performance.now();
const table = parseCsvTable(csv.toString('utf8'), importLimits());
const parseMs = performance.now() - t;
t = performance.now();
readReadings(table, CANONICAL_MAPPING);
const validateMs = performance.now() - t;

const total = performance.now();
t = performance.now();
const res = await technician.agent.post(`/api/orgs/${admin.orgId}/tests/${testId}/uploads`).set('x-csrf-token', technician.csrfToken).attach('file', file, `bench-200k.${FORMAT}`);
if (res.status !== 201) throw new Error(`upload answered ${res.status}: ${JSON.stringify(res.body)}`);
const uploadMs = performance.now() - t;
const { upload, job } = res.body as { upload: Upload; job: JobRun };
t = performance.now();
const imported = await follow(technician, admin.orgId, job.id);
const importMs = performance.now() - t;
if (imported.job.state !== 'succeeded') throw new Error(`import failed: ${imported.job.message}`);
const analysisJobId = String(imported.job.result?.['analysisJobId']);
t = performance.now();
const analysed = await follow(technician, admin.orgId, analysisJobId);
const analysisMs = performance.now() - t;
const totalMs = performance.now() - total;

process.stdout.write(`Upload → stored (HTTP POST: multer, sniff, SHA-256, S3 put, row + job)   ${ms(uploadMs)}   sha256 ${upload.sha256.slice(0, 12)}…\n`);
process.stdout.write(`Stored → imported (import job: queue pick-up, parse, validate, COPY)      ${ms(importMs)}   ${imported.job.message}\n`);
for (const phase of imported.phases) process.stdout.write(`    +${ms(phase.atMs)}  ${phase.message}\n`);
process.stdout.write(`Imported → analysed (analysis job: load readings, geo-core, store)        ${ms(analysisMs)}   ${analysed.job.state}: ${analysed.job.message}\n`);
const pickedUp = analysed.phases.find((phase) => !phase.message.startsWith('Waiting'))?.atMs ?? 0;
process.stdout.write(`    queue wait ${ms(pickedUp)}, work ${ms(analysisMs - pickedUp)}\n`);
for (const phase of analysed.phases) process.stdout.write(`    +${ms(phase.atMs)}  ${phase.message}\n`);
process.stdout.write(`End to end (upload → stored → parsed → analysed)                          ${ms(totalMs)}\n\n`);
process.stdout.write(`In-process breakdown (CSV): papaparse ${ms(parseMs)}, validation + unit conversion ${ms(validateMs)}\n`);

await boss.stop({ graceful: true, wait: true });
await stopJobQueue();
await dataSource.destroy();
process.exit(0);
