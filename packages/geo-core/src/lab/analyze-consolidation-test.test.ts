import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { analyzeConsolidationTest } from './analyze-consolidation-test.js';
import type { ConsolidationTestInput } from './consolidation-test-input.js';
import type { ConsolidationTestResult } from './consolidation-test-result.js';
import { denseReadingTimesMin, syntheticConsolidationTest } from './__fixtures__/synthetic-consolidation-test.js';

const relativeError = (got: number | null, expected: number): number => Math.abs((got ?? Number.POSITIVE_INFINITY) / expected - 1);
const codes = (result: ConsolidationTestResult): string[] => result.warnings.map((warning) => warning.code);

/** Every number anywhere in the result is finite (JSON would silently turn NaN into null). */
function everyNumberFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(everyNumberFinite);
  if (value !== null && typeof value === 'object') return Object.values(value).every(everyNumberFinite);
  return true;
}

describe('analyzeConsolidationTest(input) — ASTM D2435 quantities', () => {
  // Hand calculation (ASTM D2435/D2435M §12.2): D = 63.5 mm → A = π·63.5²/4 = 3166.92 mm²;
  // Ms = 112.3 g, Gs = 2.70 → Hs = 112.3/(2.70 × 0.001 × 3166.92) = 13.1334 mm;
  // H0 = 25.4 mm → e0 = (25.4 − 13.1334)/13.1334 = 0.93400. After 1.27 mm of
  // specimen compression: ε = 1.27/25.4 = 0.0500, H = 24.13 mm, e = 10.9966/13.1334 = 0.83730.
  const input: ConsolidationTestInput = {
    specimen: { initialHeightMm: 25.4, diameterMm: 63.5, specificGravity: 2.7, dryMassG: 112.3, drainage: 'double' },
    increments: [{ index: 1, stressKpa: 100, readings: [{ elapsedMin: 0, deformationMm: 0 }, { elapsedMin: 1440, deformationMm: 1.34 }] }],
    compliance: [{ stressKpa: 0, deflectionMm: 0 }, { stressKpa: 200, deflectionMm: 0.14 }],
  };
  const result = analyzeConsolidationTest(input);

  it('gives the height of solids and e0 of the hand calculation', () => {
    expect(result.specimen.heightOfSolidsMm).toBeCloseTo(13.1334, 4);
    expect(result.initialVoidRatio).toBeCloseTo(0.934, 4);
  });

  it('subtracts the interpolated apparatus deflection (0.07 mm at 100 kPa) before strain and void ratio', () => {
    const [increment] = result.increments;
    expect(increment?.apparatusDeflectionMm).toBeCloseTo(0.07, 10);
    expect(increment?.strainEnd).toBeCloseTo(0.05, 10);
    expect(increment?.heightEndMm).toBeCloseTo(24.13, 10);
    expect(increment?.voidRatioEnd).toBeCloseTo(0.8373, 4);
  });

  it('gives mv = (ΔH/H1)/Δσ′ = (1.27/25.4)/0.1 MPa = 0.500 per MPa (hand calculation)', () => {
    expect(result.increments[0]?.mvPerMPa).toBeCloseTo(0.5, 10);
  });

  it('derives the dry mass from wet mass and water content when no dry mass is given (Md = Mw/(1 + w0))', () => {
    const fromWet = analyzeConsolidationTest({ ...input, specimen: { ...input.specimen, dryMassG: undefined, wetMassG: 112.3 * 1.3, initialWaterContent: 0.3 } });
    expect(fromWet.specimen.dryMassG).toBeCloseTo(112.3, 10);
    expect(fromWet.specimen.dryMassSource).toBe('from-wet-mass');
    // S0 = w0·Gs/e0 = 0.3 × 2.7 / 0.93400 = 0.8672 (hand calculation).
    expect(fromWet.specimen.initialDegreeOfSaturation).toBeCloseTo(0.8672, 3);
  });
});

