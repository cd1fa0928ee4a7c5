import { createHash } from 'node:crypto';
import type { ImportProfile, JobRun, ReadingsPage, Upload, UploadPreview } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { binary, finishedJob, readingCount, sendFile, startImportWorker, stopImportWorker, uploadAndWait } from '../../../testing/import-harness.js';
import { draftTest, submittedTest } from '../../../testing/lab-fixtures.js';
import { storedObjectCount, uploadRowCount } from '../../../testing/import-harness.js';
import { importReadings } from '../../../jobs/import-readings.job.js';
import { jobRuns } from '../../job-runs/job-runs.service.js';
import { removeUploadObject } from '../upload-object.js';
import { UploadEntity } from '../upload.entity.js';
import { ConsolidationTestEntity } from '../../consolidation-tests/consolidation-test.entity.js';
import { LOGGER_MAPPING } from '../../readings-import/demo-files.js';
import { demoReadings } from '../../readings-import/demo-readings.js';
import { fixture } from '../../readings-import/__tests__/import-test-files.js';
import { loadIncrements, loadSpecimenValues } from '../../readings/readings.service.js';

const app = createApp();
let worker: PgBoss;
let orgId: string;
let technician: Browser;
let manager: Browser;
let designer: Browser;
let technicianId: string;
let outsider: Browser;

beforeAll(async () => {
  worker = await startImportWorker();
  const admin = await signUpAdmin(app, 'import-admin');
  orgId = admin.orgId;
  const tech = await createMember(orgId, 'technician', 'import-tech');
  technicianId = tech.userId;
  technician = await signedInBrowser(app, tech.email);
  manager = await signedInBrowser(app, (await createMember(orgId, 'lab_manager', 'import-manager')).email);
  designer = await signedInBrowser(app, (await createMember(orgId, 'designer', 'import-designer')).email);
  const other = await signUpAdmin(app, 'other-lab');
  outsider = await signedInBrowser(app, (await createMember(other.orgId, 'technician', 'other-tech')).email);
});

afterAll(async () => {
  await stopImportWorker(worker, [orgId]);
  await stopJobQueue();
});

async function testStatus(testId: string): Promise<string> {
  return (await dataSource.getRepository(ConsolidationTestEntity).findOneByOrFail({ id: testId })).status;
}

describe('uploading the canonical layout', () => {
  it('when a technician uploads the canonical CSV, then it is stored as sent, imported with no questions and the test has readings', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const bytes = fixture('canonical.csv');
    const { upload, job } = await uploadAndWait(technician, orgId, testId, bytes, 'Frame 2 – T1.csv');
    expect(upload).toMatchObject({ originalName: 'Frame 2 – T1.csv', sizeBytes: bytes.length, detectedType: 'csv', sha256: createHash('sha256').update(bytes).digest('hex') });
    expect(job).toMatchObject({ state: 'succeeded', progress: 1, message: 'Imported 150 readings in 10 increments; the analysis is queued.' });
    expect(job.result).toMatchObject({ importedReadings: 150, increments: 10 });
    expect(await readingCount(testId)).toBe(150);
    expect(await testStatus(testId)).toBe('readings_uploaded');

    const download = await manager.get(`/api/orgs/${orgId}/uploads/${upload.id}/download`).buffer(true).parse(binary).expect(200);
    expect(Buffer.compare(download.body as Buffer, bytes)).toBe(0);
    expect(download.headers['content-disposition']).toBe(`attachment; filename="Frame 2 _ T1.csv"; filename*=UTF-8''${encodeURIComponent('Frame 2 – T1.csv')}`);

    const list = (await manager.get(`/api/orgs/${orgId}/tests/${testId}/uploads`).expect(200)).body as Upload[];
    expect(list.map((u) => [u.id, u.status, u.readingCount])).toEqual([[upload.id, 'imported', 150]]);
  });

  it('when the readings are loaded for the analysis, then they come back as geo-core increments in test order', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    await uploadAndWait(technician, orgId, testId, fixture('canonical.csv'), 'readings.csv');
    const increments = await loadIncrements(orgId, testId);
    const demo = demoReadings();
    expect(increments.map((i) => i.stressKpa)).toEqual([12.5, 25, 50, 100, 200, 400, 800, 1600, 400, 100]);
    expect(increments[0]?.readings.slice(0, 2)).toEqual([
      { elapsedMin: demo[0]?.elapsedMin, deformationMm: demo[0]?.deformationMm },
      { elapsedMin: demo[1]?.elapsedMin, deformationMm: demo[1]?.deformationMm },
    ]);
    expect(await loadIncrements(orgId, (await draftTest(orgId, technicianId)).testId)).toEqual([]);
  });

  it('when the canonical XLSX carries a specimen sheet, then its key/values are kept with the readings', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const { job } = await uploadAndWait(technician, orgId, testId, fixture('canonical.xlsx'), 'T1.xlsx');
    expect(job.state).toBe('succeeded');
    expect(await loadSpecimenValues(orgId, testId)).toMatchObject({ initial_height_mm: 20, diameter_mm: 50, drainage: 'double' });
  });

  it('when the readings table pages through a test, then rows come in file order with their row numbers', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    await uploadAndWait(technician, orgId, testId, fixture('canonical.csv'), 'readings.csv');
    const page = (await manager.get(`/api/orgs/${orgId}/tests/${testId}/readings?offset=15&limit=2`).expect(200)).body as ReadingsPage;
    expect(page).toEqual({
      total: 150,
      offset: 15,
      limit: 2,
      readings: [
        { rowNumber: 17, incrementIndex: 2, stressKpa: 25, elapsedMin: 0, deformationMm: demoReadings()[15]?.deformationMm },
        { rowNumber: 18, incrementIndex: 2, stressKpa: 25, elapsedMin: 0.1, deformationMm: demoReadings()[16]?.deformationMm },
      ],
    });
  });
});

