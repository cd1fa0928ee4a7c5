import type { CompressionLine, StressVoidRatioLine, StressVoidRatioPoint } from './compression-curve-types.js';
import { naturalCubicSpline } from './natural-cubic-spline.js';

/** Samples of the interpolant over the curvature search, fine enough to place the maximum within 0.1 % of the range. */
const CURVATURE_SAMPLES = 1000;
/** Points of the interpolant returned for drawing. */
const DRAWN_SAMPLES = 48;

/** The curvature convention, stated in every result so a reviewer can repeat the construction. */
export const CASAGRANDE_CURVATURE_CONVENTION =
  'Curvature of e against log10 σ′ in natural units (one log cycle of stress = one unit of void ratio), on a natural cubic spline through the first-loading points, searched between the first point and the start of the virgin line.';

export interface CasagrandePreconsolidationConstruction {
  readonly preconsolidationStressKpa: number;
  readonly curvatureConvention: string;
  readonly maximumCurvaturePoint: StressVoidRatioPoint;
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
  const xs = loadingPoints.map((point) => {
    if (!(point.stressKpa > 0 && Number.isFinite(point.stressKpa)) || !Number.isFinite(point.voidRatio)) {
      throw new RangeError('casagrandePreconsolidation requires positive finite stresses and finite void ratios');
    }
    return Math.log10(point.stressKpa);
  });
  const ys = loadingPoints.map((point) => point.voidRatio);
  if (loadingPoints.length < 3) {
    return { construction: null, warnings: ['Casagrande\'s construction needs at least three points on the first-loading curve.'] };
  }
  const spline = naturalCubicSpline(xs, ys);
  const searchStart = xs[0] as number;
  const searchEnd = Math.min(Math.log10(virginStartStressKpa), xs[xs.length - 1] as number);
  if (!(searchEnd > searchStart)) {
    return { construction: null, warnings: ['The virgin line starts at the first load, so there is no curved part for Casagrande\'s construction.'] };
  }
  let best = { x: searchStart, curvature: -Infinity, value: 0, slope: 0 };
  for (let sample = 0; sample <= CURVATURE_SAMPLES; sample += 1) {
    const x = searchStart + ((searchEnd - searchStart) * sample) / CURVATURE_SAMPLES;
    const { value, slope, secondDerivative } = spline(x);
    // The e–log σ′ curve bends downward (e'' < 0) at the break; that bending is the one sought.
    const curvature = -secondDerivative / (1 + slope * slope) ** 1.5;
    if (curvature > best.curvature) best = { x, curvature, value, slope };
  }
  if (!(best.curvature > 0)) {
    return { construction: null, warnings: ['The first-loading curve does not bend downward before the virgin line, so Casagrande\'s construction has no point of maximum curvature.'] };
  }
  const bisectorSlope = best.slope / (Math.sqrt(1 + best.slope * best.slope) + 1);
  const virginSlope = virginLine.voidRatioPerLogCycle;
  if (!(bisectorSlope > virginSlope)) {
    return { construction: null, warnings: ['The bisector does not meet the virgin line (the virgin line is no steeper than the curve at its sharpest bend).'] };
  }
  const xIntersection = (virginLine.voidRatioAtOneKpa - best.value + bisectorSlope * best.x) / (bisectorSlope - virginSlope);
  const eIntersection = virginLine.voidRatioAtOneKpa + virginSlope * xIntersection;
  const point = (x: number, voidRatio: number): StressVoidRatioPoint => ({ stressKpa: 10 ** x, voidRatio });
  const warnings: string[] = [];
  if (xIntersection < (xs[0] as number) || xIntersection > (xs[xs.length - 1] as number)) {
    warnings.push(`Casagrande's σ′p (${(10 ** xIntersection).toPrecision(3)} kPa) lies outside the stresses applied in the test; treat it as an extrapolation.`);
  }
  const xLast = xs[xs.length - 1] as number;
  const tangentEnd = best.x + 0.5;
  const interpolant: StressVoidRatioPoint[] = [];
  for (let sample = 0; sample < DRAWN_SAMPLES; sample += 1) {
    const x = (xs[0] as number) + ((xLast - (xs[0] as number)) * sample) / (DRAWN_SAMPLES - 1);
    interpolant.push(point(x, spline(x).value));
  }
  return {
    construction: {
      preconsolidationStressKpa: 10 ** xIntersection,
      curvatureConvention: CASAGRANDE_CURVATURE_CONVENTION,
      maximumCurvaturePoint: point(best.x, best.value),
      maximumCurvature: best.curvature,
      tangentSlopePerLogCycle: best.slope,
      horizontalLine: { start: point(best.x, best.value), end: point(xLast, best.value) },
      tangentLine: { start: point(best.x - 0.25, best.value - 0.25 * best.slope), end: point(tangentEnd, best.value + 0.5 * best.slope) },
      bisectorLine: { start: point(best.x, best.value), end: point(xIntersection, eIntersection) },
      virginLine: { start: point(xIntersection, eIntersection), end: point(xLast, virginLine.voidRatioAtOneKpa + virginSlope * xLast) },
      intersection: point(xIntersection, eIntersection),
      interpolant,
    },
    warnings,
  };
}
