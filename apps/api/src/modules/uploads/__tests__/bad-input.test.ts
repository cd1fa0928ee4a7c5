import type { Upload } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { finishedJob, readingCount, sendFile, startImportWorker, stopImportWorker, storedObjectCount, uploadAndWait, uploadRowCount } from '../../../testing/import-harness.js';
import { draftTest } from '../../../testing/lab-fixtures.js';
import { csv, fixture, workbook } from '../../readings-import/__tests__/import-test-files.js';

const app = createApp();
let worker: PgBoss;
let orgId: string;
let technician: Browser;
let technicianId: string;
/** A test that already holds the 150 canonical readings: a bad file must leave them as they are. */
let testId: string;
let goodUploadId: string;

beforeAll(async () => {
  worker = await startImportWorker();
  const admin = await signUpAdmin(app, 'bad-input-admin');
  orgId = admin.orgId;
  const tech = await createMember(orgId, 'technician', 'bad-input-tech');
  technicianId = tech.userId;
  technician = await signedInBrowser(app, tech.email);
  testId = (await draftTest(orgId, technicianId)).testId;
  goodUploadId = (await uploadAndWait(technician, orgId, testId, fixture('canonical.csv'), 'good.csv')).upload.id;
});

afterAll(async () => {
  await stopImportWorker(worker, [orgId]);
  await stopJobQueue();
});

async function readingsStillFromTheGoodFile(): Promise<void> {
  expect(await readingCount(testId)).toBe(150);
  const rows = (await dataSource.query('SELECT DISTINCT upload_id FROM readings WHERE test_id = $1', [testId])) as Array<{ upload_id: string }>;
  expect(rows.map((r) => r.upload_id)).toEqual([goodUploadId]);
}

