import { describe, expect, it } from 'vitest';
import { sampleQualityInWords } from './sample-quality-words';

describe('sampleQualityInWords(quality)', () => {
  it('names the class with its ratio and band, and what it means for using the results', () => {
    const words = sampleQualityInWords({ voidRatioChangeRatio: 0.0312, category: 'very good to excellent', overconsolidationBand: '1-2' });
    expect(words.headline).toBe('Very good to excellent');
    expect(words.meaning).toMatch(/^Δe\/e0 = 0\.031 at the in-situ stress \(class for OCR 1–2\)\. The sample was barely disturbed/);
  });

  it('warns against designing from a very poor sample', () => {
    expect(sampleQualityInWords({ voidRatioChangeRatio: 0.2, category: 'very poor', overconsolidationBand: '1-2' }).meaning).toMatch(/do not design from this test alone/);
  });

  it('says why when there is no class: no in-situ stress, or an OCR outside the table', () => {
    expect(sampleQualityInWords(null).headline).toBe('Not assessed');
    expect(sampleQualityInWords({ voidRatioChangeRatio: 0.05, category: null, overconsolidationBand: null }).meaning).toMatch(/outside them/);
  });
});