describe('analyzeConsolidationTest(input) — recovery of a synthetic test built from Terzaghi\'s theory', () => {
  // Generator: Cc 0.45, Cr 0.05, Cs 0.07, σ′p 150 kPa (transition rounded over ±0.2 decade), cv 1.5 m²/yr,
  // Cα/Cc 0.03, seating 0.02 mm, immediate 3 %, noise σ = 0.001 mm. Bounds are set just above
  // the largest error measured over seeds 1–10.
  const seeds = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
  for (const [name, overrides, bounds] of [
    ['hand schedule (15 readings a day)', {}, { cvTaylor: 0.16, cvCasagrande: 0.28, secondary: 0.045 }],
    ['logger record (2,000 readings a day)', { readingTimesMin: denseReadingTimesMin(2000) }, { cvTaylor: 0.04, cvCasagrande: 0.11, secondary: 0.005 }],
  ] as const) {
    it(`recovers Cc, Cr, Cs within 0.5 %, void ratios within 0.0005 and σ′p by Pacheco Silva within 5 % — ${name}`, () => {
      for (const seed of seeds) {
        const test = syntheticConsolidationTest({ ...overrides, seed });
        const result = analyzeConsolidationTest(test.input);
        expect(relativeError(result.compressionIndex, 0.45)).toBeLessThan(0.005);
        expect(relativeError(result.recompressionIndex, 0.05)).toBeLessThan(0.005);
        expect(relativeError(result.swellIndex, 0.07)).toBeLessThan(0.005);
        expect(relativeError(result.preconsolidation.pachecoSilvaKpa, 150)).toBeLessThan(0.05);
        result.increments.forEach((increment, position) => {
          expect(Math.abs(increment.voidRatioEnd - (test.increments[position]?.voidRatioEnd ?? 0))).toBeLessThan(0.0005);
        });
      }
    });

    it(`recovers cv by Taylor within ${bounds.cvTaylor * 100} %, by Casagrande within ${bounds.cvCasagrande * 100} % and Cα within ${bounds.secondary * 100} % — ${name}`, () => {
      for (const seed of seeds) {
        const test = syntheticConsolidationTest({ ...overrides, seed });
        const result = analyzeConsolidationTest(test.input);
        result.increments.forEach((increment, position) => {
          if (increment.kind === 'unloading') return;
          expect(relativeError(increment.cvTaylorM2PerYr, 1.5)).toBeLessThan(bounds.cvTaylor);
          expect(relativeError(increment.cvCasagrandeM2PerYr, 1.5)).toBeLessThan(bounds.cvCasagrande);
          const secondary = test.increments[position]?.secondaryCompressionIndex ?? 0;
          // Cα below 0.005 (recompression increments) is within reading noise of the tail; not compared.
          if (secondary > 0.005) expect(relativeError(increment.secondaryCompressionIndex, secondary)).toBeLessThan(bounds.secondary);
        });
      }
    });
  }

  // σ′p on doubling loads, seeds 1–10. The truth is where the generator's recompression and virgin
  // asymptotes meet; the transition between them is rounded over ±0.2 decade (firstLoadingVoidRatio).
  // Casagrande's construction drawn on the exact curve itself reads +9 % (the method's own reading of a
  // rounded knee, measured on the noise-free curve sampled 180 times a decade), so most of the error below
  // belongs to the method, not to the automation. Bounds are just above the largest error measured.
  it('finds σ′p = 150 kPa by Casagrande within 17.5 % (measured +16.0 to +16.9 %) and by Pacheco Silva within 5 % (measured −4.6 to −4.4 %)', () => {
    for (const seed of seeds) {
      const result = analyzeConsolidationTest(syntheticConsolidationTest({ seed }).input);
      expect(relativeError(result.preconsolidation.casagrandeKpa, 150)).toBeLessThan(0.175);
      expect(relativeError(result.preconsolidation.pachecoSilvaKpa, 150)).toBeLessThan(0.05);
    }
  });

  it.each([110, 130, 170, 190, 250])('finds σ′p = %s kPa (another place between two doubling loads) by Casagrande within 14 % (measured +5.3 to +13.3 % over all five) and by Pacheco Silva within 10 % (measured −9.4 to −5.0 %)', (preconsolidationStressKpa) => {
    for (const seed of seeds) {
      const result = analyzeConsolidationTest(syntheticConsolidationTest({ seed, preconsolidationStressKpa }).input);
      expect(relativeError(result.preconsolidation.casagrandeKpa, preconsolidationStressKpa)).toBeLessThan(0.14);
      expect(relativeError(result.preconsolidation.pachecoSilvaKpa, preconsolidationStressKpa)).toBeLessThan(0.1);
    }
  });

  it('finds Casagrande\'s σ′p within 18.5 % of 150 kPa on the idealised sharp kink (measured +17.0 to +17.8 %; the cubic spline used before gave +33 %)', () => {
    for (const seed of seeds) {
      const result = analyzeConsolidationTest(syntheticConsolidationTest({ seed, transitionHalfWidthDecades: 0 }).input);
      expect(relativeError(result.preconsolidation.casagrandeKpa, 150)).toBeLessThan(0.185);
    }
  });

  it('finds Casagrande\'s σ′p within 12 % of 150 kPa when stresses are closely spaced (10 a decade; measured +6.0 to +11.3 %)', () => {
    const stressesKpa = Array.from({ length: 25 }, (_, step) => 10 * 10 ** (step / 10));
    for (const seed of seeds) {
      const result = analyzeConsolidationTest(syntheticConsolidationTest({ seed, stressesKpa }).input);
      expect(relativeError(result.preconsolidation.casagrandeKpa, 150)).toBeLessThan(0.12);
    }
  });

  it('reports OCR = σ′p/σ′v0 and a Lunne category when the in-situ stress is given', () => {
    const test = syntheticConsolidationTest();
    const result = analyzeConsolidationTest({ ...test.input, specimen: { ...test.input.specimen, inSituVerticalEffectiveStressKpa: 80 } });
    expect(result.overconsolidationRatio).toBeCloseTo((result.preconsolidation.adoptedKpa ?? 0) / 80, 12);
    expect(result.sampleQuality?.category).not.toBeNull();
    expect(result.sampleQuality?.voidRatioChangeRatio).toBeGreaterThan(0);
  });

  it('has no NaN or Infinity anywhere in the result', () => {
    const test = syntheticConsolidationTest();
    const result = analyzeConsolidationTest({ ...test.input, specimen: { ...test.input.specimen, inSituVerticalEffectiveStressKpa: 80 } });
    expect(everyNumberFinite(result)).toBe(true);
    expect(everyNumberFinite(JSON.parse(JSON.stringify(result)))).toBe(true);
  });
});

