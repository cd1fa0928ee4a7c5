import { createHash } from 'node:crypto';
import { writeFile } from 'node:fs/promises';
import type { CheckRevision, GroundModelCreate, IssuedCheck, ProjectDetail } from '@porestack/types';
import type PgBoss from 'pg-boss';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { dataSource } from '../../../data-source.js';
import { createBoss, stopJobQueue } from '../../../jobs/boss.js';
import { GENERATE_REPORT_QUEUE } from '../../../jobs/generate-report-queue.js';
import { generateReportJob } from '../../../jobs/generate-report.job.js';
import { registerJobs } from '../../../jobs/register-jobs.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { approvedRecord } from '../../../testing/design-lab-fixtures.js';
import { createCheck, createGroundModel, designWorld, runAndRead, type DesignWorld } from '../../../testing/design-fixtures.js';
import { download } from '../../../testing/downloads.js';
import { placeOnProject } from '../../../testing/lab-fixtures.js';
import { pdfImageCount, pdfInfo, pdfText } from '../../../testing/pdf-reader.js';

const app = createApp();

/** Printing takes seconds, longer on a busy machine. */
const PRINTING_MS = 120_000;

/** Millimetres to one decimal, written out here rather than imported from the report's formatter. */
const mm = (metres: number) => (metres * 1000).toFixed(1);

