import type { ConsolidationTestResult } from '@porestack/geo-core';
import type { Analysis, ImportMapping, ImportTrial, JobRun, Upload, UploadPreview } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { finishedJob, startImportWorker, stopImportWorker, uploadAndWait } from '../../../testing/import-harness.js';
import { draftTest } from '../../../testing/lab-fixtures.js';
import { ITALIAN_REPEATED, ITALIAN_REREAD, LOGGER_LAYOUTS, SWELLING_FIRST_CSV, type LoggerLayout } from '../../../testing/logger-layouts/index.js';
import { layoutReadings } from '../../../testing/logger-layouts/layout-values.js';

// Every layout of the generator, imported through the API as a technician would: upload, take
// the mapping the preview suggests, type in only the specimen, import; the analysis must give
// back the e0 and Cc the synthetic clay was made with (within 1 %, the issue's bound; measured
// 0.001–0.05 % when written, see the layout files).
const app = createApp();
let worker: PgBoss;
let orgId: string;
let technician: Browser;
let technicianId: string;

beforeAll(async () => {
  worker = await startImportWorker();
  const admin = await signUpAdmin(app, 'layouts-admin');
  orgId = admin.orgId;
  const tech = await createMember(orgId, 'technician', 'layouts-tech');
  technicianId = tech.userId;
  technician = await signedInBrowser(app, tech.email);
});

afterAll(async () => {
  await stopImportWorker(worker, [orgId]);
  await stopJobQueue();
});

const relativeError = (got: number | null | undefined, expected: number): number => Math.abs((got ?? Number.POSITIVE_INFINITY) / expected - 1);

/** A draft test whose specimen is typed in through the test's form route, and the layout's file uploaded. */
async function uploaded(layout: LoggerLayout): Promise<{ testId: string; upload: Upload; job: JobRun }> {
  const { testId } = await draftTest(orgId, technicianId);
  await technician.patch(`/api/orgs/${orgId}/tests/${testId}`, { specimen: layout.specimen }).expect(200);
  const { upload, job } = await uploadAndWait(technician, orgId, testId, await layout.bytes(), layout.fileName);
  return { testId, upload, job };
}

/** Imports with a mapping and waits for the import and the analysis it queues. */
async function importWith(uploadId: string, mapping: ImportMapping): Promise<{ imported: JobRun; analysed: JobRun }> {
  const run = (await technician.post(`/api/orgs/${orgId}/uploads/${uploadId}/import`, { mapping }).expect(202)).body as JobRun;
  const imported = await finishedJob(technician, orgId, run.id, 60_000);
  const analysisJobId = imported.result?.['analysisJobId'];
  if (typeof analysisJobId !== 'string') throw new Error(`the import did not queue an analysis: ${imported.state} — ${imported.message}`);
  return { imported, analysed: await finishedJob(technician, orgId, analysisJobId, 60_000) };
}

async function analysisOf(testId: string): Promise<ConsolidationTestResult> {
  const analysis = (await technician.get(`/api/orgs/${orgId}/tests/${testId}/analysis`).expect(200)).body as Analysis;
  return analysis.result as unknown as ConsolidationTestResult;
}

