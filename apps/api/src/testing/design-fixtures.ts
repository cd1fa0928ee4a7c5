import type { CheckRevision, GroundModelCreate, GroundModelDetail, ProjectDetail, RunCheckAnswer, SettlementCheckCreate, SettlementCheckDetail } from '@porestack/types';
import type { Express } from 'express';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from './browser.js';

/** An organisation with a lab manager, a designer on a new project, and the designer's browser. */
export interface DesignWorld {
  orgId: string;
  projectId: string;
  admin: Browser;
  designer: Browser;
  designerId: string;
  base: string;
}

let counter = 0;

export async function designWorld(app: Express, label: string): Promise<DesignWorld> {
  counter += 1;
  const admin = await signUpAdmin(app, `${label}-admin`);
  const designer = await createMember(admin.orgId, 'designer', `${label}-designer`);
  const project = (
    await admin.browser
      .post(`/api/orgs/${admin.orgId}/projects`, { name: `Design ${label}`, reference: `DS-${Date.now().toString(36)}-${counter}`, clientName: 'Invented client', designerIds: [designer.userId] })
      .expect(201)
  ).body as ProjectDetail;
  return {
    orgId: admin.orgId,
    projectId: project.id,
    admin: admin.browser,
    designer: await signedInBrowser(app, designer.email),
    designerId: designer.userId,
    base: `/api/orgs/${admin.orgId}/projects/${project.id}`,
  };
}

export async function createGroundModel(world: DesignWorld, body: GroundModelCreate): Promise<GroundModelDetail> {
  const res = await world.designer.post(`${world.base}/ground-models`, body);
  if (res.status !== 201) throw new Error(`ground model refused: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as GroundModelDetail;
}

export async function createCheck(world: DesignWorld, body: SettlementCheckCreate): Promise<SettlementCheckDetail> {
  const res = await world.designer.post(`${world.base}/settlement-checks`, body);
  if (res.status !== 201) throw new Error(`check refused: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body as SettlementCheckDetail;
}

/** Runs the check (inline) and reads back the stored revision with every detail. */
export async function runAndRead(world: DesignWorld, checkId: string): Promise<CheckRevision> {
  const res = await world.designer.post(`${world.base}/settlement-checks/${checkId}/runs`, {});
  if (res.status !== 201) throw new Error(`run refused: ${res.status} ${JSON.stringify(res.body)}`);
  const answer = res.body as RunCheckAnswer;
  if (answer.kind !== 'done') throw new Error('expected the run to answer at once');
  return (await world.designer.get(`${world.base}/settlement-checks/${checkId}/revisions/${answer.revision}/result`).expect(200)).body as CheckRevision;
}
