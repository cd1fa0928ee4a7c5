import { linearRegression, rSquared } from 'simple-statistics';
import type { CompressionLine, StressVoidRatioPoint } from './compression-curve-types.js';

export interface CompressionLineFit {
  readonly line: CompressionLine;
  /** Coefficient of determination of the fit, 1 for two points. */
  readonly rSquared: number;
}

/**
 * Least-squares straight line through points of the e–log10 σ′ curve: the
 * slope is −Cc on the virgin line, −Cr on recompression, −Cs on unloading
 * (ASTM D2435/D2435M §12.2.6; Das, *Principles of Geotechnical Engineering*,
 * "Compression index"). Regression by simple-statistics.
 *
 * @param points at least two points with distinct stresses > 0 kPa.
 * @returns the line and its r².
 * @throws RangeError when fewer than two distinct positive stresses are given or a value is not finite.
 * @example fitCompressionLine([{ stressKpa: 100, voidRatio: 1 }, { stressKpa: 1000, voidRatio: 0.6 }]).line.voidRatioPerLogCycle // -0.4
 */
export function fitCompressionLine(points: readonly StressVoidRatioPoint[]): CompressionLineFit {
  const pairs = points.map((point) => {
    if (!(point.stressKpa > 0 && Number.isFinite(point.stressKpa)) || !Number.isFinite(point.voidRatio)) {
      throw new RangeError('fitCompressionLine requires positive finite stresses and finite void ratios');
    }
    return [Math.log10(point.stressKpa), point.voidRatio];
  });
  if (new Set(pairs.map((pair) => pair[0])).size < 2) {
    throw new RangeError('fitCompressionLine requires at least two distinct stresses');
  }
  const { m, b } = linearRegression(pairs);
  const fitted = (x: number): number => b + m * x;
  const determination = pairs.length === 2 ? 1 : rSquared(pairs, fitted);
  return { line: { voidRatioPerLogCycle: m, voidRatioAtOneKpa: b }, rSquared: Number.isFinite(determination) ? determination : 1 };
}