describe('every logger layout, imported with the guessed mapping and only the specimen typed in', () => {
  for (const layout of LOGGER_LAYOUTS) {
    it(`${layout.fileName} (${layout.traits}): the guess is the technician's mapping with nothing left open, and e0 and Cc come back within 1 %`, async () => {
      const { testId, upload, job } = await uploaded(layout);
      expect(job.result).toMatchObject({ needsMapping: true });
      const preview = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}/preview`).expect(200)).body as UploadPreview;
      expect(preview.suggestion.source).toBe('guess');
      expect(preview.suggestion.open).toEqual([]);
      expect(preview.suggestion.mapping).toEqual(layout.mapping);
      const { imported, analysed } = await importWith(upload.id, preview.suggestion.mapping as ImportMapping);
      expect(imported.state).toBe('succeeded');
      expect(analysed.state).toBe('succeeded');
      const result = await analysisOf(testId);
      expect(relativeError(result.initialVoidRatio, layout.truth.initialVoidRatio)).toBeLessThan(0.01);
      expect(relativeError(result.compressionIndex, layout.truth.compressionIndex)).toBeLessThan(0.01);
      expect(result.increments).toHaveLength(layout.truth.increments.length);
    });
  }

  it('registratore-ripetizioni.csv: the three rows written twice are dropped and the two times read twice keep the later reading, all listed on the upload', async () => {
    const layout = LOGGER_LAYOUTS.find((candidate) => candidate.fileName === 'registratore-ripetizioni.csv') as LoggerLayout;
    const { upload } = await uploaded(layout);
    const preview = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}/preview`).expect(200)).body as UploadPreview;
    const { imported } = await importWith(upload.id, preview.suggestion.mapping as ImportMapping);
    expect(imported.message).toContain('3 repeated rows dropped; 2 readings at a repeated time replaced by the later one');
    const stored = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}`).expect(200)).body as Upload;
    expect(stored.notes.filter((note) => note.kind === 'dropped')).toHaveLength(ITALIAN_REPEATED.length);
    expect(stored.notes.filter((note) => note.kind === 'replaced')).toHaveLength(ITALIAN_REREAD.length);
    expect(stored.readingCount).toBe(layoutReadings(layout.truth).length);
  });
});

describe('a layout with one wrong guess, corrected without uploading again', () => {
  it('swelling-first-load.csv: the gauge direction guessed from a swelling first increment is wrong; the import says the readings look reversed; one setting changed on the stored file gives e0 and Cc within 1 %', async () => {
    const layout = SWELLING_FIRST_CSV;
    const { testId, upload } = await uploaded(layout);
    const preview = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}/preview`).expect(200)).body as UploadPreview;
    const guessed = preview.suggestion.mapping as ImportMapping;
    expect(preview.suggestion.open).toEqual([]);
    // The one wrong guess: everything else is the technician's mapping.
    expect(guessed).toEqual({ ...layout.mapping, deformationReading: { kind: 'dial', divisionSize: 1, increasesWithCompression: true } });
    expect(preview.suggestion.reasons.dialDirection).toContain('The reading rises from the first rows to the last rows read');

    const wrong = await importWith(upload.id, guessed);
    expect(wrong.imported.state).toBe('succeeded');
    const doubted = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}`).expect(200)).body as Upload;
    expect(doubted.notes[0]).toMatchObject({ kind: 'check' });
    expect(doubted.notes[0]?.message).toContain("the gauge's direction is likely the wrong way round");

    const corrected: ImportMapping = { ...guessed, deformationReading: { kind: 'dial', divisionSize: 1, increasesWithCompression: false } };
    const right = await importWith(upload.id, corrected);
    expect(right.imported.state).toBe('succeeded');
    expect(right.analysed.state).toBe('succeeded');
    const stored = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}`).expect(200)).body as Upload;
    expect(stored.notes).toEqual([]);
    const uploads = (await technician.get(`/api/orgs/${orgId}/tests/${testId}/uploads`).expect(200)).body as Upload[];
    expect(uploads).toHaveLength(1);
    const result = await analysisOf(testId);
    expect(relativeError(result.initialVoidRatio, layout.truth.initialVoidRatio)).toBeLessThan(0.01);
    expect(relativeError(result.compressionIndex, layout.truth.compressionIndex)).toBeLessThan(0.01);
  });
});

describe('the trial of a mapping before import', () => {
  it('inch-dial-falling.csv: the first increment shows each dial reading beside the deformation it imports as; with the 0.001 division the deformations are a thousandth of the truth', async () => {
    const layout = LOGGER_LAYOUTS.find((candidate) => candidate.fileName === 'inch-dial-falling.csv') as LoggerLayout;
    const { upload } = await uploaded(layout);
    const trial = (await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/trial`, { mapping: layout.mapping }).expect(200)).body as ImportTrial;
    const truth = layout.truth.increments[0];
    expect(trial.issues).toEqual([]);
    expect(trial.increment).toMatchObject({ index: 1, sheet: null });
    expect(trial.increment?.stressKpa).toBeCloseTo(12.5, 3);
    expect(trial.increment?.readings).toHaveLength(truth?.readings.length ?? -1);
    trial.increment?.readings.forEach((reading, i) => {
      // Written to 0.00001 in (0.000254 mm): the reading and the zero (the first reading) are each
      // off by at most half of that.
      expect(Math.abs(reading.deformationMm - ((truth?.readings[i]?.deformationMm ?? 0) - (truth?.readings[0]?.deformationMm ?? 0)))).toBeLessThanOrEqual(0.000254 + 1e-12);
    });
    expect(trial.increment?.readings[1]).toMatchObject({ rowNumber: 3, time: expect.any(String), deformation: expect.stringMatching(/^0\.4\d{4}$/) });
    const divisions = (await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/trial`, { mapping: { ...layout.mapping, deformationReading: { kind: 'dial', divisionSize: 0.001, increasesWithCompression: false } } }).expect(200)).body as ImportTrial;
    const last = (trial.increment?.readings.length ?? 1) - 1;
    expect(divisions.increment?.readings[last]?.deformationMm).toBeCloseTo((trial.increment?.readings[last]?.deformationMm ?? 0) / 1000, 9);
  });

  it('when the mapping names a column the file lacks, the trial answers with the problem, and a body with a wrong field is refused naming it', async () => {
    const layout = LOGGER_LAYOUTS[0] as LoggerLayout;
    const { upload } = await uploaded(layout);
    const trial = (await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/trial`, { mapping: { ...layout.mapping, columns: { ...layout.mapping.columns, elapsedTime: 'Clock' } } }).expect(200)).body as ImportTrial;
    expect(trial.increment).toBeNull();
    expect(trial.issues[0]?.message).toContain("No column named 'Clock'");
    const refused = await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/trial`, { mapping: { ...layout.mapping, time: { format: 'clock' } } }).expect(400);
    expect(refused.body.issues).toEqual([expect.objectContaining({ path: 'mapping.time.format' })]);
  });
});

