import { convertUnit } from '@porestack/geo-core';
import type { CheckRevision, GroundModelCreate } from '@porestack/types';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../app.js';
import { createCheck, createGroundModel, designWorld, runAndRead, type DesignWorld } from '../../../testing/design-fixtures.js';

// Settlements of the published worked examples S1–S5 (shared reference-examples.md), entered
// through the API as a designer would: a ground model with the printed soil data, a check with
// the printed load, run and read back from the stored revision. Fair agreement: 0.5 % on
// stresses and settlements (the printed values are rounded to 3–4 figures).
const app = createApp();
const FAIR = 0.005;
const FOOT_M = 0.3048; // exact (NIST SP 811)

function expectWithin(got: number, printed: number, what: string): void {
  const error = Math.abs(got - printed) / Math.abs(printed);
  expect(error, `${what}: got ${got}, printed ${printed}, tolerance ${FAIR * 100} %`).toBeLessThanOrEqual(FAIR);
}

/** A uniform-stress check of one sublayer per layer (mid-depth stresses, as the examples take them). */
async function runUniform(world: DesignWorld, model: GroundModelCreate, stressIncreaseKpa: number): Promise<CheckRevision> {
  const groundModel = await createGroundModel(world, model);
  const check = await createCheck(world, {
    name: model.name,
    groundModelId: groundModel.id,
    options: { loading: 'uniform', uniformStressIncreaseKpa: stressIncreaseKpa, sublayerMode: 'count', sublayerCount: 1 },
  });
  return runAndRead(world, check.id);
}

function clayRow(revision: CheckRevision) {
  if (revision.result.kind !== 'uniform') throw new Error('expected a uniform-load result');
  const rows = revision.result.check.sublayers.filter((row) => row.layerName === 'clay');
  expect(rows).toHaveLength(1);
  return { row: rows[0]!, totalM: revision.result.check.totalM };
}

// CIE 365 Examples 7.1–7.3: sand 9 m (γsat 19.0, taken saturated above the water table at 3 m), clay 10 m, gravel below.
const cie365 = (name: string, clay: { gammaSat: number; e0: number; ocr: number | null; cr: number | null }): GroundModelCreate => ({
  name,
  waterTableDepthM: 3,
  layers: [
    { name: 'sand', kind: 'granular', thicknessM: 9, unitWeightKnPerM3: 19, saturatedUnitWeightKnPerM3: 19 },
    {
      name: 'clay',
      kind: 'compressible',
      thicknessM: 10,
      unitWeightKnPerM3: clay.gammaSat,
      saturatedUnitWeightKnPerM3: clay.gammaSat,
      source: { kind: 'hand' },
      parameters: { e0: clay.e0, cc: 0.3, ocr: clay.ocr, recompressionIndex: clay.cr, recompressionIndexKind: clay.cr === null ? null : 'Cr' },
    },
    { name: 'gravel', kind: 'granular', thicknessM: 2, unitWeightKnPerM3: 20, saturatedUnitWeightKnPerM3: 20 },
  ],
});

