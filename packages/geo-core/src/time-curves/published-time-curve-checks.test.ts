import { describe, expect, it } from 'vitest';
import { coefficientOfVolumeCompressibilityM2PerKn } from '../lab/volume-compressibility.js';
import { hydraulicConductivityMPerS } from '../lab/hydraulic-conductivity.js';
import { primaryConsolidationSettlementMv } from '../settlement/primary-consolidation-settlement-mv.js';
import { timeForPrimaryShare } from '../time-rate/time-for-primary-share.js';
import { convertUnit } from '../units/convert-unit.js';
import { casagrandeLogTime } from './casagrande-log-time.js';
import { coefficientOfConsolidationM2PerYr } from './coefficient-of-consolidation.js';
import { taylorSquareRootTime } from './taylor-square-root-time.js';
import { timeFactorForDegree } from './time-factor-for-degree.js';
import { TIME_FACTOR_AT_FIFTY_PERCENT } from './time-factor-at-fifty-percent.js';
import { TIME_FACTOR_AT_NINETY_PERCENT } from './time-factor-at-ninety-percent.js';

// Published worked examples of time curves and the coefficient of consolidation, each test named by its
// source line. cv in mm²/min (the sources' unit) is had from the library's m²/yr with the unit table.
const cvMm2PerMin = (timeFactor: number, drainagePathMm: number, timeMin: number) =>
  convertUnit(coefficientOfConsolidationM2PerYr(timeFactor, drainagePathMm, timeMin), 'm2PerYr', 'mm2PerMin');

describe('Heriot-Watt University, Foundation Engineering, Class Example 13 (Consolidation 6), solution', () => {
  it('T1: Taylor’s construction — corrected zero 18.955 mm, √t90 = 6.65 min^½ within 3 %', () => {
    // Increment 150 → 250 kPa, specimen thickness (mm) against time (min); the first six times read off the
    // solution's √t axis (0, 0.5, 1, 1.5, 2, 3 min^½). Deformation = 19.000 mm − thickness.
    const thicknessMm: Array<[number, number]> = [
      [0, 19.0], [0.25, 18.908], [1, 18.857], [2.25, 18.805], [4, 18.76], [9, 18.665],
      [16, 18.567], [25, 18.478], [36, 18.419], [49, 18.391], [64, 18.377],
    ];
    const construction = taylorSquareRootTime(thicknessMm.map(([elapsedMin, heightMm]) => ({ elapsedMin, deformationMm: 19 - heightMm }))).construction;
    // Measured: corrected zero 18.954 mm (printed 18.955); √t90 = 6.566 min^½, t90 = 43.1 min — −1.3 % of the printed
    // 6.65, inside the 6.52–6.57 a careful numerical construction gives (the printed value is read off a drawing).
    expect(Math.abs(19 - (construction?.d0Mm ?? Number.NaN) - 18.955)).toBeLessThanOrEqual(0.002);
    expect(Math.abs(Math.sqrt(construction?.t90Min ?? Number.NaN) / 6.65 - 1)).toBeLessThan(0.03);
  });
});

