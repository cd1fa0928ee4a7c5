import { CharacteristicSetInputSchema, GroundModelCreateSchema, SettlementCheckCreateSchema, SizingApplySchema, SizingRequestSchema, type FootingRowInput } from '@porestack/types';
import type { DataSource } from 'typeorm';
import { createCharacteristicSet } from '../modules/characteristic-sets/characteristic-sets.service.js';
import { listDesignRecords } from '../modules/design-records/design-records.service.js';
import { GroundModelEntity } from '../modules/ground-models/ground-model.entity.js';
import { createGroundModel } from '../modules/ground-models/ground-models.service.js';
import { runCheck } from '../modules/settlement-checks/check-runs.service.js';
import { applySizing, createCheck } from '../modules/settlement-checks/settlement-checks.service.js';
import { sizeFooting } from '../modules/settlement-checks/sizing.service.js';
import type { DemoOrganisation } from './demo-organisation.seed.js';
import { DEMO_PROJECT_ID } from './lab-demo.seed.js';

export const DEMO_GROUND_MODEL_NAME = 'Saltmarsh Lane site model';

/**
 * An invented single-storey pump hall on a 6 m column grid: twelve column pads, two pump
 * plinths and a light stair pad. The loads were chosen (by trying them on this ground model)
 * so that every total stays within 50 mm and only the stair pad S1 beside plinth P2 tilts
 * past 1/500.
 */
const FOOTINGS: FootingRowInput[] = [
  ...[0, 6, 12, 18].flatMap((xM, column) =>
    [0, 6, 12].map((yM, row): FootingRowInput => ({
      id: `C${column + 1}${String.fromCharCode(65 + row)}`,
      shape: 'square',
      widthM: 2.2,
      depthM: 1.2,
      loadKind: 'load',
      load: 300 + 20 * ((column + row) % 3),
      loadBasis: 'gross',
      xM,
      yM,
    })),
  ),
  { id: 'P1', shape: 'rectangle', widthM: 3, lengthM: 4, depthM: 1.5, loadKind: 'load', load: 800, loadBasis: 'gross', xM: 3, yM: 18 },
  { id: 'P2', shape: 'rectangle', widthM: 3, lengthM: 4, depthM: 1.5, loadKind: 'load', load: 800, loadBasis: 'gross', xM: 15, yM: 18 },
  { id: 'S1', shape: 'square', widthM: 1.2, depthM: 0.9, loadKind: 'load', load: 60, loadBasis: 'gross', xM: 15, yM: 24 },
];

/**
 * The design demo on the demo project, built through the services as a designer would: a
 * characteristic set of the approved clay records, a ground model whose upper clay comes from
 * one approved record and whose lower clay from the set, and a check of the pump hall run, plinth
 * P1 sized by the tool for 40 mm and applied as a second revision. Runs once (keyed on the model's name).
 * @returns how many things were created (0 when the demo design was already there).
 */
export async function seedDesignDemo(dataSource: DataSource, demo: DemoOrganisation): Promise<number> {
  const orgId = demo.organisation.id;
  if (await dataSource.getRepository(GroundModelEntity).existsBy({ projectId: DEMO_PROJECT_ID, name: DEMO_GROUND_MODEL_NAME })) return 0;
  const designer = { id: demo.userIds.designer, name: 'Demo designer' };
  const records = await listDesignRecords(orgId, DEMO_PROJECT_ID, {});
  const upper = records.find((r) => r.depthM < 4);
  if (!upper || records.length < 2) return 0;
  const set = await createCharacteristicSet(
    orgId,
    DEMO_PROJECT_ID,
    CharacteristicSetInputSchema.parse({
      name: 'Soft to firm grey clay',
      note: 'The approved records of the clay below the made ground.',
      versionIds: records.map((r) => r.versionId),
      adopted: {
        e0: { value: 1.0, basis: 'chosen', note: 'lower of the two tests' },
        cc: { value: 0.45, basis: 'chosen', note: 'upper of the two tests; only two tests, so no bound is drawn' },
        cr: { value: 0.05, basis: 'chosen', note: 'reload branches' },
        ocr: { value: 1.8, basis: 'chosen', note: 'cautious, below both tests' },
        cvM2PerYr: { value: 1.5, basis: 'chosen', note: 'slow side of the increments near the design stress' },
        cAlpha: { value: 0.016, basis: 'chosen', note: '' },
      },
    }),
    designer,
  );
  const model = await createGroundModel(
    orgId,
    DEMO_PROJECT_ID,
    GroundModelCreateSchema.parse({
      name: DEMO_GROUND_MODEL_NAME,
      note: 'From BH01: made ground over soft clay over dense gravel.',
      groundLevelM: 3.4,
      waterTableDepthM: 1.2,
      acceptWarnings: true,
      layers: [
        { name: 'Made ground', kind: 'granular', thicknessM: 1.5, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19, elasticModulusKpa: 12_000, poissonRatio: 0.3 },
        {
          name: 'Soft grey silty clay',
          kind: 'compressible',
          thicknessM: 3,
          unitWeightKnPerM3: 17.2,
          saturatedUnitWeightKnPerM3: 17.2,
          source: { kind: 'record', recordId: upper.recordId, versionId: upper.versionId },
          parameters: { preconsolidationCarry: 'ocr' },
        },
        { name: 'Soft to firm grey clay', kind: 'compressible', thicknessM: 3, unitWeightKnPerM3: 17.8, saturatedUnitWeightKnPerM3: 17.8, source: { kind: 'set', setId: set.id, setRevisionId: set.currentRevisionId } },
        { name: 'Dense sandy gravel', kind: 'granular', thicknessM: 6.5, unitWeightKnPerM3: 20, saturatedUnitWeightKnPerM3: 21, elasticModulusKpa: 60_000, poissonRatio: 0.3 },
      ],
    }),
    designer,
  );
  const check = await createCheck(
    orgId,
    DEMO_PROJECT_ID,
    SettlementCheckCreateSchema.parse({ name: 'Pump hall column bases', groundModelId: model.id, footings: FOOTINGS, options: { sublayerMaxThicknessM: 0.5 }, acceptWarnings: true }),
    designer,
  );
  await runCheck(orgId, DEMO_PROJECT_ID, check.id, 'First run of the pump hall', designer.id);
  const sized = await sizeFooting(orgId, DEMO_PROJECT_ID, check.id, SizingRequestSchema.parse({ footingId: 'P1', target: 'settlement', targetTotalMm: 40, minWidthM: 2, maxWidthM: 6 }));
  if (sized.status === 'found' && sized.widthM !== null) {
    await applySizing(orgId, DEMO_PROJECT_ID, check.id, SizingApplySchema.parse({ footingId: 'P1', widthM: Number(sized.widthM.toFixed(2)), lengthM: sized.lengthM === null ? null : Number(sized.lengthM.toFixed(2)), acceptWarnings: true }), designer);
  }
  return 4;
}