async function settled(browser: Browser, url: string): Promise<IssuedCheck> {
  const deadline = Date.now() + 100_000;
  for (;;) {
    const issued = (await browser.get(url).expect(200)).body as IssuedCheck;
    if (issued.report.state === 'ready' || issued.report.state === 'failed') return issued;
    if (Date.now() > deadline) throw new Error(`report still ${issued.report.state} after 100 s`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

describe('the PDF summary of an issued settlement check revision', () => {
  let boss: PgBoss;
  let world: DesignWorld;
  let checkPath: string;
  let stored: CheckRevision;
  let client: Browser;
  let testReference: string;
  let issued: IssuedCheck;
  let pdf: Buffer;

  beforeAll(async () => {
    boss = createBoss();
    boss.on('error', () => undefined);
    await boss.start();
    await boss.createQueue(GENERATE_REPORT_QUEUE);
    // Other files approve tests without working this queue; their backlog would delay this file's reports.
    await boss.purgeQueue(GENERATE_REPORT_QUEUE);
    await registerJobs(boss, [generateReportJob()]);

    world = await designWorld(app, 'check-report');
    const lab = {
      orgId: world.orgId,
      technicianId: (await createMember(world.orgId, 'technician', 'check-report-tech')).userId,
      managerId: (await createMember(world.orgId, 'lab_manager', 'check-report-manager')).userId,
    };
    const record = await approvedRecord(lab, world.projectId, { borehole: 'BH-R', topDepthM: 3, soil: {} });
    const [testRow] = (await dataSource.query('SELECT reference FROM consolidation_tests WHERE id = $1', [record.testId])) as Array<{ reference: string }>;
    testReference = testRow!.reference;
    const model: GroundModelCreate = {
      name: 'Riverside terrace model',
      waterTableDepthM: 1,
      layers: [
        { name: 'made ground', kind: 'granular', thicknessM: 1, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19, elasticModulusKpa: 15000, poissonRatio: 0.3 },
        { name: 'upper clay', kind: 'compressible', thicknessM: 4, unitWeightKnPerM3: 17.5, saturatedUnitWeightKnPerM3: 17.5, source: { kind: 'record', recordId: record.recordId, versionId: record.versionId } },
        {
          name: 'lower clay',
          kind: 'compressible',
          thicknessM: 5,
          unitWeightKnPerM3: 18,
          saturatedUnitWeightKnPerM3: 18,
          source: { kind: 'hand' },
          parameters: { e0: 0.95, cc: 0.32, recompressionIndex: 0.05, ocr: 1.5, cvM2PerYr: 2.4, cAlpha: 0.006 },
        },
      ],
    };
    const groundModel = await createGroundModel(world, model);
    // F2 carries five times F1's load four metres away: the pair's distortion is well over 1/500.
    const check = await createCheck(world, {
      name: 'Boathouse bases',
      groundModelId: groundModel.id,
      footings: [
        { id: 'F1', shape: 'square', widthM: 2, depthM: 1, load: 300, xM: 0, yM: 0 },
        { id: 'F2', shape: 'square', widthM: 2.5, depthM: 1, load: 1500, xM: 4, yM: 0 },
        { id: 'F3', shape: 'rectangle', widthM: 2, lengthM: 3, depthM: 1, load: 700, xM: 10, yM: 0 },
        { id: 'C1', shape: 'circle', widthM: 1.8, depthM: 1.2, load: 450, xM: 4, yM: 6 },
      ],
    });
    checkPath = `${world.base}/settlement-checks/${check.id}`;
    stored = await runAndRead(world, check.id);
    const c = await createMember(world.orgId, 'client', 'check-report-client');
    await placeOnProject(world.orgId, world.projectId, c.userId, 'client');
    client = await signedInBrowser(app, c.email);
  }, PRINTING_MS);

  afterAll(async () => {
    await boss.stop({ graceful: true, wait: true });
    await stopJobQueue();
  });

  it('when the designer issues revision 1, then one report is queued for it and printed once', async () => {
    const res = await world.designer.post(`${checkPath}/revisions/1/issue`, {});
    expect(res.status).toBe(202);
    const answer = res.body as IssuedCheck;
    expect(answer).toMatchObject({ checkName: 'Boathouse bases', revision: 1, revisionId: stored.id, issuedBy: { id: world.designerId } });
    expect(['queued', 'running', 'ready']).toContain(answer.report.state);
    issued = await settled(world.designer, `${checkPath}/revisions/1/report`);
    expect(issued.report.state).toBe('ready');
    expect(issued.report.sha256).toMatch(/^[0-9a-f]{64}$/);
    const rows = (await dataSource.query(`SELECT id FROM issued_reports WHERE kind = 'settlement-check' AND subject_id = $1`, [stored.id])) as unknown[];
    expect(rows).toHaveLength(1);
  }, PRINTING_MS);

  it('when the designer issues the same revision again, then 409 saying it was issued, and still one report', async () => {
    const res = await world.designer.post(`${checkPath}/revisions/1/issue`, {});
    expect(res.status).toBe(409);
    expect(res.body.message).toMatch(/Revision 1 of this check was issued on .*not issued again/);
    const rows = (await dataSource.query(`SELECT id FROM issued_reports WHERE kind = 'settlement-check' AND subject_id = $1`, [stored.id])) as unknown[];
    expect(rows).toHaveLength(1);
  });

  it('when the designer and a client of the project download it twice, then both get the same stored file (same SHA-256)', async () => {
    const first = await download(world.designer, `${checkPath}/revisions/1/report/pdf`);
    const second = await download(client, `${checkPath}/revisions/1/report/pdf`);
    const hash = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');
    expect(hash(first.bytes)).toBe(issued.report.sha256);
    expect(hash(second.bytes)).toBe(issued.report.sha256);
    expect(first.headers['x-content-sha256']).toBe(issued.report.sha256);
    expect(first.headers['content-disposition']).toMatch(/settlement-check-.*Boathouse_bases-r1\.pdf/);
    pdf = first.bytes;
    // To look at the pages: CHECK_REPORT_PDF=/tmp/check.pdf, then pdftoppm.
    if (process.env['CHECK_REPORT_PDF']) await writeFile(process.env['CHECK_REPORT_PDF'], pdf);
  });

  it('when the PDF is read back, then it holds the stored run’s numbers, sources, people, limits, page numbers and the caution, as text and vector', async () => {
    const info = await pdfInfo(pdf);
    const pages = Number(info['Pages']);
    expect(pages).toBeGreaterThanOrEqual(2);
    const raw = await pdfText(pdf);
    const text = raw.replace(/\s+/g, ' ');
    expect(text).toContain('Settlement check summary');
    expect(text).toContain('Boathouse bases');
    expect(text).toContain(`geo-core ${stored.geoCoreVersion}`);
    expect(text).toContain(stored.createdBy.name);
    expect(text).toContain(issued.issuedBy.name);
    // Where the layers came from: the record version pinned, and the hand-entered layer.
    // (pdftotext drops a hyphen where a narrow cell wraps the test reference at it.)
    expect(text.replace(/-/g, '')).toContain(`${testReference.replace(/-/g, '')} version 1`);
    expect(text).toContain('entered by hand');
    // The limits with the published source the check stores.
    expect(text).toContain(`1/${stored.options.angularDistortionDenominator} — Bjerrum (1963)`);
    expect(text).toContain(`${stored.options.totalSettlementLimitMm} mm — EN 1997-1 Annex H`);
    if (stored.result.kind !== 'footings') throw new Error('expected a footing result');
    const check = stored.result.check;
    for (const f of check.footings) {
      // The results table prints each footing's row: mark, net q, immediate, primary, secondary, total.
      const row = `${f.id} ${f.pressureKpa.toFixed(1)} ${mm(f.immediateM)} ${mm(f.primaryM)} ${mm(f.secondaryM)} ${mm(f.totalM)}`;
      expect(text, f.id).toContain(row);
      // And the plan view writes its total beside it.
      expect(text, f.id).toContain(`${mm(f.totalM)} mm`);
      if (f.timeTo90PercentYears !== null) expect(text, f.id).toContain(Number(f.timeTo90PercentYears.toPrecision(3)).toString());
    }
    const over = check.pairs.filter((p) => !p.withinDesignLimit);
    expect(over.length).toBeGreaterThan(0);
    for (const p of over) {
      expect(text).toContain(`${p.footingIds[0]} – ${p.footingIds[1]} ${p.distanceM.toFixed(2)} ${mm(p.differentialSettlementM)} 1/${Math.round(1 / p.angularDistortion)}`);
    }
    expect(text).toMatch(/for review by a qualified geotechnical engineer/i);
    expect(text).toContain('local codes and licensed professional practice');
    for (let page = 1; page <= pages; page += 1) expect(text).toContain(`Page ${page} of ${pages}`);
    expect(await pdfImageCount(pdf)).toBe(0);
  });

  it('when a revision has not been issued, then its report answers 404 in plain words and the issued list leaves it out', async () => {
    await world.designer.post(`${checkPath}/runs`, { reason: 'Second look' }).expect(201);
    const res = await world.designer.get(`${checkPath}/revisions/2/report`);
    expect(res.status).toBe(404);
    expect(res.body.message).toMatch(/Revision 2 of this check has not been issued/);
    expect((await client.get(`${checkPath}/revisions/2/report/pdf`)).status).toBe(404);
    const list = (await client.get(`${world.base}/issued-checks`).expect(200)).body as IssuedCheck[];
    expect(list.map((i) => [i.checkName, i.revision])).toEqual([['Boathouse bases', 1]]);
  });

  it('when a designer of another project asks for it or tries to issue, then 404 as for a missing project', async () => {
    const other = await createMember(world.orgId, 'designer', 'check-report-other');
    await world.admin.post(`/api/orgs/${world.orgId}/projects`, { name: 'Other work', reference: `OW-${Date.now()}`, clientName: 'Invented', designerIds: [other.userId] }).expect(201);
    const browser = await signedInBrowser(app, other.email);
    for (const path of [`${checkPath}/revisions/1/report`, `${checkPath}/revisions/1/report/pdf`, `${world.base}/issued-checks`]) expect((await browser.get(path)).status, path).toBe(404);
    expect((await browser.post(`${checkPath}/revisions/2/issue`, {})).status).toBe(404);
  });

  it('when a client of another project asks for it, then 404', async () => {
    const other = await createMember(world.orgId, 'client', 'check-report-other-client');
    const project = (await world.admin.post(`/api/orgs/${world.orgId}/projects`, { name: 'Their work', reference: `TW-${Date.now()}`, clientName: 'Invented' }).expect(201)).body as ProjectDetail;
    await placeOnProject(world.orgId, project.id, other.userId, 'client');
    const browser = await signedInBrowser(app, other.email);
    expect((await browser.get(`${checkPath}/revisions/1/report/pdf`)).status).toBe(404);
  });

  it('when a designer of another organisation asks for it or tries to issue, then 404 naming the organisation', async () => {
    const outsider = await signUpAdmin(app, 'check-report-outsider');
    const designer = await signedInBrowser(app, (await createMember(outsider.orgId, 'designer', 'check-report-outsider-designer')).email);
    for (const path of [`${checkPath}/revisions/1/report`, `${checkPath}/revisions/1/report/pdf`]) {
      const res = await designer.get(path);
      expect(res.status, path).toBe(404);
      expect(res.body.message).toMatch(/organisation/);
    }
    expect((await designer.post(`${checkPath}/revisions/2/issue`, {})).status).toBe(404);
  });

  it('when a technician, a client or a lab manager tries to issue a revision, then 403 and nothing is issued', async () => {
    const technician = await signedInBrowser(app, (await createMember(world.orgId, 'technician', 'check-report-issue-tech')).email);
    const manager = await signedInBrowser(app, (await createMember(world.orgId, 'lab_manager', 'check-report-issue-manager')).email);
    for (const browser of [technician, client, manager]) expect((await browser.post(`${checkPath}/revisions/2/issue`, {})).status).toBe(403);
    expect((await technician.get(`${checkPath}/revisions/1/report/pdf`)).status).toBe(403);
    const rows = (await dataSource.query(
      `SELECT ir.id FROM issued_reports ir JOIN settlement_check_revisions r ON r.id = ir.subject_id WHERE r.check_id = $1 AND r.revision = 2`,
      [stored.checkId],
    )) as unknown[];
    expect(rows).toEqual([]);
  });

  it('when the printer cannot start, then the issued revision says failed in words for the designer, the download answers 409, and the designer (not a client) retries it to a ready file', async () => {
    await boss.offWork(GENERATE_REPORT_QUEUE);
    await registerJobs(boss, [generateReportJob({ executablePath: '/nonexistent/chromium' })]);
    await world.designer.post(`${checkPath}/revisions/2/issue`, {}).expect(202);
    const failed = await settled(world.designer, `${checkPath}/revisions/2/report`);
    expect(failed.report.state).toBe('failed');
    expect(failed.report.message).toMatch(/A designer of the project can try again from the check’s results/);
    const refused = await client.get(`${checkPath}/revisions/2/report/pdf`);
    expect(refused.status).toBe(409);
    expect((await client.post(`${checkPath}/revisions/2/report/retry`, {})).status).toBe(403);
    await boss.offWork(GENERATE_REPORT_QUEUE);
    await registerJobs(boss, [generateReportJob()]);
    expect((await world.designer.post(`${checkPath}/revisions/2/report/retry`, {})).status).toBe(202);
    const ready = await settled(world.designer, `${checkPath}/revisions/2/report`);
    expect(ready.report.state).toBe('ready');
    expect((await download(client, `${checkPath}/revisions/2/report/pdf`)).headers['x-content-sha256']).toBe(ready.report.sha256);
  }, PRINTING_MS);

  it('when the designer asks twice at once to issue the same revision, then it is issued once: one 202, one 409', async () => {
    await world.designer.post(`${checkPath}/runs`, { reason: 'Third look' }).expect(201);
    const answers = await Promise.all([world.designer.post(`${checkPath}/revisions/3/issue`, {}), world.designer.post(`${checkPath}/revisions/3/issue`, {})]);
    expect(answers.map((res) => res.status).sort()).toEqual([202, 409]);
    const rows = (await dataSource.query(
      `SELECT ir.id FROM issued_reports ir JOIN settlement_check_revisions r ON r.id = ir.subject_id WHERE r.check_id = $1 AND r.revision = 3`,
      [stored.checkId],
    )) as unknown[];
    expect(rows).toHaveLength(1);
    await settled(world.designer, `${checkPath}/revisions/3/report`);
  }, PRINTING_MS);
});

