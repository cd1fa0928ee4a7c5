import type { StressVoidRatioPoint } from './compression-curve-types.js';
import { naturalQuinticSpline, type SplineSample } from './natural-quintic-spline.js';

/**
 * The smooth first-loading curve e(log10 σ′) both σ′p constructions are drawn
 * on, so the web draws one curve for both: the natural quintic spline through
 * the points (three or more), or the straight line through two.
 *
 * @param loadingPoints first-loading points, stresses positive and strictly increasing, at least two.
 * @returns an evaluator on x = log10(σ′/1 kPa): e, de/dx and d²e/dx².
 * @throws RangeError when fewer than two points are given, or a stress is not positive and finite, or a void ratio not finite, or stresses do not increase.
 * @example compressionCurveInterpolant([{ stressKpa: 10, voidRatio: 1 }, { stressKpa: 100, voidRatio: 0.9 }])(1.5).value // 0.95
 */
export function compressionCurveInterpolant(loadingPoints: readonly StressVoidRatioPoint[]): (x: number) => SplineSample {
  const xs = loadingPoints.map((point) => {
    if (!(point.stressKpa > 0 && Number.isFinite(point.stressKpa)) || !Number.isFinite(point.voidRatio)) {
      throw new RangeError('compressionCurveInterpolant requires positive finite stresses and finite void ratios');
    }
    return Math.log10(point.stressKpa);
  });
  const ys = loadingPoints.map((point) => point.voidRatio);
  if (xs.length < 2) throw new RangeError('compressionCurveInterpolant requires at least two points');
  if (xs.length > 2) return naturalQuinticSpline(xs, ys);
  const [x0, x1] = xs as [number, number];
  const [y0, y1] = ys as [number, number];
  if (!(x1 > x0)) throw new RangeError('compressionCurveInterpolant requires strictly increasing stresses');
  const slope = (y1 - y0) / (x1 - x0);
  return (x: number) => ({ value: y0 + slope * (x - x0), slope, secondDerivative: 0 });
}
