import type { JobRun, Upload } from '@porestack/types';
import fc from 'fast-check';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { env } from '../../../config/env.js';
import { dataSource } from '../../../data-source.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { readingCount, sendFile, startImportWorker, stopImportWorker, storedObjectCount, uploadRowCount } from '../../../testing/import-harness.js';
import { draftTest } from '../../../testing/lab-fixtures.js';
import { fixture } from '../../readings-import/__tests__/import-test-files.js';

/**
 * Fuzzing the upload → import → preview path through the real API, worker, database and
 * storage: whatever the bytes, every answer is 2xx or 4xx (never 5xx), every import job ends
 * (never hangs), and nothing is half-written. Seeded, so a failure can be replayed.
 */
const SEED = 20261203;
const RUNS = 240;
const CANONICAL_CSV = fixture('canonical.csv');
const CANONICAL_XLSX = fixture('canonical.xlsx');

const app = createApp();
let worker: PgBoss;
const labs: Array<{ orgId: string; technician: Browser; technicianId: string }> = [];
const settings = env() as { IMPORT_PARSE_SECONDS: number };
const parseSeconds = settings.IMPORT_PARSE_SECONDS;

beforeAll(async () => {
  // Damaged workbooks run to the parse deadline: a short one keeps the run within minutes
  // (the small files here parse in well under a second).
  settings.IMPORT_PARSE_SECONDS = 3;
  worker = await startImportWorker();
  for (const label of ['fuzz-a', 'fuzz-b', 'fuzz-c']) {
    const admin = await signUpAdmin(app, label);
    const tech = await createMember(admin.orgId, 'technician', `${label}-tech`);
    labs.push({ orgId: admin.orgId, technician: await signedInBrowser(app, tech.email), technicianId: tech.userId });
  }
});

afterAll(async () => {
  settings.IMPORT_PARSE_SECONDS = parseSeconds;
  await stopImportWorker(worker, labs.map((lab) => lab.orgId));
  await stopJobQueue();
});

/** Flips, cuts and splices: how files get damaged on the way. */
const mutated = (base: Buffer) =>
  fc
    .record({
      flips: fc.array(fc.record({ at: fc.nat(), bit: fc.integer({ min: 0, max: 7 }) }), { maxLength: 6 }),
      cutAt: fc.option(fc.nat(), { nil: null }),
      splice: fc.option(fc.record({ at: fc.nat(), bytes: fc.uint8Array({ maxLength: 40 }) }), { nil: null }),
    })
    .map(({ flips, cutAt, splice }) => {
      let bytes = Buffer.from(base);
      for (const { at, bit } of flips) {
        const index = at % bytes.length;
        bytes[index] = (bytes[index] as number) ^ (1 << bit);
      }
      if (splice) {
        const index = splice.at % bytes.length;
        bytes = Buffer.concat([bytes.subarray(0, index), Buffer.from(splice.bytes), bytes.subarray(index)]);
      }
      if (cutAt !== null) bytes = bytes.subarray(0, cutAt % (bytes.length + 1));
      return bytes;
    });

/** CSV-like text with plausible and implausible cells. */
const csvText = fc
  .tuple(
    fc.constantFrom(',', ';', '\t', '|'),
    fc.array(
      fc.array(fc.oneof(fc.double({ noNaN: false }).map(String), fc.integer().map(String), fc.string({ maxLength: 8 }), fc.constant(''), fc.constant('1,5')), {
        maxLength: 7,
      }),
      { maxLength: 40 },
    ),
    fc.boolean(),
  )
  .map(([delimiter, rows, canonicalHeader]) => {
    const header = canonicalHeader ? 'increment,stress_kpa,elapsed_min,deformation_mm'.replaceAll(',', delimiter) : 'a;b;c';
    return Buffer.from([header, ...rows.map((row) => row.join(delimiter))].join('\n'));
  });

const fileArbitrary = fc.oneof(
  { weight: 3, arbitrary: mutated(CANONICAL_CSV).map((bytes) => ({ bytes, name: 'readings.csv' })) },
  { weight: 2, arbitrary: mutated(CANONICAL_XLSX).map((bytes) => ({ bytes, name: 'readings.xlsx' })) },
  { weight: 3, arbitrary: csvText.map((bytes) => ({ bytes, name: 'logger.csv' })) },
  { weight: 1, arbitrary: fc.uint8Array({ maxLength: 600 }).map((bytes) => ({ bytes: Buffer.from(bytes), name: 'random.bin' })) },
);