describe('replacing readings and retrying', () => {
  it('when a second file is imported into the same test, then it replaces the readings instead of adding to them', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    await uploadAndWait(technician, orgId, testId, fixture('canonical.csv'), 'first.csv');
    const short = Buffer.from('increment,stress_kpa,elapsed_min,deformation_mm\n1,25,0,0\n1,25,1,0.1\n');
    const { upload } = await uploadAndWait(technician, orgId, testId, short, 'second.csv');
    expect(await readingCount(testId)).toBe(2);
    const [row] = (await dataSource.query('SELECT DISTINCT upload_id FROM readings WHERE test_id = $1', [testId])) as Array<{ upload_id: string }>;
    expect(row?.upload_id).toBe(upload.id);
  });

  it('when the same import job runs twice (a pg-boss retry), then the test still has one set of readings', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const { upload } = await uploadAndWait(technician, orgId, testId, fixture('canonical.csv'), 'readings.csv');
    const again = (await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, { mapping: { columns: { increment: 'increment', stress: 'stress_kpa', elapsedTime: 'elapsed_min', deformation: 'deformation_mm' }, units: {} } }).expect(202)).body as JobRun;
    expect((await finishedJob(technician, orgId, again.id)).state).toBe('succeeded');
    expect(await readingCount(testId)).toBe(150);
  });
});

describe('a failure on our side', () => {
  it('when the stored file cannot be read (storage lost it), then the job fails saying so, is thrown for a pg-boss retry, and the readings stay', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const { upload } = await uploadAndWait(technician, orgId, testId, fixture('canonical.csv'), 'readings.csv');
    const row = await dataSource.getRepository(UploadEntity).findOneByOrFail({ id: upload.id });
    await removeUploadObject(row.objectKey);
    const run = await jobRuns.create({ organisationId: orgId, kind: 'import-readings', testId, uploadId: upload.id });
    await expect(importReadings({ orgId, testId, uploadId: upload.id, jobRunId: run.id, actorId: technicianId, sizeBytes: row.sizeBytes, mapping: null })).rejects.toThrow();
    const job = (await technician.get(`/api/orgs/${orgId}/jobs/${run.id}`).expect(200)).body as JobRun;
    expect(job).toMatchObject({ state: 'failed', message: 'The import stopped because of a problem on our side; no readings were changed. It is tried again; if it keeps failing, tell your administrator.' });
    expect((await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}`).expect(200)).body.status).toBe('failed');
    expect(await readingCount(testId)).toBe(150);
  });
});

describe('the mapping step and import profiles', () => {
  it('when a logger workbook has other columns, then the job asks for a mapping; the preview suggests one; importing with it gives the demo readings', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const { upload, job } = await uploadAndWait(technician, orgId, testId, fixture('bench-logger.xlsx'), 'logger.xlsx');
    expect(job).toMatchObject({ state: 'succeeded', result: { needsMapping: true } });
    expect(job.message).toContain('choose which column holds what');
    expect(await readingCount(testId)).toBe(0);

    const preview = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}/preview`).expect(200)).body as UploadPreview;
    expect(preview).toMatchObject({ layout: 'needs_mapping', detectedType: 'xlsx', columns: ['Stage', 'Load (kgf/cm2)', 'Time (s)', 'Dial (div)'] });
    expect(preview.rows[0]).toEqual([1, 0.127465, 0, 5000]);
    expect(preview.rows).toHaveLength(20);
    expect(preview.suggestedMapping?.columns).toEqual(LOGGER_MAPPING.columns);

    const imported = (await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, { mapping: LOGGER_MAPPING, saveAsProfile: 'Bench logger B' }).expect(202)).body as JobRun;
    expect((await finishedJob(technician, orgId, imported.id)).state).toBe('succeeded');
    const increments = await loadIncrements(orgId, testId);
    expect(increments).toHaveLength(10);
    expect(increments[3]?.stressKpa).toBeCloseTo(100, 3);
    const profiles = (await manager.get(`/api/orgs/${orgId}/import-profiles`).expect(200)).body as ImportProfile[];
    expect(profiles.map((p) => p.name)).toContain('Bench logger B');
  });

  it('when a saved profile is chosen for the CSV from the same logger, then it imports without mapping again', async () => {
    const profile = (await technician.post(`/api/orgs/${orgId}/import-profiles`, { name: 'Logger CSV', mapping: LOGGER_MAPPING }).expect(201)).body as ImportProfile;
    const { testId } = await draftTest(orgId, technicianId);
    const { upload } = await uploadAndWait(technician, orgId, testId, fixture('bench-logger.csv'), 'logger.csv');
    const job = (await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, { profileId: profile.id }).expect(202)).body as JobRun;
    expect((await finishedJob(technician, orgId, job.id)).state).toBe('succeeded');
    expect(await readingCount(testId)).toBe(150);
  });

  it('when a profile name is taken (in any case), then 409 names it', async () => {
    await technician.post(`/api/orgs/${orgId}/import-profiles`, { name: 'Frame 7', mapping: LOGGER_MAPPING }).expect(201);
    const res = await technician.post(`/api/orgs/${orgId}/import-profiles`, { name: 'frame 7', mapping: LOGGER_MAPPING }).expect(409);
    expect(res.body.message).toBe('An import profile named “frame 7” already exists in this organisation. Choose another name, or use the saved profile.');
  });
});

