import type { IssuedResult, ProjectResults, SoilRecordVersion } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { resultsInWords } from './results-in-words';

const version = (over: Partial<SoilRecordVersion>): SoilRecordVersion => ({
  id: crypto.randomUUID(),
  recordId: crypto.randomUUID(),
  version: 1,
  testId: crypto.randomUUID(),
  analysisId: crypto.randomUUID(),
  uploadId: null,
  uploadSha256: null,
  geoCoreVersion: '1',
  initialVoidRatio: 1,
  compressionIndex: null,
  recompressionIndex: null,
  swellIndex: null,
  preconsolidationCasagrandeKpa: null,
  preconsolidationPachecoSilvaKpa: null,
  preconsolidationAdoptedKpa: null,
  preconsolidationAdoptedFrom: null,
  overconsolidationRatio: null,
  cvMinM2PerYr: null,
  cvMaxM2PerYr: null,
  secondaryCompressionIndex: null,
  sampleQuality: null,
  approvedById: crypto.randomUUID(),
  approvedByName: 'A',
  approvedAt: '2026-01-01T00:00:00.000Z',
  supersededAt: null,
  supersededByVersion: null,
  ...over,
});
const result = (borehole: string, sample: string, top: number, over: Partial<SoilRecordVersion>): IssuedResult => ({
  recordId: crypto.randomUUID(),
  testId: crypto.randomUUID(),
  testReference: `T-${sample}`,
  boreholeName: borehole,
  sampleReference: sample,
  topDepthM: top,
  bottomDepthM: top + 0.45,
  description: 'clay',
  inSituStressKpa: null,
  current: version(over),
});
const project = { id: crypto.randomUUID(), name: 'P', reference: 'R', clientName: 'C', siteName: '' };

describe('resultsInWords(results)', () => {
  it('counts tests, samples and boreholes and gives the depth span and the spread of Cc, σ′p and OCR', () => {
    const data: ProjectResults = {
      project,
      boreholes: [],
      results: [
        result('BH01', 'U1', 3, { compressionIndex: 0.42, preconsolidationAdoptedKpa: 85, overconsolidationRatio: 1.9 }),
        result('BH01', 'U2', 6, { compressionIndex: 0.38, preconsolidationAdoptedKpa: 130, overconsolidationRatio: 1.94 }),
      ],
    };
    const words = resultsInWords(data);
    expect(words[0]).toBe('The laboratory has approved 2 one-dimensional consolidation (oedometer) tests on 2 undisturbed samples from 1 borehole, taken 3.0 to 6.5 m below ground level.');
    // Both OCRs round to 1.9: one value, not a range.
    expect(words[2]).toBe('Across these tests: Cc from 0.38 to 0.42; σ′p from 85 to 130 kPa; OCR of 1.9.');
  });

  it('says plainly that nothing is approved yet', () => {
    const words = resultsInWords({ project, boreholes: [{ id: crypto.randomUUID(), name: 'BH1', groundLevelMOd: null, waterTableDepthM: null, samples: [] }], results: [] });
    expect(words).toEqual(['1 borehole and 0 samples are recorded for this project. No test result has been approved yet: results appear here as soon as the laboratory approves them.']);
  });
});
