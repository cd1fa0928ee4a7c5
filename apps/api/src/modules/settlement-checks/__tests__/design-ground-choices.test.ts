import type { CheckRevision, DesignRecord, GroundModelCreate, GroundModelDetail } from '@porestack/types';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { createMember } from '../../../testing/browser.js';
import { approvedRecord } from '../../../testing/design-lab-fixtures.js';
import { createCheck, createGroundModel, designWorld, runAndRead, type DesignWorld } from '../../../testing/design-fixtures.js';

const app = createApp();

// One approved record (an invented soft clay from geo-core's synthetic generator) and a ground
// model of fill over clay: γ 18 above and 19 below a water table at 1 m, clay γsat 17 from 1 m.
const GAMMA_W = 9.81;
const sigmaV0 = (depthM: number) => 18 * 1 + (depthM - 1) * (17 - GAMMA_W);

describe('how a ground model carries σ′p and cv, and the footings a check takes', () => {
  let world: DesignWorld;
  let record: DesignRecord;

  const model = (clay: Partial<NonNullable<GroundModelCreate['layers']>[number]>): GroundModelCreate => ({
    name: `Choices ${Math.random()}`,
    waterTableDepthM: 1,
    layers: [
      { name: 'fill', kind: 'granular', thicknessM: 1, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19 },
      { name: 'clay', kind: 'compressible', thicknessM: 8, unitWeightKnPerM3: 17, saturatedUnitWeightKnPerM3: 17, source: { kind: 'record', recordId: record.recordId, versionId: record.versionId }, ...clay },
      { name: 'gravel', kind: 'granular', thicknessM: 5, unitWeightKnPerM3: 20, saturatedUnitWeightKnPerM3: 21 },
    ],
  });

  beforeAll(async () => {
    world = await designWorld(app, 'choices');
    const lab = { orgId: world.orgId, technicianId: (await createMember(world.orgId, 'technician')).userId, managerId: (await createMember(world.orgId, 'lab_manager')).userId };
    await approvedRecord(lab, world.projectId, { borehole: 'BH-P', topDepthM: 4, soil: { preconsolidationStressKpa: 110, cvM2PerYr: 2 } });
    [record] = (await world.designer.get(`${world.base}/design/records`).expect(200)).body as [DesignRecord];
  }, 60_000);

  it('when σ′p is carried by a constant σ′p − σ′v0, then the run uses POP = σ′p − σ′v0 at the sample depth of this ground model', async () => {
    const groundModel = await createGroundModel(world, model({ parameters: { preconsolidationCarry: 'pop' } }));
    const check = await createCheck(world, { name: 'POP', groundModelId: groundModel.id, footings: [{ id: 'F1', shape: 'square', widthM: 2, depthM: 1, load: 300, xM: 0, yM: 0 }] });
    const run = await runAndRead(world, check.id);
    const clay = run.result.check.layers[1]!;
    // Sample mid-depth 4.2 m: σ′v0 = 18 + 3.2 × (17 − 9.81) = 41.008 kPa by hand.
    expect(sigmaV0(4.2)).toBeCloseTo(41.008, 9);
    expect(clay.preconsolidationBasis).toBe('pre-overburden-pressure');
    expect(clay.preOverburdenPressureKpa).toBeCloseTo(record.preconsolidationKpa! - sigmaV0(record.depthM), 6);
  });

  it('when cv is taken at the design stress range, then it comes from the test’s increments between σ′v0 and the given final stress; without that stress the layer is named and nothing is saved', async () => {
    const refused = await world.designer.post(`${world.base}/ground-models`, model({ parameters: { cvBasis: 'design-range' } }));
    expect(refused.status).toBe(400);
    expect(refused.body.issues[0]).toMatchObject({ path: 'layers.1.parameters.cvFinalStressKpa', message: expect.stringMatching(/^Layer 2 \(clay\): cv at the design stress range needs the effective stress/) });
    const saved: GroundModelDetail = await createGroundModel(world, model({ parameters: { cvBasis: 'design-range', cvFinalStressKpa: 150 } }));
    const cv = saved.current.content.layers[1]!.parameters!.cvM2PerYr;
    expect(cv.origin).toBe('source');
    expect(cv.basis).toMatch(/^at the design stress range \d+–150 kPa/);
    // Bounded by the test's own cv values (its lowest and highest over all increments).
    expect(cv.value!).toBeGreaterThanOrEqual(record.cvMinM2PerYr! * 0.999);
    expect(cv.value!).toBeLessThanOrEqual(record.cvMaxM2PerYr! * 1.001);
  });

  it('when the schedule holds a circle, a strip and a gross-loaded square, then each runs with its shape and the gross pressure is netted against σv0 at founding level', async () => {
    const groundModel = await createGroundModel(world, model({}));
    const check = await createCheck(world, {
      name: 'Shapes',
      groundModelId: groundModel.id,
      footings: [
        { id: 'C1', shape: 'circle', widthM: 2.5, depthM: 1, load: 600, xM: 0, yM: 0 },
        { id: 'S1', shape: 'strip', widthM: 1.2, depthM: 1, loadKind: 'load', load: 150, xM: 12, yM: 0 },
        { id: 'G1', shape: 'square', widthM: 2, depthM: 1.5, loadKind: 'pressure', load: 120, loadBasis: 'gross', xM: 0, yM: 12 },
      ],
    });
    const run: CheckRevision = await runAndRead(world, check.id);
    if (run.result.kind !== 'footings') throw new Error('expected footings');
    const byId = new Map(run.result.check.footings.map((f) => [f.id, f]));
    expect(byId.get('C1')).toMatchObject({ shape: 'circle', lengthM: null });
    // Circle: 600 kN over π·2.5²/4 = 4.9087 m² is 122.23 kPa net.
    expect(byId.get('C1')!.pressureKpa).toBeCloseTo(600 / ((Math.PI * 2.5 * 2.5) / 4), 9);
    expect(byId.get('S1')).toMatchObject({ shape: 'strip', loadKnPerM: 150, loadKn: null });
    expect(byId.get('S1')!.pressureKpa).toBeCloseTo(150 / 1.2, 9);
    // Gross 120 kPa at 1.5 m: σv = 18 × 1 + 17 × 0.5 = 26.5 kPa removed, 93.5 kPa net.
    expect(byId.get('G1')).toMatchObject({ pressureBasis: 'gross', grossPressureKpa: 120 });
    expect(byId.get('G1')!.overburdenRemovedKpa).toBeCloseTo(26.5, 9);
    expect(byId.get('G1')!.pressureKpa).toBeCloseTo(93.5, 9);
    expect(run.footingsAsRun.find((f) => f.id === 'G1')).toMatchObject({ grossPressureKpa: 120, netPressureKpa: expect.closeTo(93.5, 9) });
  });
});
