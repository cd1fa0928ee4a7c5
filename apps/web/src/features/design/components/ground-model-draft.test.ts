import { GroundModelCreateSchema, type GroundModelContent } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { draftFromContent, modelInput } from './ground-model-draft';

const stored: GroundModelContent = {
  groundLevelM: 3.4,
  waterTableDepthM: 1.2,
  waterUnitWeightKnPerM3: 9.81,
  layers: [
    { name: 'Fill', kind: 'granular', topDepthM: 0, bottomDepthM: 1.5, thicknessM: 1.5, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 19, elasticModulusKpa: 12000, poissonRatio: 0.3, drainageTop: 'free', drainageBottom: 'free', source: null, parameters: null },
    {
      name: 'Clay',
      kind: 'compressible',
      topDepthM: 1.5,
      bottomDepthM: 4.5,
      thicknessM: 3,
      unitWeightKnPerM3: 17,
      saturatedUnitWeightKnPerM3: 17,
      elasticModulusKpa: null,
      poissonRatio: null,
      drainageTop: 'free',
      drainageBottom: 'impermeable',
      source: { kind: 'record', recordId: '00000000-0000-4000-8000-000000000001', versionId: '00000000-0000-4000-8000-000000000002', version: 2, testId: '00000000-0000-4000-8000-000000000003', testReference: 'T-1', boreholeName: 'BH1', sampleReference: 'U1', sampleDepthM: 3.2 },
      parameters: {
        e0: { value: 1.1, origin: 'source' },
        cc: { value: 0.45, origin: 'source' },
        recompressionIndex: { value: 0.05, origin: 'source', kind: 'Cr' },
        preconsolidationCarry: 'ocr',
        preconsolidationKpa: { value: 85, origin: 'source' },
        preconsolidationDepthM: 3.2,
        ocr: { value: null, origin: 'source' },
        cvM2PerYr: { value: 2.3, origin: 'source', basis: 'lowest', cvBasis: 'lowest', cvFinalStressKpa: null },
        cAlpha: { value: 0.02, origin: 'hand' },
      },
    },
  ],
};

describe('draftFromContent(content) → modelInput(draft)', () => {
  it('gives back what would save the same ground model: sources by id, values typed by hand named in entered, the rest left to the source', () => {
    const input = GroundModelCreateSchema.parse(modelInput(draftFromContent(stored, 'Site')));
    expect(input.waterTableDepthM).toBe(1.2);
    const clay = input.layers[1]!;
    expect(clay.source).toEqual({ kind: 'record', recordId: '00000000-0000-4000-8000-000000000001', versionId: '00000000-0000-4000-8000-000000000002' });
    expect(clay.parameters?.entered).toEqual(['cAlpha']);
    expect(clay.parameters?.cAlpha).toBe(0.02);
    expect(clay.parameters?.e0).toBeNull();
    expect(clay.drainageBottom).toBe('impermeable');
    expect(input.layers[0]?.source).toBeNull();
    expect(input.layers[0]?.elasticModulusKpa).toBe(12000);
  });

  it('leaves a value that is not a number as text, so the shared schema names the field', () => {
    const draft = draftFromContent(stored, 'Site');
    draft.layers[0]!.thicknessM = 'one and a half';
    const parsed = GroundModelCreateSchema.safeParse(modelInput(draft));
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]).toMatchObject({ path: ['layers', 0, 'thicknessM'], message: 'Enter the layer thickness as a number in m.' });
  });
});