describe('templates', () => {
  it('when a technician downloads the templates, then both are the canonical layout with the demo numbers', async () => {
    const csvRes = await technician.get(`/api/orgs/${orgId}/templates/readings.csv`).expect(200);
    expect(csvRes.text.split('\n')[0]).toBe('increment,stress_kpa,elapsed_min,deformation_mm');
    expect(csvRes.text).toBe(fixture('canonical.csv').toString('utf8'));
    const xlsxRes = await technician.get(`/api/orgs/${orgId}/templates/readings.xlsx`).buffer(true).parse(binary).expect(200);
    const { testId } = await draftTest(orgId, technicianId);
    const { job } = await uploadAndWait(technician, orgId, testId, xlsxRes.body as Buffer, 'template.xlsx');
    expect(job.result).toMatchObject({ importedReadings: 150 });
  });
});

describe('a test with the lab manager', () => {
  it('when the test is submitted for review, then a new upload is refused with 409 and nothing is stored', async () => {
    const { testId } = await submittedTest(orgId, technicianId);
    const uploads = await uploadRowCount(testId);
    const objects = await storedObjectCount(orgId, testId);
    const res = await sendFile(technician, orgId, testId, fixture('canonical.csv'), 'late.csv');
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('This test is with the lab manager for review, so its readings cannot be replaced now. Wait for the review.');
    expect(await uploadRowCount(testId)).toBe(uploads);
    expect(await storedObjectCount(orgId, testId)).toBe(objects);
  });
});

describe('who may do what', () => {
  it('when a lab manager or a designer tries to upload, then 403; a designer may not list or download raw uploads', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    expect((await sendFile(manager, orgId, testId, fixture('canonical.csv'), 'r.csv')).status).toBe(403);
    const { upload } = await uploadAndWait(technician, orgId, testId, fixture('canonical.csv'), 'r.csv');
    await designer.get(`/api/orgs/${orgId}/tests/${testId}/uploads`).expect(403);
    await designer.get(`/api/orgs/${orgId}/uploads/${upload.id}/download`).expect(403);
  });

  it('when a technician of another organisation asks for this test’s uploads, readings or a download, then 404', async () => {
    const { testId } = await draftTest(orgId, technicianId);
    const { upload } = await uploadAndWait(technician, orgId, testId, fixture('canonical.csv'), 'r.csv');
    const otherOrg = (await outsider.get('/api/auth/session').expect(200)).body.memberships[0].organisationId as string;
    // Through their own organisation's path: the ids are not found there.
    await outsider.get(`/api/orgs/${otherOrg}/tests/${testId}/uploads`).expect(404);
    await outsider.get(`/api/orgs/${otherOrg}/uploads/${upload.id}/download`).expect(404);
    await outsider.get(`/api/orgs/${otherOrg}/uploads/${upload.id}/preview`).expect(404);
    await outsider.get(`/api/orgs/${otherOrg}/tests/${testId}/readings`).expect(404);
    await outsider.post(`/api/orgs/${otherOrg}/uploads/${upload.id}/import`, { mapping: LOGGER_MAPPING }).expect(404);
    expect((await sendFile(outsider, otherOrg, testId, fixture('canonical.csv'), 'r.csv')).status).toBe(404);
    // Through this organisation's path: not a member.
    await outsider.get(`/api/orgs/${orgId}/uploads/${upload.id}/download`).expect(404);
  });
});
