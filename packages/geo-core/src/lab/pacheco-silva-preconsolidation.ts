import type { CompressionLine, StressVoidRatioLine, StressVoidRatioPoint } from './compression-curve-types.js';
import { compressionCurveInterpolant } from './compression-curve-interpolant.js';

export interface PachecoSilvaPreconsolidationConstruction {
  readonly preconsolidationStressKpa: number;
  /** Virgin line meets the horizontal through e0. */
  readonly pointA: StressVoidRatioPoint;
  /** Straight below A on the curve. */
  readonly pointB: StressVoidRatioPoint;
  /** Straight across from B on the virgin line; its stress is σ′p. */
  readonly pointC: StressVoidRatioPoint;
  readonly initialVoidRatioLine: StressVoidRatioLine;
  readonly virginLine: StressVoidRatioLine;
  readonly verticalLine: StressVoidRatioLine;
  readonly horizontalLine: StressVoidRatioLine;
}

export interface PachecoSilvaPreconsolidationResult {
  readonly construction: PachecoSilvaPreconsolidationConstruction | null;
  readonly warnings: readonly string[];
}

/**
 * Pacheco Silva's (1970) construction of the preconsolidation stress σ′p.
 *
 * Extend the virgin line up to the horizontal through e0 (point A); drop
 * vertically to the compression curve (B); go horizontally back to the
 * virgin line (C); σ′p is C's stress. No curvature is needed, so it is robust
 * for automation. The curve between points is the same natural quintic spline
 * in log σ′ used for Casagrande's construction (compressionCurveInterpolant), so the web draws one curve;
 * below the first applied stress the curve is taken as e0 (the specimen's
 * state before loading), and then σ′p equals A's stress.
 *
 * Source: Pacheco Silva, F. (1970) Uma nova construção gráfica para a
 * determinação da pressão de pré-adensamento de uma amostra de solo, 4º
 * COBRAMSEG, Rio de Janeiro, vol. 2, tomo I, 225–232; ABNT NBR 12007.
 *
 * @param loadingPoints first-loading points (increasing stress, kPa > 0), at least two.
 * @param virginLine the fitted virgin compression line (negative slope).
 * @param initialVoidRatio e0.
 * @returns the construction, or null with a plain-words reason.
 * @throws RangeError when stresses are not positive and strictly increasing or e0 is not finite.
 * @example pachecoSilvaPreconsolidation(points, line, 1.1).construction?.preconsolidationStressKpa
 */
export function pachecoSilvaPreconsolidation(
  loadingPoints: readonly StressVoidRatioPoint[],
  virginLine: CompressionLine,
  initialVoidRatio: number,
): PachecoSilvaPreconsolidationResult {
  if (!Number.isFinite(initialVoidRatio)) throw new RangeError('pachecoSilvaPreconsolidation requires a finite initial void ratio');
  const xs = loadingPoints.map((point) => {
    if (!(point.stressKpa > 0 && Number.isFinite(point.stressKpa)) || !Number.isFinite(point.voidRatio)) {
      throw new RangeError('pachecoSilvaPreconsolidation requires positive finite stresses and finite void ratios');
    }
    return Math.log10(point.stressKpa);
  });
  if (loadingPoints.length < 2) return { construction: null, warnings: ['Pacheco Silva\'s construction needs at least two first-loading points.'] };
  const slope = virginLine.voidRatioPerLogCycle;
  if (!(slope < 0)) return { construction: null, warnings: ['The virgin line does not fall with stress, so Pacheco Silva\'s construction cannot be drawn.'] };
  const spline = compressionCurveInterpolant(loadingPoints);
  const xFirst = xs[0] as number;
  const xLast = xs[xs.length - 1] as number;
  const xA = (initialVoidRatio - virginLine.voidRatioAtOneKpa) / slope;
  const warnings: string[] = [];
  if (xA > xLast) return { construction: null, warnings: ['The virgin line reaches e0 beyond the last applied stress, so Pacheco Silva\'s construction cannot be drawn.'] };
  let eB = initialVoidRatio;
  if (xA < xFirst) {
    warnings.push('The virgin line reaches e0 below the first applied stress; Pacheco Silva\'s σ′p is taken at point A.');
  } else {
    eB = spline(xA).value;
  }
  const xC = (eB - virginLine.voidRatioAtOneKpa) / slope;
  const point = (x: number, voidRatio: number): StressVoidRatioPoint => ({ stressKpa: 10 ** x, voidRatio });
  const pointA = point(xA, initialVoidRatio);
  const pointB = point(xA, eB);
  const pointC = point(xC, eB);
  return {
    construction: {
      preconsolidationStressKpa: 10 ** xC,
      pointA,
      pointB,
      pointC,
      initialVoidRatioLine: { start: point(Math.min(xFirst, xA), initialVoidRatio), end: pointA },
      virginLine: { start: pointA, end: point(xLast, virginLine.voidRatioAtOneKpa + slope * xLast) },
      verticalLine: { start: pointA, end: pointB },
      horizontalLine: { start: pointB, end: pointC },
    },
    warnings,
  };
}