describe('files refused on arrival: nothing is stored', () => {
  async function refused(bytes: Buffer, name: string, status: number): Promise<{ code: string; message: string }> {
    const uploadsBefore = await uploadRowCount(testId);
    const objectsBefore = await storedObjectCount(orgId, testId);
    const res = await sendFile(technician, orgId, testId, bytes, name);
    expect(res.status).toBe(status);
    expect(await uploadRowCount(testId)).toBe(uploadsBefore);
    expect(await storedObjectCount(orgId, testId)).toBe(objectsBefore);
    await readingsStillFromTheGoodFile();
    return res.body as { code: string; message: string };
  }

  it('when the file is empty, then 422 says so', async () => {
    const body = await refused(Buffer.alloc(0), 'empty.csv', 422);
    expect(body).toEqual({ code: 'invalid_file', message: 'The file is empty. Choose the file the logger wrote, or download a template to see the layout.' });
  });

  it('when a binary file is renamed to .csv, then 415 says by content that it is not CSV or XLSX', async () => {
    const binary = Buffer.concat([Buffer.from([0x13, 0x37, 0x00, 0xfe]), Buffer.alloc(2000, 0xab)]);
    const body = await refused(binary, 'readings.csv', 415);
    expect(body.message).toBe("The file holds binary data (a NUL byte at byte 3), so it is neither CSV text nor an XLSX workbook, whatever its name says. Choose the CSV or XLSX file with the readings.");
  });

  it('when a PDF is renamed to .xlsx, then 415 names it a PDF', async () => {
    const body = await refused(Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >>\n'), 'readings.xlsx', 415);
    expect(body.message).toContain("The file's content is a PDF document");
  });

  it('when the file is 50 MB (over the 40 MB limit), then 413 says the limit and nothing is stored', async () => {
    const big = Buffer.alloc(50 * 1024 * 1024, '1,25,1,0.1\n');
    big.write('increment,stress_kpa,elapsed_min,deformation_mm\n');
    const body = await refused(big, 'huge.csv', 413);
    expect(body).toEqual({
      code: 'payload_too_large',
      message: "The file is larger than 40 MB, the most one upload may be, so it was not stored. Split the readings into smaller files (or thin out the logger's fastest readings) and upload again.",
    });
  });

  it('when no file is attached, then 400 asks for one', async () => {
    const res = await technician.post(`/api/orgs/${orgId}/tests/${testId}/uploads`, {}).expect(400);
    expect(res.body.message).toContain('No file arrived');
  });
});

describe('files stored but rejected by the import: the job says why and the old readings stay', () => {
  async function rejected(bytes: Buffer, name: string): Promise<{ message: string; upload: Upload }> {
    const { upload, job } = await uploadAndWait(technician, orgId, testId, bytes, name);
    expect(job.state).toBe('failed');
    await readingsStillFromTheGoodFile();
    const stored = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}`).expect(200)).body as Upload;
    expect(stored.status).toBe('failed');
    expect(stored.failure?.message).toBe(job.message);
    return { message: job.message ?? '', upload: stored };
  }

  it('header only', async () => {
    expect((await rejected(csv(), 'header.csv')).message).toBe('The file has a header (row 1) but no readings below it. Add one row per reading, or download a template to see the layout.');
  });

  it('wrong delimiter (colons)', async () => {
    const bytes = Buffer.from('increment:stress_kpa:elapsed_min:deformation_mm\n1:25:0:0\n1:25:1:0.1\n');
    expect((await rejected(bytes, 'colons.csv')).message).toContain("found only one column ('increment:stress_kpa:elapsed_min:deformation_mm'): the file may use ':' between values");
  });

  it('text in a numeric column, with every rejected row listed', async () => {
    const { message, upload } = await rejected(csv('1,25,0,0', '1,25,one,0.1', '1,25,2,—'), 'text.csv');
    expect(message).toMatch(/^2 problems found, so nothing was imported\. The first — Row 3, column elapsed_min: 'one' is not a number/);
    expect(upload.failure?.issues.map((i) => [i.row, i.column])).toEqual([
      [3, 'elapsed_min'],
      [4, 'deformation_mm'],
    ]);
  });

  it('negative stress', async () => {
    expect((await rejected(csv('1,-25,0,0', '1,-25,1,0.1'), 'negative.csv')).message).toContain('Row 2, column stress_kpa: -25 kPa is negative; the applied stress must be above zero');
  });

  it('stress decreasing within an increment', async () => {
    expect((await rejected(csv('1,50,0,0', '1,50,1,0.1', '1,40,2,0.2'), 'decreasing.csv')).message).toContain('Row 4, column stress_kpa: 40 kPa differs from the 50 kPa of increment 1 (from row 2)');
  });

  it('time going backwards', async () => {
    expect((await rejected(csv('1,25,0,0', '1,25,8,0.1', '1,25,4,0.2'), 'backwards.csv')).message).toContain('Row 4, column elapsed_min: time goes backwards within increment 1: 4 after 8 at row 3');
  });

  it('an XLSX with a formula that has no saved result', async () => {
    const bytes = await workbook((sheet) => {
      sheet.addRow([1, 25, 0, 0]);
      sheet.addRow([1, 25, { formula: 'C2+1' }, 0.1]);
    });
    expect((await rejected(bytes, 'formulas.xlsx')).message).toContain("Sheet 'readings', cell C3 holds a formula (=C2+1) with no saved result");
  });

  it('an XLSX with merged cells', async () => {
    const bytes = await workbook((sheet) => {
      sheet.addRow([1, 25, 0, 0]);
      sheet.addRow([1, 25, 1, 0.1]);
      sheet.mergeCells('A2:A3');
    });
    expect((await rejected(bytes, 'merged.xlsx')).message).toContain("Sheet 'readings' has merged cells (A2:A3)");
  });

  it('more rows than the limit', async () => {
    // IMPORT_MAX_ROWS is 500,000; 500,001 short rows stay well under the size limit.
    const rows = Array.from({ length: 500_001 }, (_, i) => `1,25,${i},0`);
    const bytes = Buffer.from(`increment,stress_kpa,elapsed_min,deformation_mm\n${rows.join('\n')}\n`);
    expect((await rejected(bytes, 'long.csv')).message).toContain('more than 500,000 rows of readings, the most one upload may hold');
  });
});

describe('files imported with notes: nothing dropped or doubted in silence', () => {
  it('when a logger repeats a row and writes two readings at one time, then the repeat is dropped, the later reading kept, and both are listed on the upload and in the job', async () => {
    const { testId: fresh } = await draftTest(orgId, technicianId);
    const { upload, job } = await uploadAndWait(technician, orgId, fresh, csv('1,25,0,0', '1,25,1,0.1', '1,25,1,0.1', '1,25,2,0.2', '1,25,2,0.22', '2,50,0,0.3', '2,50,1,0.5'), 'repeats.csv');
    expect(job).toMatchObject({ state: 'succeeded' });
    expect(job.message).toBe('Imported 5 readings in 2 increments; the analysis is queued. 1 repeated row dropped; 1 reading at a repeated time replaced by the later one: see the notes on the upload.');
    const stored = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}`).expect(200)).body as Upload;
    expect(stored.noteCount).toBe(2);
    expect(stored.notes.map((note) => [note.kind, note.row])).toEqual([
      ['dropped', 4],
      ['replaced', 6],
    ]);
    const kept = (await dataSource.query('SELECT row_number, deformation_mm FROM readings WHERE test_id = $1 ORDER BY row_number', [fresh])) as Array<{ row_number: number; deformation_mm: number }>;
    expect(kept.map((row) => [row.row_number, row.deformation_mm])).toEqual([
      [2, 0],
      [3, 0.1],
      [6, 0.22],
      [7, 0.3],
      [8, 0.5],
    ]);
  });

  it('when the deformations are far too small for the specimen (inches read as 0.001 mm divisions), then the file is imported with a check that says what to look at', async () => {
    const { testId: fresh } = await draftTest(orgId, technicianId);
    const { upload } = await uploadAndWait(technician, orgId, fresh, Buffer.from('inc,p,t,dial\n1,25,0,0.5\n1,25,1,0.498\n1,25,2,0.496\n'), 'inches.csv');
    const mapping = {
      columns: { increment: 'inc', stress: 'p', elapsedTime: 't', deformation: 'dial' },
      units: { stress: 'kPa', time: 'min', deformation: 'mm' },
      deformationReading: { kind: 'dial', divisionSize: 0.001, increasesWithCompression: false },
    };
    const run = (await technician.post(`/api/orgs/${orgId}/uploads/${upload.id}/import`, { mapping }).expect(202)).body as { id: string };
    const job = await finishedJob(technician, orgId, run.id);
    expect(job.state).toBe('succeeded');
    const stored = (await technician.get(`/api/orgs/${orgId}/uploads/${upload.id}`).expect(200)).body as Upload;
    // 0.004 divisions of 0.001 mm = 0.000004 mm on the 20 mm specimen of the fixture: 0.00002 %.
    expect(stored.notes).toEqual([
      {
        kind: 'check',
        row: null,
        column: null,
        message: "The largest compression is 0.000004 mm, 0.00002 % of the specimen's 20 mm height — too little for a consolidation test. Check the gauge's division size and the deformation unit in the mapping (a reading in mm or inches taken as divisions gives this), then import again.",
      },
    ]);
  });
});