async function untilFinished(lab: (typeof labs)[number], jobId: string): Promise<JobRun> {
  // The longest a job may take here: the parse deadline, the write and the queue, with room.
  const deadline = Date.now() + 60_000;
  for (;;) {
    const job = (await lab.technician.get(`/api/orgs/${lab.orgId}/jobs/${jobId}`).expect(200)).body as JobRun;
    if (job.state === 'succeeded' || job.state === 'failed') return job;
    if (Date.now() > deadline) throw new Error(`import job ${jobId} still ${job.state} after 60 s: ${job.message}`);
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

let tried = 0;
const outcomes = new Map<string, number>();

async function oneCase(file: { bytes: Buffer; name: string }, labIndex: number): Promise<void> {
  const lab = labs[labIndex % labs.length] as (typeof labs)[number];
  const { testId } = await draftTest(lab.orgId, lab.technicianId);
  const res = await sendFile(lab.technician, lab.orgId, testId, file.bytes, file.name);
  tried += 1;
  expect(res.status, `upload of ${file.name} (${file.bytes.length} bytes) answered ${res.status}: ${JSON.stringify(res.body)}`).toBeLessThan(500);
  if (res.status !== 201) {
    expect([400, 413, 415, 422]).toContain(res.status);
    // Refused on arrival: nothing stored, no row.
    expect(await uploadRowCount(testId)).toBe(0);
    expect(await storedObjectCount(lab.orgId, testId)).toBe(0);
    outcomes.set(`refused ${res.status}`, (outcomes.get(`refused ${res.status}`) ?? 0) + 1);
    return;
  }
  const { upload, job } = res.body as { upload: Upload; job: JobRun };
  const preview = await lab.technician.get(`/api/orgs/${lab.orgId}/uploads/${upload.id}/preview`);
  expect(preview.status, `preview answered ${preview.status}: ${JSON.stringify(preview.body)}`).toBeLessThan(500);
  const ended = await untilFinished(lab, job.id);
  const stored = (await lab.technician.get(`/api/orgs/${lab.orgId}/uploads/${upload.id}`).expect(200)).body as Upload;
  const readings = await readingCount(testId);
  if (stored.status === 'imported') {
    // All of the file or nothing: the readings are exactly the import's.
    expect(ended.state).toBe('succeeded');
    expect(readings).toBe(stored.readingCount);
  } else {
    expect(['failed', 'needs_mapping']).toContain(stored.status);
    expect(readings).toBe(0);
  }
  const key = `${stored.status}${ended.state === 'failed' && /did not finish within/.test(ended.message ?? '') ? ' (deadline)' : ''}`;
  outcomes.set(key, (outcomes.get(key) ?? 0) + 1);
}

describe('uploads fuzzed through the API', () => {
  it(`when ${RUNS} damaged, random and odd files are uploaded, imported and previewed, then no answer is a 5xx, every job ends and nothing is half-written`, async () => {
    let index = 0;
    await fc.assert(
      fc.asyncProperty(fc.array(fileArbitrary, { minLength: 6, maxLength: 6 }), async (files) => {
        // Six at a time over three organisations: the worker's three slots stay busy.
        await Promise.all(files.map((file) => oneCase(file, (index += 1))));
      }),
      { seed: SEED, numRuns: RUNS / 6, endOnFailure: true },
    );
    const [{ left } = { left: 0 }] = (await dataSource.query(
      `SELECT count(*)::int AS left FROM job_runs WHERE organisation_id = ANY($1) AND state IN ('queued', 'running')`,
      [labs.map((lab) => lab.orgId)],
    )) as Array<{ left: number }>;
    expect(left).toBe(0);
    process.stdout.write(`upload fuzz (seed ${SEED}): ${tried} files tried — ${[...outcomes].map(([outcome, count]) => `${outcome}: ${count}`).join(', ')}\n`);
    expect(tried).toBe(RUNS);
  }, 900_000);
});