describe('published settlement examples through the API', () => {
  let world: DesignWorld;
  beforeAll(async () => {
    world = await designWorld(app, 'published');
  });

  it('S1 — CIE 365 (Zambrano-Cruzatty), Consolidation, Example 7.1: normally consolidated clay under Δσ = 200 kPa gives σ′0 = 150.1 kPa and 0.513 m', async () => {
    const { row, totalM } = clayRow(await runUniform(world, cie365('S1', { gammaSat: 17.4, e0: 1.15, ocr: null, cr: null }), 200));
    expectWithin(row.initialEffectiveStressKpa, 150.1, 'σ′0 at mid-clay');
    expect(row.consolidationCase).toBe('normally-consolidated');
    expectWithin(totalM, 0.513, 'settlement');
  });

  it('S2 — CIE 365, Example 7.2: OCR 4, staying below σ′p, gives σ′0 = 153.1 kPa, σ′p = 612.4 kPa and 0.0903 m', async () => {
    const { row, totalM } = clayRow(await runUniform(world, cie365('S2', { gammaSat: 18.0, e0: 1.01, ocr: 4, cr: 0.05 }), 200));
    expectWithin(row.initialEffectiveStressKpa, 153.1, 'σ′0 at mid-clay');
    expectWithin(row.preconsolidationKpa, 612.4, 'σ′p at mid-clay');
    expect(row.consolidationCase).toBe('overconsolidated-below');
    expectWithin(totalM, 0.0903, 'settlement');
  });

  it('S3 — CIE 365, Example 7.3: OCR 1.2, crossing σ′p = 183.7 kPa, gives 0.443 m', async () => {
    const { row, totalM } = clayRow(await runUniform(world, cie365('S3', { gammaSat: 18.0, e0: 1.01, ocr: 1.2, cr: 0.05 }), 200));
    expectWithin(row.preconsolidationKpa, 183.7, 'σ′p at mid-clay');
    expect(row.consolidationCase).toBe('overconsolidated-crossing');
    expectWithin(totalM, 0.443, 'settlement');
  });

  it('S4 — CIE 365, Example 7.4(a): 25 ft of clay under the strip’s Δσ = 3749 psf at mid-depth gives σ′0 = 782.5 psf and 2.57 ft', async () => {
    // Entered in SI as a designer would, converted at the edge with geo-core's NIST factors, γw = 62.4 pcf as the source has it.
    const unitWeight = convertUnit(125, 'pcf', 'knPerM3');
    const model: GroundModelCreate = {
      name: 'S4',
      waterTableDepthM: 0,
      waterUnitWeightKnPerM3: convertUnit(62.4, 'pcf', 'knPerM3'),
      layers: [
        {
          name: 'clay',
          kind: 'compressible',
          thicknessM: 25 * FOOT_M,
          unitWeightKnPerM3: unitWeight,
          saturatedUnitWeightKnPerM3: unitWeight,
          source: { kind: 'hand' },
          parameters: { e0: 0.95, cc: 0.33, recompressionIndex: 0.04, recompressionIndexKind: 'Cr', ocr: 1.5 },
        },
      ],
    };
    const { row, totalM } = clayRow(await runUniform(world, model, convertUnit(3749, 'psf', 'kPa')));
    expectWithin(row.initialEffectiveStressKpa, convertUnit(782.5, 'psf', 'kPa'), 'σ′0 at mid-clay');
    expectWithin(row.preconsolidationKpa, convertUnit(1174, 'psf', 'kPa'), 'σ′p at mid-clay');
    expectWithin(totalM, 2.57 * FOOT_M, 'settlement');
  });

  it('S5 — GATE 2020 Civil Engineering, Set II (2-mark question) with its published solution: a 2 m square footing at 1.5 m, 200 kPa by 2V:1H, γw = 10, gives σ′0 = 39.25 kPa, Δσ = 56.89 kPa and 74.28 mm', async () => {
    // Sand γ 15 kN/m³ to the water table at 2.0 m and γsat 18 to 2.5 m; clay 2.5–4.0 m, γsat 17, Cc 0.30, NC,
    // e0 = 1.357 from γsat = (Gs + e)γw/(1 + e) with Gs 2.65 (as the published solution takes it).
    const groundModel = await createGroundModel(world, {
      name: 'S5',
      waterTableDepthM: 2,
      waterUnitWeightKnPerM3: 10,
      layers: [
        { name: 'sand', kind: 'granular', thicknessM: 2.5, unitWeightKnPerM3: 15, saturatedUnitWeightKnPerM3: 18 },
        { name: 'clay', kind: 'compressible', thicknessM: 1.5, unitWeightKnPerM3: 17, saturatedUnitWeightKnPerM3: 17, source: { kind: 'hand' }, parameters: { e0: 1.357, cc: 0.3 } },
      ],
    });
    const check = await createCheck(world, {
      name: 'S5',
      groundModelId: groundModel.id,
      footings: [{ id: 'F', shape: 'square', widthM: 2, depthM: 1.5, loadKind: 'pressure', load: 200, loadBasis: 'net', xM: 0, yM: 0 }],
      options: { stressMethod: '2to1', sublayerMode: 'count', sublayerCount: 1, evaluationPoints: 'centre' },
    });
    const revision = await runAndRead(world, check.id);
    if (revision.result.kind !== 'footings') throw new Error('expected a footing result');
    const footing = revision.result.check.footings[0]!;
    const [row] = footing.sublayers;
    expectWithin(row!.initialEffectiveStressKpa, 39.25, 'σ′0 at mid-clay');
    expectWithin(row!.stressIncreaseKpa, 56.89, 'Δσ at mid-clay');
    expectWithin(footing.totalM, 0.07428, 'settlement');
  });
});