describe('Smith, Elements of Soil Mechanics, Example 12.1 (second half of the solution)', () => {
  // Specimen 12.168 mm at the start and 11.800 mm at the end of the increment, drained both faces.
  // Convention: the source's drainage path is half the mean thickness, d = (12.168 + 11.800)/4 = 5.992 mm
  // (the lab reduction takes half the height at 50 % consolidation, ASTM's H_D50: nearly the same here).
  const drainagePathMm = (12.168 + 11.8) / 4;
  const t90Min = 42.7;

  it('T2: cv = 0.848·d²/t90 = 0.715 mm²/min (printed with 0.85)', () => {
    expect(drainagePathMm).toBeCloseTo(5.992, 12);
    // Ours with Tv = 0.848: 0.848 × 35.904/42.7 = 0.7130 mm²/min, −0.28 % of the printed 0.715 (0.85 gives 0.7147).
    const cv = cvMm2PerMin(TIME_FACTOR_AT_NINETY_PERCENT, drainagePathMm, t90Min);
    expect(Math.abs(cv / 0.715 - 1)).toBeLessThan(0.005);
    expect(Math.abs(cvMm2PerMin(0.85, drainagePathMm, t90Min) / 0.715 - 1)).toBeLessThan(0.0005);
  });

  it('T2: time for U = 75 % in a 10 m layer drained on one face = 128 years (printed with Tv = 0.48)', () => {
    const field = (cvM2PerYr: number) =>
      timeForPrimaryShare([{ primarySettlementM: 1, thicknessM: 10, cvM2PerYr, drainageTop: 'free', drainageBottom: 'impermeable' }], 0.75).timeYears ?? Number.NaN;
    // The book's own rounded factors (0.85 for 90 %, 0.48 for 75 %) through our arithmetic: 0.48 × 10²/(0.7147 × 0.52596) = 127.7 yr.
    const cvBookM2PerYr = coefficientOfConsolidationM2PerYr(0.85, drainagePathMm, t90Min);
    expect(Math.abs((0.48 * 100) / cvBookM2PerYr / 128 - 1)).toBeLessThan(0.005);
    // Ours throughout, with Terzaghi's series (Tv = 0.4767 for 75 %, 0.848 for 90 %): 127.12 yr, −0.69 % of the printed 128,
    // past the fair 0.5 %. Why: the book's rounded time factors make its time (0.48/0.4767)/(0.85/0.848) = 1.0045
    // longer than ours (127.69 yr), and it prints 127.69 as 128 (+0.24 %). Bound for ours: 0.7 %.
    expect(timeFactorForDegree(0.75)).toBeCloseTo(0.477, 3);
    const ours = field(coefficientOfConsolidationM2PerYr(TIME_FACTOR_AT_NINETY_PERCENT, drainagePathMm, t90Min));
    expect(Math.abs(ours / 128 - 1)).toBeLessThan(0.007);
    expect(ours * (0.48 / timeFactorForDegree(0.75)) * (TIME_FACTOR_AT_NINETY_PERCENT / 0.85)).toBeCloseTo((0.48 * 100) / cvBookM2PerYr, 6);
  });

  it('T2: mv for e 0.94 → 0.82 over 100 kPa = 0.000638 m²/kN, referred to the mean void ratio as the book does', () => {
    // Convention: the book divides by 1 + (0.94 + 0.82)/2 = 1.88: 0.12/(1.88 × 100) = 0.00063830 m²/kN.
    const mean = coefficientOfVolumeCompressibilityM2PerKn({ voidRatioBefore: 0.94, voidRatioAfter: 0.82, stressIncreaseKpa: 100, reference: 'mean' });
    expect(Math.abs(mean / 0.000638 - 1)).toBeLessThan(0.005);
    // Referred to the start (ASTM's (ΔH/H1)/Δσ′, the lab reduction's convention): 0.12/(1.94 × 100) = 0.00061856, 3.1 % lower.
    expect(coefficientOfVolumeCompressibilityM2PerKn({ voidRatioBefore: 0.94, voidRatioAfter: 0.82, stressIncreaseKpa: 100 })).toBeCloseTo(0.12 / 194, 15);
  });

  it('T2: k = cv·mv·γw = 4.48 × 10⁻⁶ mm/min', () => {
    // With the book's cv (0.715 mm²/min) and mv (0.000638 m²/kN), γw = 9.81: 0.715 × 0.000638 × 9.81/1000 = 4.475e-6 mm/min.
    const mPerS = hydraulicConductivityMPerS(convertUnit(0.715, 'mm2PerMin', 'm2PerYr'), 0.000638, 9.81);
    const mmPerMin = mPerS * 1000 * 60;
    expect(Math.abs(mmPerMin / 4.48e-6 - 1)).toBeLessThan(0.005);
    // Ours throughout (cv 0.7130 with 0.848, mv on the mean void ratio): 4.465e-6 mm/min, −0.34 %.
    const cvOurs = coefficientOfConsolidationM2PerYr(TIME_FACTOR_AT_NINETY_PERCENT, drainagePathMm, t90Min);
    const mvOurs = coefficientOfVolumeCompressibilityM2PerKn({ voidRatioBefore: 0.94, voidRatioAfter: 0.82, stressIncreaseKpa: 100, reference: 'mean' });
    expect(Math.abs((hydraulicConductivityMPerS(cvOurs, mvOurs, 9.81) * 60_000) / 4.48e-6 - 1)).toBeLessThan(0.005);
  });
});

