import type { CompressionLine, StressVoidRatioLine, StressVoidRatioPoint } from './compression-curve-types.js';
import { compressionCurveInterpolant } from './compression-curve-interpolant.js';

/** Samples of the interpolant over the curvature search: places the maximum within 0.05 % of the range. */
const CURVATURE_SAMPLES = 2000;
/** Points of the interpolant returned for drawing. */
const DRAWN_SAMPLES = 64;
/**
 * A point of the curve closer than this (in void ratio) to the virgin line lies
 * on it: ten times the resolution of e given by a 0.001 mm gauge over a 10 mm
 * height of solids.
 */
const ON_VIRGIN_LINE_VOID_RATIO = 0.001;

/** The curvature convention, stated in every result so a reviewer can repeat the construction. */
export const CASAGRANDE_CURVATURE_CONVENTION =
  'Curvature κ = −e″/(1 + e′²)^1.5 of e against x = log10 σ′ in natural units (one log cycle of stress = one unit of void ratio), on the natural quintic spline through the first-loading points, sampled at 2,000 steps between the first point and the start of the virgin line, so the sharpest bend may fall between data points; where that bend lies on the virgin line itself (within 0.001 of e), the sharpest bend of the part still off the line is used.';

export interface CasagrandePreconsolidationConstruction {
  readonly preconsolidationStressKpa: number;
  readonly curvatureConvention: string;
  readonly maximumCurvaturePoint: StressVoidRatioPoint;
  /** Where the maximum was sought: the whole curved part, or (fallback) only where the curve is still off the virgin line. */
  readonly maximumCurvatureSearch: 'whole-curve' | 'off-virgin-line';
  /** Stresses between which the maximum was sought, kPa. */
  readonly searchRange: { readonly fromStressKpa: number; readonly toStressKpa: number };
  /** Curvature there, per unit of the natural axes. */
  readonly maximumCurvature: number;
  /** Slope of the tangent there, Δe per log10 cycle. */
  readonly tangentSlopePerLogCycle: number;
  readonly horizontalLine: StressVoidRatioLine;
  readonly tangentLine: StressVoidRatioLine;
  readonly bisectorLine: StressVoidRatioLine;
  /** The virgin line extended up to the intersection. */
  readonly virginLine: StressVoidRatioLine;
  readonly intersection: StressVoidRatioPoint;
  /** The interpolant, sampled for drawing. */
  readonly interpolant: readonly StressVoidRatioPoint[];
}

export interface CasagrandePreconsolidationResult {
  readonly construction: CasagrandePreconsolidationConstruction | null;
  readonly warnings: readonly string[];
}

/**
 * Casagrande's (1936) construction of the preconsolidation stress σ′p.
 *
 * On e against log10 σ′: at the point of maximum curvature draw a horizontal
 * and the tangent; bisect the angle between them; σ′p is where the bisector
 * meets the upward extension of the virgin compression line. Curvature
 * convention: see CASAGRANDE_CURVATURE_CONVENTION — the construction depends
 * on the plot's scaling, so it is fixed here; scaling every stress by a
 * constant (another unit) only shifts log σ′ and scales σ′p by that constant.
 * Natural units are chosen over plot-normalised ones because they belong to
 * the soil, not to the test: normalising each axis to the data's range would
 * move σ′p whenever one more increment is added, and a usual lab plot (a log
 * cycle about as long as 0.3–0.5 of void ratio is tall) is close to them.
 *
 * Automation: the sharpest bend is sought on a natural quintic spline, whose
 * curvature is smooth between the points (a cubic spline's peaks on a data
 * point, which on doubling loads put σ′p a third too high). Where the
 * sharpest bend lies on the virgin line itself (a bend the loads did not
 * resolve), the bisector would meet the line at that very point; the sharpest
 * bend of the part of the curve still off the line is used instead, with a
 * warning. On a rounded knee the construction itself reads 6–12 % above the
 * intersection of the recompression and virgin asymptotes (package README).
 *
 * Source: Casagrande, A. (1936) The determination of the pre-consolidation
 * load and its practical significance, Proc. 1st ICSMFE, Cambridge MA, vol. 3,
 * 60–64; ASTM D2435/D2435M appendix X1.
 *
 * @param loadingPoints first-loading points (increasing stress, kPa > 0), at least three.
 * @param virginLine the fitted virgin compression line.
 * @param virginStartStressKpa lowest stress of the points on the virgin line, kPa.
 * @returns the construction, or null with a plain-words reason.
 * @throws RangeError when stresses are not positive and strictly increasing.
 * @example casagrandePreconsolidation(points, line, 400).construction?.preconsolidationStressKpa
 */
