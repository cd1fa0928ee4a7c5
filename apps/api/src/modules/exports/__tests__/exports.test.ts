import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { stopJobQueue } from '../../../jobs/boss.js';
import { runAnalysis } from '../../analyses/analyses.service.js';
import { approveTest, submitTest } from '../../reviews/reviews.service.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { download } from '../../../testing/downloads.js';
import { KNOWN_TEST, submittedTest, type LabFixture } from '../../../testing/lab-fixtures.js';

const app = createApp();

async function workbookFrom(bytes: Buffer): Promise<ExcelJS.Workbook> {
  const workbook = new ExcelJS.Workbook();
  await workbook.xlsx.load(bytes as unknown as ArrayBuffer);
  return workbook;
}

/** The sheet's rows as objects keyed by the header row's texts. */
function rowsOf(sheet: ExcelJS.Worksheet): Array<Record<string, ExcelJS.CellValue>> {
  const headers = (sheet.getRow(1).values as ExcelJS.CellValue[]).map(String);
  const rows: Array<Record<string, ExcelJS.CellValue>> = [];
  sheet.eachRow((row, number) => {
    if (number === 1) return;
    rows.push(Object.fromEntries(headers.map((h, i) => [h, row.getCell(i).value]).filter(([h]) => h !== 'undefined')));
  });
  return rows;
}