describe('analyzeConsolidationTest(input) — properties', () => {
  it('keeps e0 and every void ratio consistent with the heights: e = (H − Hs)/Hs, H = H0 − d', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 15, max: 30, noNaN: true }),
        fc.double({ min: 40, max: 80, noNaN: true }),
        fc.double({ min: 0.4, max: 2.5, noNaN: true }),
        fc.array(fc.double({ min: 0, max: 0.2, noNaN: true }), { minLength: 1, maxLength: 6 }),
        (heightMm, diameterMm, voidRatio, steps) => {
          const solidsMm = heightMm / (1 + voidRatio);
          const dryMassG = solidsMm * 2.7 * 0.001 * (Math.PI * diameterMm ** 2) / 4;
          let deformation = 0;
          const increments = steps.map((step, position) => {
            deformation += step;
            return { index: position + 1, stressKpa: 25 * 2 ** position, readings: [{ elapsedMin: 0, deformationMm: deformation - step }, { elapsedMin: 1440, deformationMm: deformation }] };
          });
          const result = analyzeConsolidationTest({ specimen: { initialHeightMm: heightMm, diameterMm, specificGravity: 2.7, dryMassG, drainage: 'double' }, increments });
          expect(result.initialVoidRatio).toBeCloseTo(voidRatio, 9);
          for (const increment of result.increments) {
            expect(increment.heightEndMm).toBeCloseTo(heightMm - increment.deformationEndMm, 9);
            expect(increment.voidRatioEnd).toBeCloseTo((increment.heightEndMm - result.specimen.heightOfSolidsMm) / result.specimen.heightOfSolidsMm, 9);
          }
        },
      ),
      { numRuns: 50 },
    );
  });

  it('doubling every deformation leaves t50 and t90 unchanged, so cv changes only through Hdr (cv·(Hdr₁/Hdr₂)² is unchanged)', () => {
    const test = syntheticConsolidationTest({ initialHeightMm: 40 });
    const doubled: ConsolidationTestInput = {
      ...test.input,
      increments: test.input.increments.map((increment) => ({ ...increment, readings: increment.readings.map((r) => ({ ...r, deformationMm: 2 * r.deformationMm })) })),
    };
    const a = analyzeConsolidationTest(test.input);
    const b = analyzeConsolidationTest(doubled);
    a.increments.forEach((increment, position) => {
      const other = b.increments[position];
      if (increment.taylor === null || other?.taylor == null) return;
      expect(other.taylor.t90Min).toBeCloseTo(increment.taylor.t90Min, 8);
      expect(other.taylor.cvM2PerYr * (increment.taylor.drainagePathMm / other.taylor.drainagePathMm) ** 2).toBeCloseTo(increment.taylor.cvM2PerYr, 8);
      expect(other.casagrande?.t50Min).toBeCloseTo(increment.casagrande?.t50Min ?? Number.NaN, 8);
    });
  });

  it('scaling every elapsed time by k scales every cv by 1/k', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 20, noNaN: true }), (k) => {
        const test = syntheticConsolidationTest();
        const scaled: ConsolidationTestInput = {
          ...test.input,
          increments: test.input.increments.map((increment) => ({ ...increment, readings: increment.readings.map((r) => ({ ...r, elapsedMin: k * r.elapsedMin })) })),
        };
        const a = analyzeConsolidationTest(test.input);
        const b = analyzeConsolidationTest(scaled);
        a.increments.forEach((increment, position) => {
          if (increment.cvTaylorM2PerYr === null) return;
          expect((b.increments[position]?.cvTaylorM2PerYr ?? 0) * k).toBeCloseTo(increment.cvTaylorM2PerYr, 6);
          expect((b.increments[position]?.cvCasagrandeM2PerYr ?? 0) * k).toBeCloseTo(increment.cvCasagrandeM2PerYr ?? Number.NaN, 6);
        });
      }),
      { numRuns: 20 },
    );
  });

  it('Cc, Cr and Cs do not depend on the stress unit, and σ′p scales with it', () => {
    fc.assert(
      fc.property(fc.constantFrom(1 / 98.0665, 1 / 6.894757, 1000, 0.001, 3.7), (factor) => {
        const test = syntheticConsolidationTest();
        const scaled: ConsolidationTestInput = { ...test.input, increments: test.input.increments.map((increment) => ({ ...increment, stressKpa: factor * increment.stressKpa })) };
        const a = analyzeConsolidationTest(test.input);
        const b = analyzeConsolidationTest(scaled);
        expect(b.compressionIndex).toBeCloseTo(a.compressionIndex ?? Number.NaN, 10);
        expect(b.recompressionIndex).toBeCloseTo(a.recompressionIndex ?? Number.NaN, 10);
        expect(b.swellIndex).toBeCloseTo(a.swellIndex ?? Number.NaN, 10);
        expect((b.preconsolidation.casagrandeKpa ?? 0) / factor).toBeCloseTo(a.preconsolidation.casagrandeKpa ?? Number.NaN, 6);
        expect((b.preconsolidation.pachecoSilvaKpa ?? 0) / factor).toBeCloseTo(a.preconsolidation.pachecoSilvaKpa ?? Number.NaN, 6);
      }),
    );
  });
});