describe('Powrie, Soil Mechanics: Concepts and Applications, Question 4.4 (a university second-year exam part question) and its published solution', () => {
  // 25 kPa increment, nominal height 20 mm, drained both faces: d = 10 mm. Printed, by the author's own
  // initial-slope construction (neither Taylor's nor Casagrande's): cv = 1.265 mm²/min. A cross-check: both
  // automatic constructions should land within about 25 % of it.
  const timesMin = [0.25, 1, 4, 9, 16, 25, 36, 49, 64, 81, 100, 196];
  const settlementMm = [0.063, 0.075, 0.103, 0.133, 0.16, 0.185, 0.21, 0.228, 0.24, 0.25, 0.258, 0.265];
  const readings = timesMin.map((elapsedMin, index) => ({ elapsedMin, deformationMm: settlementMm[index] as number }));

  it('T3: Taylor’s cv within 25 % of the printed 1.265 mm²/min (measured 1.404, +11 %; a recomputation by hand gave 1.28–1.35)', () => {
    const construction = taylorSquareRootTime(readings).construction;
    const cv = cvMm2PerMin(TIME_FACTOR_AT_NINETY_PERCENT, 10, construction?.t90Min ?? Number.NaN);
    expect(Math.abs(cv / 1.265 - 1)).toBeLessThan(0.25);
  });

  it('T3: Casagrande’s log-time cv within 25 % of the printed 1.265 mm²/min (measured 1.446, +14 %; by hand about 1.5), on a short secondary line it warns of', () => {
    // The readings end at 196 min, 5.4 times the steepest point's time (36 min), short of the 8 times at which the
    // secondary line is normally drawn; the line rests on the last two readings (100 and 196 min), which have
    // flattened to a sixth of the tangent's slope — as the construction is drawn by hand on this record.
    const result = casagrandeLogTime(readings);
    expect(result.warnings.map((warning) => warning.code)).toEqual(['short-secondary-line']);
    const cv = cvMm2PerMin(TIME_FACTOR_AT_FIFTY_PERCENT, 10, result.construction?.t50Min ?? Number.NaN);
    expect(Math.abs(cv / 1.265 - 1)).toBeLessThan(0.25);
  });
});

describe('Atkinson, The Mechanics of Soils and Foundations, Example 15.2', () => {
  it('T4: final settlement mv·Δσ′·H = 1.0 mm, and Tv ≈ 0.05 for 0.25 mm (U = 0.25)', () => {
    // Δσ′ = 100 kPa, sample 20 mm drained both ends, mv = 5 × 10⁻⁴ m²/kN: 5e-4 × 100 × 20 mm = 1.0 mm.
    const settlementMm = primaryConsolidationSettlementMv({ thicknessM: 0.02, mvM2PerKn: 5e-4, stressIncreaseKpa: 100 }) * 1000;
    expect(settlementMm).toBeCloseTo(1.0, 12);
    // U = 0.25/1.0; Terzaghi's series and πU²/4 give 0.0491, printed (rounded) as 0.05: one unit of the printed digit.
    const timeFactor = timeFactorForDegree(0.25 / settlementMm);
    expect(timeFactor).toBeCloseTo((Math.PI / 4) * 0.25 ** 2, 4);
    expect(Math.abs(timeFactor - 0.05)).toBeLessThanOrEqual(0.005);
  });
});