describe('XLSX exports of approved parameters and reduced data', () => {
  let orgId: string;
  let manager: Browser;
  let designerOnProject: Browser;
  let designerElsewhere: Browser;
  let clientOnProject: Browser;
  let fixture: LabFixture;
  let recordId: string;
  const formulaName = '=HYPERLINK("http://example.invalid","open me")';

  beforeAll(async () => {
    const admin = await signUpAdmin(app, 'export-admin');
    orgId = admin.orgId;
    const t = await createMember(orgId, 'technician', 'export-tech');
    const m = await createMember(orgId, 'lab_manager', 'export-manager');
    const d1 = await createMember(orgId, 'designer', 'export-designer-on');
    const d2 = await createMember(orgId, 'designer', 'export-designer-off');
    const c = await createMember(orgId, 'client', 'export-client');
    manager = await signedInBrowser(app, m.email);
    designerOnProject = await signedInBrowser(app, d1.email);
    designerElsewhere = await signedInBrowser(app, d2.email);
    clientOnProject = await signedInBrowser(app, c.email);
    fixture = await submittedTest(orgId, t.userId, { designerIds: [d1.userId] });
    // The client is on the project as sharing puts them there (a project_members row).
    await dataSource.query(`INSERT INTO project_members (organisation_id, project_id, user_id, role) VALUES ($1, $2, $3, 'client')`, [orgId, fixture.projectId, c.userId]);
    await manager.patch(`/api/orgs/${orgId}/projects/${fixture.projectId}`, { name: formulaName, clientName: '+44 client line' }).expect(200);
    await dataSource.query(`UPDATE samples SET description = '@grey clay, -soft' WHERE id = $1`, [fixture.sampleId]);
    const approver = { id: m.userId, name: 'Export manager' };
    recordId = (await approveTest(orgId, fixture.testId, approver, null)).recordId;
    // A second version: the approved test re-analysed, submitted and approved again.
    await runAnalysis(orgId, fixture.testId, t.userId);
    await submitTest(orgId, fixture.testId, { id: t.userId });
    await approveTest(orgId, fixture.testId, approver, 'Second look.');
  });

  afterAll(async () => {
    await stopJobQueue();
  });

  it('when a lab manager exports the project, then there is one row per approved version with its version id and source test, and formula-looking text is written as text', async () => {
    const file = await download(manager, `/api/orgs/${orgId}/projects/${fixture.projectId}/parameters.xlsx`);
    expect(file.headers['content-type']).toBe('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet');
    const workbook = await workbookFrom(file.bytes);
    const rows = rowsOf(workbook.getWorksheet('Approved parameters') as ExcelJS.Worksheet);
    const versions = (await dataSource.query('SELECT id, version FROM soil_record_versions WHERE record_id = $1 ORDER BY version DESC', [recordId])) as Array<{ id: string; version: number }>;
    expect(rows.map((r) => [r['Version'], r['Version id'], r['Status']])).toEqual([
      [2, versions[0]?.id, 'current'],
      [1, versions[1]?.id, 'superseded by version 2'],
    ]);
    const test = (await manager.get(`/api/orgs/${orgId}/tests/${fixture.testId}`).expect(200)).body as { reference: string };
    expect(rows.every((r) => r['Source test'] === test.reference && r['Source test id'] === fixture.testId && r['Soil record id'] === recordId)).toBe(true);
    // The known soil's Cc is 0.42 (lab-fixtures: generateSyntheticConsolidationTest input); the reduction recovers it within 0.01.
    expect(Number(rows[0]?.['Cc (–)'])).toBeCloseTo(KNOWN_TEST.parameters.compressionIndex, 2);

    const sheet = workbook.getWorksheet('Approved parameters') as ExcelJS.Worksheet;
    const description = sheet.getRow(2).getCell(5);
    expect(description.value).toBe('@grey clay, -soft');
    expect(description.type).toBe(ExcelJS.ValueType.String);
    expect(description.numFmt).toBe('@');
    const about = workbook.getWorksheet('About') as ExcelJS.Worksheet;
    const project = about.getRow(2).getCell(2);
    expect(project.value).toBe(`${formulaName} (${(await manager.get(`/api/orgs/${orgId}/projects/${fixture.projectId}`)).body.reference})`);
    expect(project.type).toBe(ExcelJS.ValueType.String);
    expect(project.formula).toBeUndefined();
    expect(project.numFmt).toBe('@');
    const client = about.getRow(3).getCell(2);
    expect([client.value, client.type, client.numFmt]).toEqual(['+44 client line', ExcelJS.ValueType.String, '@']);
  });

  it('when a version’s reduced data is exported, then it holds every increment, each time curve’s results and the parameters, as numbers', async () => {
    const file = await download(clientOnProject, `/api/orgs/${orgId}/soil-records/${recordId}/versions/1/data.xlsx`);
    expect(file.headers['content-disposition']).toMatch(/filename="reduced-data-T-.+-v1\.xlsx"/);
    const workbook = await workbookFrom(file.bytes);
    const analysis = (await manager.get(`/api/orgs/${orgId}/tests/${fixture.testId}/analysis`).expect(200)).body as { result: { increments: Array<{ cvTaylorM2PerYr: number | null; stressKpa: number }> } };
    const increments = rowsOf(workbook.getWorksheet('Increments') as ExcelJS.Worksheet);
    expect(increments.map((r) => r['σ′ (kPa)'])).toEqual(KNOWN_TEST.parameters.stressesKpa);
    expect(increments[3]?.['cv Taylor (m²/yr)']).toBe(analysis.result.increments[3]?.cvTaylorM2PerYr);
    const curves = rowsOf(workbook.getWorksheet('Time curves') as ExcelJS.Worksheet);
    expect(curves).toHaveLength(KNOWN_TEST.parameters.stressesKpa.length);
    expect(typeof curves[0]?.['Taylor t90 (min)']).toBe('number');
    const facts = workbook.getWorksheet('Test') as ExcelJS.Worksheet;
    const byLabel = new Map<string, ExcelJS.CellValue>();
    facts.eachRow((row) => byLabel.set(String(row.getCell(1).value), row.getCell(2).value));
    // The approver's name as stored for the user (createMember names users "Test <label>").
    expect(byLabel.get('Approval')).toBe('Version 1, approved by Test export-manager');
    expect(byLabel.get('Description')).toBe('@grey clay, -soft');
    expect(typeof byLabel.get('σ′p adopted (kPa)')).toBe('number');
  });

  it('when lab staff export a test’s current analysis, then it says it is not an approved version', async () => {
    const workbook = await workbookFrom((await download(manager, `/api/orgs/${orgId}/tests/${fixture.testId}/data.xlsx`)).bytes);
    const facts = workbook.getWorksheet('Test') as ExcelJS.Worksheet;
    expect(String(facts.getRow(12).getCell(2).value)).toMatch(/^Not an approved version/);
  });

  it('when designers and clients ask, then only those on the project get its exports; clients never get a test’s working export; other projects and organisations answer 404', async () => {
    const paths = [`/projects/${fixture.projectId}/parameters.xlsx`, `/soil-records/${recordId}/versions/2/data.xlsx`, `/tests/${fixture.testId}/data.xlsx`];
    for (const path of paths) await download(designerOnProject, `/api/orgs/${orgId}${path}`, 200);
    for (const path of paths) await download(designerElsewhere, `/api/orgs/${orgId}${path}`, 404);
    await download(clientOnProject, `/api/orgs/${orgId}${paths[0]}`, 200);
    await download(clientOnProject, `/api/orgs/${orgId}${paths[2]}`, 403);
    await download(manager, `/api/orgs/${orgId}/soil-records/${recordId}/versions/3/data.xlsx`, 404);
    const other = await signUpAdmin(app, 'export-other');
    for (const path of paths) await download(other.browser, `/api/orgs/${other.orgId}${path}`, 404);
  });
});