describe('analyzeConsolidationTest(input) — warnings and picks', () => {
  it('warns when fewer than three points define the virgin line', () => {
    const result = analyzeConsolidationTest(syntheticConsolidationTest({ stressesKpa: [25, 50, 100, 200, 400] }).input);
    expect(result.compressionFit?.incrementIndices.length).toBeLessThan(3);
    expect(codes(result)).toContain('few-virgin-points');
  });

  it('warns and gives a null Cs when the test has no unload branch', () => {
    const result = analyzeConsolidationTest(syntheticConsolidationTest({ stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 1600] }).input);
    expect(result.swellIndex).toBeNull();
    expect(codes(result)).toContain('no-unload-branch');
  });

  it('warns and gives a null Casagrande cv when primary consolidation is not reached in an increment', () => {
    const result = analyzeConsolidationTest(syntheticConsolidationTest({ cvM2PerYr: 0.05, stressesKpa: [50, 100, 200, 400] }).input);
    expect(result.increments.some((increment) => increment.cvCasagrandeM2PerYr === null)).toBe(true);
    expect(codes(result)).toContain('primary-not-reached');
  });

  it('warns of non-monotonic time and analyses the readings in time order', () => {
    const test = syntheticConsolidationTest();
    const [first, ...rest] = test.input.increments;
    const shuffled = { ...test.input, increments: [{ ...first!, readings: [...first!.readings].reverse() }, ...rest] };
    const result = analyzeConsolidationTest(shuffled);
    expect(codes(result)).toContain('non-monotonic-time');
    expect(result.increments[0]?.cvTaylorM2PerYr).toBeCloseTo(analyzeConsolidationTest(test.input).increments[0]?.cvTaylorM2PerYr ?? Number.NaN, 12);
  });

  it('warns when readings go backwards under load', () => {
    const test = syntheticConsolidationTest();
    const [first, ...rest] = test.input.increments;
    const readings = first!.readings.map((r, position) => (position === 9 ? { ...r, deformationMm: r.deformationMm - 0.05 } : r));
    const result = analyzeConsolidationTest({ ...test.input, increments: [{ ...first!, readings }, ...rest] });
    expect(result.warnings.find((warning) => warning.code === 'readings-backwards')?.incrementIndex).toBe(1);
  });

  it('applies a σ′p pick outside the data but warns, and records it as a pick', () => {
    const test = syntheticConsolidationTest();
    const result = analyzeConsolidationTest({ ...test.input, picks: { preconsolidationStressKpa: 5000 } });
    expect(result.preconsolidation.adoptedKpa).toBe(5000);
    expect(result.preconsolidation.adoptedFrom).toBe('pick');
    expect(codes(result)).toContain('pick-outside-data');
    expect(result.picksApplied).toContainEqual({ target: 'preconsolidationStressKpa', incrementIndex: null, value: 5000, applied: true });
  });

  it('does not apply a t90 pick outside the readings, warns, and records it as not applied', () => {
    const test = syntheticConsolidationTest();
    const result = analyzeConsolidationTest({ ...test.input, picks: { increments: [{ index: 5, taylor: { t90Min: 1e6 } }] } });
    expect(codes(result)).toContain('pick-outside-data');
    expect(result.increments[4]?.taylor?.t90Source).toBe('automatic');
    expect(result.picksApplied).toContainEqual({ target: 'taylor.t90Min', incrementIndex: 5, value: 1e6, applied: false });
  });

  it('applies a t90 pick and a virgin-line pick and marks them as picks', () => {
    const test = syntheticConsolidationTest();
    const result = analyzeConsolidationTest({ ...test.input, picks: { virginLine: { firstIncrementIndex: 6, lastIncrementIndex: 12 }, increments: [{ index: 5, taylor: { t90Min: 20 } }] } });
    expect(result.increments[4]?.taylor?.t90Min).toBe(20);
    expect(result.increments[4]?.taylor?.t90Source).toBe('pick');
    expect(result.compressionFit?.source).toBe('pick');
    expect(result.compressionFit?.incrementIndices).toEqual([6, 7, 12]);
  });

  it('warns when a stress lies outside the apparatus calibration and subtracts the nearest calibrated deflection', () => {
    const test = syntheticConsolidationTest();
    const compliance = [{ stressKpa: 10, deflectionMm: 0.01 }, { stressKpa: 800, deflectionMm: 0.09 }];
    const result = analyzeConsolidationTest({ ...test.input, compliance });
    const outside = result.warnings.filter((warning) => warning.code === 'compliance-outside-calibration').map((warning) => warning.incrementIndex);
    // Only increment 12 (1600 kPa) lies outside 10–800 kPa.
    expect(outside).toEqual([12]);
    expect(result.increments[11]?.apparatusDeflectionMm).toBe(0.09);
    // Inside: 400 kPa is (400 − 10)/(800 − 10) of the way, 0.01 + 0.08 × 390/790 = 0.049494 mm (hand calculation).
    expect(result.increments[5]?.apparatusDeflectionMm).toBeCloseTo(0.049494, 6);
  });

  it('warns when the dry mass given and wet mass/(1 + w0) disagree by more than 1 %, and uses the dry mass given', () => {
    const test = syntheticConsolidationTest();
    const dryMassG = test.input.specimen.dryMassG as number;
    const agreeing = analyzeConsolidationTest({ ...test.input, specimen: { ...test.input.specimen, wetMassG: dryMassG * 1.4 * 1.005, initialWaterContent: 0.4 } });
    expect(codes(agreeing)).not.toContain('mass-inconsistent');
    const result = analyzeConsolidationTest({ ...test.input, specimen: { ...test.input.specimen, wetMassG: dryMassG * 1.4 * 1.03, initialWaterContent: 0.4 } });
    const warning = result.warnings.find((item) => item.code === 'mass-inconsistent');
    expect(warning?.message).toContain('3.0 %');
    expect(result.specimen.dryMassG).toBe(dryMassG);
    expect(result.specimen.dryMassSource).toBe('given');
  });

  it.each([
    ['a zero height', { initialHeightMm: 0 }],
    ['an unknown drainage', { drainage: 'top' as never }],
    ['no dry mass and no wet mass', { dryMassG: undefined }],
  ])('throws a RangeError for %s', (_, specimen) => {
    const test = syntheticConsolidationTest();
    expect(() => analyzeConsolidationTest({ ...test.input, specimen: { ...test.input.specimen, ...specimen } })).toThrow(RangeError);
  });
});
