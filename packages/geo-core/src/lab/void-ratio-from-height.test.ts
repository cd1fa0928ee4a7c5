import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { heightOfSolidsMm } from './height-of-solids.js';
import { voidRatioFromHeight } from './void-ratio-from-height.js';

describe('voidRatioFromHeight(heightMm, heightOfSolidsMm)', () => {
  it('is (H − Hs)/Hs (hand calculation: 25.4 mm over Hs 13.133 mm → 0.93406)', () => {
    expect(voidRatioFromHeight(25.4, 13.133)).toBeCloseTo(12.267 / 13.133, 12);
  });

  it('property: e = e0 − ΔH/Hs, the ASTM D2435/D2435M form, for any compression ΔH', () => {
    fc.assert(
      fc.property(fc.double({ min: 5, max: 15, noNaN: true }), fc.double({ min: 0, max: 4, noNaN: true }), (solidsMm, compressionMm) => {
        const e0 = voidRatioFromHeight(20, solidsMm);
        expect(voidRatioFromHeight(20 - compressionMm, solidsMm)).toBeCloseTo(e0 - compressionMm / solidsMm, 12);
      }),
    );
  });

  it('is zero when the specimen is all solids, and gives e0 from heightOfSolidsMm for a specimen built from it', () => {
    expect(voidRatioFromHeight(13.133, 13.133)).toBe(0);
    // A 63.5 mm ring of 20 mm with e0 = 1.1: Hs = 20/2.1, dry mass Hs·Gs·ρw·A.
    const areaMm2 = (Math.PI * 63.5 ** 2) / 4;
    const solidsMm = heightOfSolidsMm((20 / 2.1) * 2.7 * 0.001 * areaMm2, 2.7, 63.5);
    expect(voidRatioFromHeight(20, solidsMm)).toBeCloseTo(1.1, 12);
  });

  it('throws RangeError for a height not positive and finite', () => {
    expect(() => voidRatioFromHeight(0, 10)).toThrow(new RangeError('voidRatioFromHeight requires positive finite heights'));
    expect(() => voidRatioFromHeight(20, Number.NaN)).toThrow(new RangeError('voidRatioFromHeight requires positive finite heights'));
  });
});
