import type { JobRun, Upload } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { IMPORTS_PER_ORGANISATION, importExpirySeconds } from '../../../jobs/import-readings-queue.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { finishedJob, readingCount, sendFile, startImportWorker, stopImportWorker } from '../../../testing/import-harness.js';
import { draftTest } from '../../../testing/lab-fixtures.js';
import { fixture } from '../../readings-import/__tests__/import-test-files.js';

/**
 * canonical.xlsx with a few bits flipped, as a probe of the running portal found it: exceljs's
 * reader neither resolves nor rejects on it, so before parses ran on a thread with a deadline
 * an import of it waited forever and held the only import slot of every organisation.
 */
const DAMAGED = fixture('damaged-never-settles.xlsx');

const app = createApp();
let worker: PgBoss;

interface Lab {
  orgId: string;
  technician: Browser;
  technicianId: string;
}

async function lab(label: string): Promise<Lab> {
  const admin = await signUpAdmin(app, `${label}-admin`);
  const tech = await createMember(admin.orgId, 'technician', `${label}-tech`);
  return { orgId: admin.orgId, technician: await signedInBrowser(app, tech.email), technicianId: tech.userId };
}

async function upload(at: Lab, bytes: Buffer, name: string): Promise<{ upload: Upload; job: JobRun; testId: string }> {
  const { testId } = await draftTest(at.orgId, at.technicianId);
  const res = await sendFile(at.technician, at.orgId, testId, bytes, name);
  expect(res.status).toBe(201);
  return { ...(res.body as { upload: Upload; job: JobRun }), testId };
}

async function jobState(at: Lab, jobId: string): Promise<JobRun> {
  return (await at.technician.get(`/api/orgs/${at.orgId}/jobs/${jobId}`).expect(200)).body as JobRun;
}

let slow: Lab;
let other: Lab;

beforeAll(async () => {
  worker = await startImportWorker();
  slow = await lab('damaged');
  other = await lab('bystander');
});

afterAll(async () => {
  await stopImportWorker(worker, [slow.orgId, other.orgId]);
  await stopJobQueue();
});

describe('a workbook whose parse never settles', () => {
  it('when its preview is asked for, then 422 says the file could not be read instead of no answer', async () => {
    const previewer = await lab('damaged-preview');
    const sent = await upload(previewer, DAMAGED, 'damaged-preview.xlsx');
    const res = await previewer.technician.get(`/api/orgs/${previewer.orgId}/uploads/${sent.upload.id}/preview`);
    expect(res.status).toBe(422);
    expect(res.body).toMatchObject({ code: 'invalid_file' });
    expect(res.body.message).toMatch(/^The file could not be read: reading it did not finish within \d+ s\. It may be damaged — open it in Excel or LibreOffice, save it again/);
    // Its import holds a worker slot until its own deadline: let it end before the next test counts slots.
    expect((await finishedJob(previewer.technician, previewer.orgId, sent.job.id, 60_000)).state).toBe('failed');
  }, 60_000);
});

describe('previews of large files', () => {
  it('when a CSV is larger than a preview needs, then the preview reads only its start: a fault far down the file does not reach it', async () => {
    const rows = Array.from({ length: 16_000 }, (_, i) => `1,25,${i},${(i * 0.0001).toFixed(4)}`);
    const tooWideFarDown = `1,25,16000,1.6${','.repeat(300)}x`;
    const bytes = Buffer.from(`increment,stress_kpa,elapsed_min,deformation_mm,logger_note\n${rows.join('\n')}\n${tooWideFarDown}\n`);
    expect(bytes.length).toBeGreaterThan(256 * 1024);
    const sent = await upload(other, bytes, 'long.csv');
    const answer = await other.technician.get(`/api/orgs/${other.orgId}/uploads/${sent.upload.id}/preview`);
    expect(answer.body.message).toBeUndefined();
    const preview = answer.body as { rows: unknown[][] };
    expect(preview.rows).toHaveLength(20);
    expect(preview.rows[19]).toEqual(['1', '25', '19', '0.0019']);
    // The import reads the whole file, and finds the wide row.
    const job = await finishedJob(other.technician, other.orgId, sent.job.id, 60_000);
    expect(job.state).toBe('failed');
    expect(job.message).toMatch(/^The file has a value in column 304 of row 16002; a file of readings may be at most 256 columns wide/);
  }, 60_000);
});