describe('what the import says when something is wrong', () => {
  it('a wrong import body is refused naming each wrong field, not "Invalid input" at the top', async () => {
    const layout = LOGGER_LAYOUTS[1] as LoggerLayout;
    const { upload } = await uploaded(layout);
    const neither = await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, {}).expect(400);
    expect(neither.body.issues).toEqual([{ path: 'mapping', message: 'send either a mapping or the profileId of a saved import profile (one of the two)' }]);
    const blank = await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, { mapping: { ...layout.mapping, columns: { ...layout.mapping.columns, stress: ' ' }, deformationReading: { kind: 'dial', divisionSize: -1 } } }).expect(400);
    expect(blank.body.issues.map((issue: { path: string }) => issue.path).sort()).toEqual(['mapping.columns.stress', 'mapping.deformationReading.divisionSize', 'mapping.deformationReading.increasesWithCompression']);
    const profile = await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, { profileId: 'frame 7' }).expect(400);
    expect(profile.body.issues).toEqual([{ path: 'profileId', message: 'choose a saved import profile' }]);
    const row = await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}/preview?headerRow=0`).expect(400);
    expect(row.body.issues).toEqual([{ path: 'headerRow', message: 'headerRow counts from 1 (the first row).' }]);
  });

  it('a second import of a file while the first is still queued is refused with 409; the first goes on', async () => {
    const layout = LOGGER_LAYOUTS[2] as LoggerLayout;
    const { upload } = await uploaded(layout);
    const first = (await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, { mapping: layout.mapping }).expect(202)).body as JobRun;
    const second = await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, { mapping: layout.mapping }).expect(409);
    expect(second.body.message).toBe('This file is being read now. Wait until its import ends (the page follows it), then change the mapping if you need to.');
    expect((await finishedJob(technician, orgId, first.id, 60_000)).state).toBe('succeeded');
  });

  it('a gauge of 0.01 mm divisions taken as mm makes the analysis refuse in plain words, naming the increment and what to check', async () => {
    const layout = LOGGER_LAYOUTS.find((candidate) => candidate.fileName === 'celdas-de-tiempo.xlsx') as LoggerLayout;
    const { upload } = await uploaded(layout);
    const { analysed } = await importWith(upload.id, { ...layout.mapping, deformationReading: { kind: 'dial', divisionSize: 1, increasesWithCompression: true } });
    expect(analysed.state).toBe('failed');
    expect(analysed.message).toMatch(/^The analysis could not run on these data\. Increment \d+ \([\d.]+ kPa\) compresses the specimen by [\d.]+ mm, which would leave it thinner than its solids alone \([\d.]+ mm of its 19 mm\)\. The deformations are likely read too large: check the gauge's division size and unit in the import mapping/);
  });

  it('the same file uploaded to a second test is flagged with the test that already holds it', async () => {
    const layout = LOGGER_LAYOUTS[4] as LoggerLayout;
    const first = await uploaded(layout);
    const second = await uploaded(layout);
    const reference = ((await technician.get(`/api/orgs/${orgId}/tests/${first.testId}`).expect(200)).body as { reference: string }).reference;
    // Other tests of this organisation hold the layout too (the tests above): these two must be among them.
    expect(second.upload.sameFileIn).toEqual(expect.arrayContaining([expect.objectContaining({ testId: first.testId, testReference: reference, uploadId: first.upload.id, originalName: layout.fileName })]));
    expect(second.upload.sameFileIn.map((same) => same.testId)).not.toContain(second.testId);
    const listed = (await technician.get(`/api/orgs/${orgId}/tests/${first.testId}/uploads`).expect(200)).body as Upload[];
    expect(listed[0]?.sameFileIn.map((same) => same.testId)).toContain(second.testId);
    const unique = await uploaded({ ...layout, bytes: async () => Buffer.concat([Buffer.from(`Essai ${second.testId}\n`), await layout.bytes()]) });
    expect(unique.upload.sameFileIn).toEqual([]);
  });
});
