import type { CharacteristicSetDetail, CharacteristicSetInput, GroundModelCreate, GroundModelDetail, ProjectDetail, SettlementCheckCreate, SettlementCheckDetail } from '@porestack/types';
import type { Express } from 'express';
import { dataSource } from '../data-source.js';
import { generateReport } from '../jobs/generate-report.job.js';
import { signedInBrowser, type Browser } from './browser.js';
import { approvedRecord, approveNewVersion, type LabPeople } from './design-lab-fixtures.js';
import { placeOnProject } from './lab-fixtures.js';

/** What the route-policy test needs to call every design route once as each persona. */
export interface DesignContext {
  base: string;
  versionId: string;
  setId: string;
  setRevisionId: string;
  groundModelId: string;
  groundModelBody: GroundModelCreate;
  setBody: CharacteristicSetInput;
  checkBody: SettlementCheckCreate;
  /** A check that has been run once: revision 1, footing F1. */
  checkPath: string;
  /** A fresh check whose pinned record has since had a newer version approved. */
  newFlaggedCheckPath: () => Promise<string>;
  /** A new revision of the check, not yet issued (…/revisions/n). */
  newRevisionPath: () => Promise<string>;
  /** A revision issued by the designer with its PDF printed (the same one on every call). */
  issuedRevisionPath: () => Promise<string>;
  /** A new revision issued by the designer whose PDF failed to print. */
  newFailedIssuedRevisionPath: () => Promise<string>;
}

async function send<T>(browser: Browser, path: string, body: object): Promise<T> {
  const res = await browser.post(path, body);
  if (res.status >= 300) throw new Error(`${path} answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body as T;
}

/** A project with the designer on it, an approved record, a characteristic set, a ground model and a check run once. */
export async function designContext(
  app: Express,
  orgId: string,
  people: { designerId: string; designerEmail: string; technicianId: string; managerId: string; managerEmail: string; clientId: string },
): Promise<DesignContext> {
  const { designerId, technicianId, managerId } = people;
  const designer = await signedInBrowser(app, people.designerEmail);
  const manager = await signedInBrowser(app, people.managerEmail);
  const project = await send<ProjectDetail>(manager, `/api/orgs/${orgId}/projects`, { name: 'Policy design', reference: `PD-${Date.now().toString(36)}`, clientName: 'Invented', designerIds: [designerId] });
  const base = `/api/orgs/${orgId}/projects/${project.id}`;
  // The client reads the project's issued checks: the policy is about roles; scope has its own tests.
  await placeOnProject(orgId, project.id, people.clientId, 'client');
  const lab: LabPeople = { orgId, technicianId, managerId };
  const record = await approvedRecord(lab, project.id, { borehole: 'BH', topDepthM: 3, soil: {} });
  const setBody: CharacteristicSetInput = { name: 'Policy stratum', versionIds: [record.versionId], adopted: { cc: { value: 0.4, basis: 'chosen', note: '' } } };
  const set = await send<CharacteristicSetDetail>(designer, `${base}/characteristic-sets`, setBody);
  const groundModelBody = (versionId: string): GroundModelCreate => ({
    name: 'Policy model',
    waterTableDepthM: 1,
    layers: [
      { name: 'fill', kind: 'granular', thicknessM: 1, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19 },
      { name: 'clay', kind: 'compressible', thicknessM: 6, unitWeightKnPerM3: 17, saturatedUnitWeightKnPerM3: 17, source: { kind: 'record', recordId: record.recordId, versionId } },
    ],
  });
  const model = await send<GroundModelDetail>(designer, `${base}/ground-models`, groundModelBody(record.versionId));
  const checkBody: SettlementCheckCreate = { name: 'Policy check', groundModelId: model.id, footings: [{ id: 'F1', shape: 'square', widthM: 2, depthM: 1, load: 500, xM: 0, yM: 0 }] };
  const check = await send<SettlementCheckDetail>(designer, `${base}/settlement-checks`, checkBody);
  await send(designer, `${base}/settlement-checks/${check.id}/runs`, {});
  const checkPath = `${base}/settlement-checks/${check.id}`;
  const newRevisionPath = async () => `${checkPath}/revisions/${(await send<{ revision: number }>(designer, `${checkPath}/runs`, {})).revision}`;
  const issueAndPrint = async (executablePath?: string) => {
    const path = await newRevisionPath();
    await send(designer, `${path}/issue`, {});
    const revision = Number(path.split('/').pop());
    const [report] = (await dataSource.query(
      `SELECT ir.id, ir.job_run_id FROM issued_reports ir JOIN settlement_check_revisions r ON r.id = ir.subject_id WHERE r.check_id = $1 AND r.revision = $2`,
      [check.id, revision],
    )) as Array<{ id: string; job_run_id: string }>;
    if (!report) throw new Error(`no report queued for revision ${revision}`);
    await generateReport({ orgId, reportId: report.id, jobRunId: report.job_run_id }, executablePath ? { executablePath } : {});
    return path;
  };
  let issued: Promise<string> | undefined;
  return {
    base,
    versionId: record.versionId,
    setId: set.id,
    setRevisionId: set.currentRevisionId,
    groundModelId: model.id,
    groundModelBody: groundModelBody(record.versionId),
    setBody,
    checkBody,
    checkPath,
    newRevisionPath,
    issuedRevisionPath: () => (issued ??= issueAndPrint()),
    newFailedIssuedRevisionPath: () => issueAndPrint('/nonexistent/chromium'),
    newFlaggedCheckPath: async () => {
      const fresh = await approvedRecord(lab, project.id, { borehole: 'BH', topDepthM: 4, soil: {} });
      const freshModel = await send<GroundModelDetail>(designer, `${base}/ground-models`, {
        ...groundModelBody(fresh.versionId),
        layers: [groundModelBody(fresh.versionId).layers[0]!, { ...groundModelBody(fresh.versionId).layers[1]!, source: { kind: 'record', recordId: fresh.recordId, versionId: fresh.versionId } }],
      });
      const flagged = await send<SettlementCheckDetail>(designer, `${base}/settlement-checks`, { ...checkBody, groundModelId: freshModel.id });
      await send(designer, `${base}/settlement-checks/${flagged.id}/runs`, {});
      await approveNewVersion(lab, fresh.testId, 80);
      return `${base}/settlement-checks/${flagged.id}`;
    },
  };
}
