import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { primaryConsolidationSettlement } from './primary-consolidation-settlement.js';

const base = { thicknessM: 4, e0: 1, cc: 0.35, cs: 0.06, initialEffectiveStressKpa: 74.76, stressIncreaseKpa: 14.32, preconsolidationKpa: 74.76 };

describe('primaryConsolidationSettlement({ thicknessM, e0, cc, cs, initialEffectiveStressKpa, stressIncreaseKpa, preconsolidationKpa })', () => {
  it('normally consolidated: Cc·H/(1 + e0)·log10(σ′1/σ′0)', () => {
    // Hand calculation: 0.35 × 4/2 × log10(89.08/74.76) = 0.7 × 0.0761109 = 0.0532776 m.
    const result = primaryConsolidationSettlement(base);
    expect(result.consolidationCase).toBe('normally-consolidated');
    expect(result.settlementM).toBeCloseTo(0.0532776, 6);
  });

  it('overconsolidated, staying below σ′p: Cs·H/(1 + e0)·log10(σ′1/σ′0)', () => {
    // Hand calculation: 0.06 × 2 × log10(89.08/74.76) = 0.12 × 0.0761109 = 0.0091333 m.
    const result = primaryConsolidationSettlement({ ...base, preconsolidationKpa: 100 });
    expect(result.consolidationCase).toBe('overconsolidated-below');
    expect(result.settlementM).toBeCloseTo(0.0091333, 6);
  });

  it('overconsolidated, passing σ′p: the Cs branch up to σ′p, then the Cc branch', () => {
    // Hand calculation: 0.12 × log10(80/74.76) + 0.7 × log10(89.08/80) = 0.12 × 0.0294207 + 0.7 × 0.0466902 = 0.0035305 + 0.0326832 = 0.0362136 m.
    const result = primaryConsolidationSettlement({ ...base, preconsolidationKpa: 80 });
    expect(result.consolidationCase).toBe('overconsolidated-crossing');
    expect(result.settlementM).toBeCloseTo(0.0362136, 6);
  });

  it('is continuous where the final stress reaches σ′p from either side', () => {
    const below = primaryConsolidationSettlement({ ...base, preconsolidationKpa: 89.08 });
    const above = primaryConsolidationSettlement({ ...base, preconsolidationKpa: 89.08 - 1e-9 });
    expect(above.settlementM).toBeCloseTo(below.settlementM, 9);
  });

  it('is zero without a stress increase', () => {
    expect(primaryConsolidationSettlement({ ...base, stressIncreaseKpa: 0 }).settlementM).toBe(0);
  });

  it('property: grows with the stress increase and never exceeds the normally consolidated value', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 500, noNaN: true }), fc.double({ min: 1, max: 500, noNaN: true }), fc.double({ min: 1, max: 3, noNaN: true }), (sigma0, delta, ocr) => {
        const input = { ...base, initialEffectiveStressKpa: sigma0, stressIncreaseKpa: delta, preconsolidationKpa: sigma0 * ocr };
        const lower = primaryConsolidationSettlement(input).settlementM;
        const higher = primaryConsolidationSettlement({ ...input, stressIncreaseKpa: delta * 1.2 }).settlementM;
        expect(higher).toBeGreaterThan(lower);
        expect(lower).toBeLessThanOrEqual(primaryConsolidationSettlement({ ...input, preconsolidationKpa: sigma0 }).settlementM + 1e-15);
      }),
    );
  });

  it.each([
    [{ thicknessM: 0 }, 'primaryConsolidationSettlement requires a finite thicknessM > 0'],
    [{ e0: 0 }, 'primaryConsolidationSettlement requires a finite e0 > 0'],
    [{ cc: -0.1 }, 'primaryConsolidationSettlement requires finite cc >= 0 and cs >= 0'],
    [{ initialEffectiveStressKpa: 0 }, 'primaryConsolidationSettlement requires a finite initialEffectiveStressKpa > 0'],
    [{ stressIncreaseKpa: -1 }, 'primaryConsolidationSettlement requires a finite stressIncreaseKpa >= 0'],
    [{ preconsolidationKpa: 70 }, 'primaryConsolidationSettlement requires preconsolidationKpa >= initialEffectiveStressKpa'],
    [{ stressIncreaseKpa: Number.NaN }, 'primaryConsolidationSettlement requires a finite stressIncreaseKpa >= 0'],
  ])('throws RangeError for %o', (override, message) => {
    expect(() => primaryConsolidationSettlement({ ...base, ...override })).toThrow(new RangeError(message));
  });
});