describe('imports of several organisations', () => {
  it('when one organisation fills its slots with damaged files, then another organisation’s file is imported while they still run, the first’s next file waits its turn, and the damaged ones end failed with nothing written', async () => {
    const stuck = [];
    for (let i = 0; i < IMPORTS_PER_ORGANISATION; i += 1) stuck.push(await upload(slow, DAMAGED, `damaged-${i}.xlsx`));
    const waiting = await upload(slow, fixture('canonical.csv'), 'good-but-behind.csv');
    // Both damaged imports have started (and run to their deadline).
    for (const sent of stuck) {
      for (let polls = 0; (await jobState(slow, sent.job.id)).state !== 'running'; polls += 1) {
        expect(polls).toBeLessThan(400);
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
    }

    const good = await upload(other, fixture('canonical.csv'), 'readings.csv');
    const done = await finishedJob(other.technician, other.orgId, good.job.id, 60_000);
    expect(done.state).toBe('succeeded');
    expect(await readingCount(good.testId)).toBe(150);
    // The other organisation was served while the damaged files still held their slots.
    for (const sent of stuck) expect((await jobState(slow, sent.job.id)).state).toBe('running');
    // The third slot served the other organisation first (its first import ranks higher); once
    // free, it tries the waiting file, finds the organisation's slots full and puts it back, saying why.
    const why = `Waiting: your organisation already has ${IMPORTS_PER_ORGANISATION} imports running; this one starts when one of them ends.`;
    let queued = await jobState(slow, waiting.job.id);
    for (let polls = 0; queued.message !== why; polls += 1) {
      expect(polls, `the waiting import still says "${queued.message}"`).toBeLessThan(300);
      await new Promise((resolve) => setTimeout(resolve, 50));
      queued = await jobState(slow, waiting.job.id);
    }
    expect(queued.state).toBe('queued');
    for (const sent of stuck) expect((await jobState(slow, sent.job.id)).state).toBe('running');

    // Once a slot frees, the waiting file goes through under the same job the page follows.
    expect((await finishedJob(slow.technician, slow.orgId, waiting.job.id, 90_000)).state).toBe('succeeded');
    expect(await readingCount(waiting.testId)).toBe(150);
    for (const sent of stuck) {
      const ended = await finishedJob(slow.technician, slow.orgId, sent.job.id, 60_000);
      expect(ended.state).toBe('failed');
      expect(ended.message).toMatch(/^The file could not be read: reading it did not finish within \d+ s\. It may be damaged — open it in Excel or LibreOffice, save it again/);
      expect(((await slow.technician.get(`/api/orgs/${slow.orgId}/uploads/${sent.upload.id}`).expect(200)).body as Upload).status).toBe('failed');
      expect(await readingCount(sent.testId)).toBe(0);
    }
  }, 120_000);

  it('when an import is queued, then pg-boss gives it an expiry that follows the file size, not the 15-minute default', async () => {
    const sent = await upload(other, fixture('canonical.csv'), 'expiry.csv');
    await finishedJob(other.technician, other.orgId, sent.job.id, 60_000);
    const [row] = (await dataSource.query(
      `SELECT extract(epoch FROM b.expire_in)::int AS seconds FROM pgboss.job b JOIN job_runs r ON r.boss_job_id = b.id::text WHERE r.id = $1`,
      [sent.job.id],
    )) as Array<{ seconds: number }>;
    expect(row?.seconds).toBe(importExpirySeconds(sent.upload.sizeBytes));
    expect(row?.seconds).toBeLessThan(60);
  }, 60_000);
});
