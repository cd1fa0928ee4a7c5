import type { GroundModelCreate, ProjectDetail, SettlementCheckSummary } from '@porestack/types';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { createMember, signedInBrowser, signUpAdmin, type Browser } from '../../../testing/browser.js';
import { approvedRecord } from '../../../testing/design-lab-fixtures.js';
import { createCheck, createGroundModel, designWorld, runAndRead, type DesignWorld } from '../../../testing/design-fixtures.js';

const app = createApp();

const HAND_MODEL: GroundModelCreate = {
  name: 'Hand model',
  waterTableDepthM: 1,
  layers: [
    { name: 'fill', kind: 'granular', thicknessM: 1, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19 },
    { name: 'clay', kind: 'compressible', thicknessM: 6, unitWeightKnPerM3: 17, saturatedUnitWeightKnPerM3: 17, source: { kind: 'hand' }, parameters: { e0: 1.1, cc: 0.4 } },
  ],
};

describe('who sees a project’s design work', () => {
  let world: DesignWorld;
  let paths: string[];
  let otherDesigner: Browser;
  let manager: Browser;
  let technician: Browser;
  let outsider: Browser;
  let otherProject: ProjectDetail;

  beforeAll(async () => {
    world = await designWorld(app, 'scope');
    const model = await createGroundModel(world, HAND_MODEL);
    const check = await createCheck(world, { name: 'Scoped check', groundModelId: model.id, footings: [{ id: 'F1', shape: 'square', widthM: 2, depthM: 1, load: 600, xM: 0, yM: 0 }] });
    await runAndRead(world, check.id);
    paths = [
      `${world.base}/ground-models`,
      `${world.base}/ground-models/${model.id}`,
      `${world.base}/characteristic-sets`,
      `${world.base}/design/records`,
      `${world.base}/settlement-checks`,
      `${world.base}/settlement-checks/${check.id}`,
      `${world.base}/settlement-checks/${check.id}/revisions/1`,
      `${world.base}/settlement-checks/${check.id}/revisions/1/result`,
      `${world.base}/settlement-checks/${check.id}/revisions/1/footings/F1`,
      `${world.base}/settlement-checks/${check.id}/revisions/1/workbook.xlsx`,
    ];
    // A second designer of the same organisation, on another project only.
    const second = await createMember(world.orgId, 'designer', 'scope-other-designer');
    otherProject = (await world.admin.post(`/api/orgs/${world.orgId}/projects`, { name: 'Other', reference: `OT-${Date.now()}`, clientName: 'Invented', designerIds: [second.userId] }).expect(201)).body as ProjectDetail;
    otherDesigner = await signedInBrowser(app, second.email);
    manager = await signedInBrowser(app, (await createMember(world.orgId, 'lab_manager', 'scope-manager')).email);
    technician = await signedInBrowser(app, (await createMember(world.orgId, 'technician', 'scope-tech')).email);
    outsider = (await signUpAdmin(app, 'scope-outsider')).browser;
  });

  it('when a designer not on the project opens any of its design pages, then 404 as for a missing project, and nothing leaks', async () => {
    for (const path of paths) {
      const res = await otherDesigner.get(path);
      expect(res.status, path).toBe(404);
      expect(JSON.stringify(res.body)).not.toMatch(/Scoped check|Hand model/);
    }
    const res = await otherDesigner.post(`${world.base}/ground-models`, HAND_MODEL);
    expect(res.status).toBe(404);
  });

  it('when a member of another organisation asks, then 404 naming the organisation', async () => {
    for (const path of paths) {
      const res = await outsider.get(path);
      expect(res.status, path).toBe(404);
      expect(res.body.message).toMatch(/organisation/);
    }
  });

  it('when a lab manager opens the design work, then it reads (the lab sees the whole organisation) but cannot change it', async () => {
    for (const path of paths) expect((await manager.get(path)).status, path).toBe(200);
    expect((await manager.post(`${world.base}/ground-models`, HAND_MODEL)).status).toBe(403);
  });

  it('when a technician opens the design work, then 403: it is not part of their role', async () => {
    expect((await technician.get(paths[0]!)).status).toBe(403);
  });

  it('when a designer lists checks across the organisation, then only their projects’ checks come back', async () => {
    const mine = (await world.designer.get(`/api/orgs/${world.orgId}/settlement-checks`).expect(200)).body as SettlementCheckSummary[];
    expect(mine.map((c) => c.name)).toEqual(['Scoped check']);
    const theirs = (await otherDesigner.get(`/api/orgs/${world.orgId}/settlement-checks`).expect(200)).body as SettlementCheckSummary[];
    expect(theirs).toEqual([]);
  });

  it('when a designer picks a soil record version of another project for a layer, then the layer is refused by name and nothing is saved', async () => {
    const lab = {
      orgId: world.orgId,
      technicianId: (await createMember(world.orgId, 'technician', 'scope-lab-tech')).userId,
      managerId: (await createMember(world.orgId, 'lab_manager', 'scope-lab-manager')).userId,
    };
    const foreign = await approvedRecord(lab, otherProject.id, { borehole: 'BH-X', topDepthM: 3, soil: {} });
    const before = ((await world.designer.get(`${world.base}/ground-models`).expect(200)).body as unknown[]).length;
    const res = await world.designer.post(`${world.base}/ground-models`, {
      ...HAND_MODEL,
      layers: [HAND_MODEL.layers[0]!, { ...HAND_MODEL.layers[1]!, source: { kind: 'record', recordId: foreign.recordId, versionId: foreign.versionId } }],
    });
    expect(res.status).toBe(400);
    expect(res.body.issues).toContainEqual({ path: 'layers.1.source', message: expect.stringMatching(/Layer 2 \(clay\): that soil record version is not an approved version of this project/) });
    expect(((await world.designer.get(`${world.base}/ground-models`).expect(200)).body as unknown[]).length).toBe(before);
  }, 60_000);
});