export function casagrandePreconsolidation(
  loadingPoints: readonly StressVoidRatioPoint[],
  virginLine: CompressionLine,
  virginStartStressKpa: number,
): CasagrandePreconsolidationResult {
  for (const point of loadingPoints) {
    if (!(point.stressKpa > 0 && Number.isFinite(point.stressKpa)) || !Number.isFinite(point.voidRatio)) {
      throw new RangeError('casagrandePreconsolidation requires positive finite stresses and finite void ratios');
    }
  }
  if (loadingPoints.length < 3) {
    return { construction: null, warnings: ['Casagrande\'s construction needs at least three points on the first-loading curve.'] };
  }
  const curve = compressionCurveInterpolant(loadingPoints);
  const xFirst = Math.log10((loadingPoints[0] as StressVoidRatioPoint).stressKpa);
  const xLast = Math.log10((loadingPoints[loadingPoints.length - 1] as StressVoidRatioPoint).stressKpa);
  const searchEnd = Math.min(Math.log10(virginStartStressKpa), xLast);
  if (!(searchEnd > xFirst)) {
    return { construction: null, warnings: ['The virgin line starts at the first load, so there is no curved part for Casagrande\'s construction.'] };
  }
  const virginSlope = virginLine.voidRatioPerLogCycle;
  const virginAt = (x: number): number => virginLine.voidRatioAtOneKpa + virginSlope * x;
  type Bend = { x: number; curvature: number; value: number; slope: number };
  let sharpest: Bend | null = null;
  let sharpestOffLine: Bend | null = null;
  for (let sample = 0; sample <= CURVATURE_SAMPLES; sample += 1) {
    const x = xFirst + ((searchEnd - xFirst) * sample) / CURVATURE_SAMPLES;
    const { value, slope, secondDerivative } = curve(x);
    // The e–log σ′ curve bends downward (e″ < 0) at the break; that bending is the one sought.
    const bend = { x, curvature: -secondDerivative / (1 + slope * slope) ** 1.5, value, slope };
    if (sharpest === null || bend.curvature > sharpest.curvature) sharpest = bend;
    if (Math.abs(virginAt(x) - value) > ON_VIRGIN_LINE_VOID_RATIO && (sharpestOffLine === null || bend.curvature > sharpestOffLine.curvature)) sharpestOffLine = bend;
  }
  if (sharpest === null || !(sharpest.curvature > 0)) {
    return { construction: null, warnings: ['The first-loading curve does not bend downward before the virgin line, so Casagrande\'s construction has no point of maximum curvature.'] };
  }
  const warnings: string[] = [];
  let best = sharpest;
  let search: CasagrandePreconsolidationConstruction['maximumCurvatureSearch'] = 'whole-curve';
  if (Math.abs(virginAt(sharpest.x) - sharpest.value) <= ON_VIRGIN_LINE_VOID_RATIO) {
    const onLineKpa = (10 ** sharpest.x).toPrecision(3);
    if (sharpestOffLine !== null && sharpestOffLine.curvature > 0) {
      best = sharpestOffLine;
      search = 'off-virgin-line';
      warnings.push(`The sharpest bend of the curve (at ${onLineKpa} kPa) lies on the virgin line itself, where Casagrande's construction collapses onto that point; the sharpest bend of the part still off the line (at ${(10 ** best.x).toPrecision(3)} kPa) was used. The loads applied do not resolve the bend well: review the drawn construction, or pick σ′p.`);
    } else {
      warnings.push(`The sharpest bend of the curve (at ${onLineKpa} kPa) lies on the virgin line itself, so Casagrande's σ′p is that point; review the drawn construction, or pick σ′p.`);
    }
  }
  const bisectorSlope = best.slope / (Math.sqrt(1 + best.slope * best.slope) + 1);
  if (!(bisectorSlope > virginSlope)) {
    return { construction: null, warnings: [...warnings, 'The bisector does not meet the virgin line (the virgin line is no steeper than the curve at its sharpest bend).'] };
  }
  const xIntersection = (virginLine.voidRatioAtOneKpa - best.value + bisectorSlope * best.x) / (bisectorSlope - virginSlope);
  const eIntersection = virginAt(xIntersection);
  const point = (x: number, voidRatio: number): StressVoidRatioPoint => ({ stressKpa: 10 ** x, voidRatio });
  if (xIntersection < xFirst || xIntersection > xLast) {
    warnings.push(`Casagrande's σ′p (${(10 ** xIntersection).toPrecision(3)} kPa) lies outside the stresses applied in the test; treat it as an extrapolation.`);
  }
  const interpolant: StressVoidRatioPoint[] = [];
  for (let sample = 0; sample < DRAWN_SAMPLES; sample += 1) {
    const x = xFirst + ((xLast - xFirst) * sample) / (DRAWN_SAMPLES - 1);
    interpolant.push(point(x, curve(x).value));
  }
  return {
    construction: {
      preconsolidationStressKpa: 10 ** xIntersection,
      curvatureConvention: CASAGRANDE_CURVATURE_CONVENTION,
      maximumCurvaturePoint: point(best.x, best.value),
      maximumCurvatureSearch: search,
      searchRange: { fromStressKpa: 10 ** xFirst, toStressKpa: 10 ** searchEnd },
      maximumCurvature: best.curvature,
      tangentSlopePerLogCycle: best.slope,
      horizontalLine: { start: point(best.x, best.value), end: point(xLast, best.value) },
      tangentLine: { start: point(best.x - 0.25, best.value - 0.25 * best.slope), end: point(best.x + 0.5, best.value + 0.5 * best.slope) },
      bisectorLine: { start: point(best.x, best.value), end: point(xIntersection, eIntersection) },
      virginLine: { start: point(xIntersection, eIntersection), end: point(xLast, virginAt(xLast)) },
      intersection: point(xIntersection, eIntersection),
      interpolant,
    },
    warnings,
  };
}
