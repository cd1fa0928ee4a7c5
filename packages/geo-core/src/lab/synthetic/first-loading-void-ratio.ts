/** The first-loading (virgin) compression curve of a synthetic test. */
export interface FirstLoadingCurve {
  /** e0, at the starting effective stress. */
  readonly initialVoidRatio: number;
  readonly startingEffectiveStressKpa: number;
  readonly recompressionIndex: number;
  readonly compressionIndex: number;
  /** σ′p: where the recompression and virgin lines (the asymptotes) meet, kPa. */
  readonly preconsolidationStressKpa: number;
  /** Half-width w of the rounded transition, decades of stress; 0 gives a sharp kink at σ′p. */
  readonly transitionHalfWidthDecades: number;
}

/**
 * Void ratio on a synthetic first-loading curve: the recompression line (slope
 * −Cr through e0 at the starting stress) until log σ′p − w, the virgin line
 * (slope −Cc, through the recompression line at σ′p) from log σ′p + w, and
 * between them a transition in which the slope turns from −Cr to −Cc along a
 * smoothstep S(t) = 3t² − 2t³, t = (log σ′ − log σ′p + w)/(2w). The curve is
 * C² (its curvature continuous, peaking at σ′p, as real clays show) and,
 * S being symmetric, its asymptotes still meet exactly at σ′p. Integrating,
 * e = e_r(x) − (Cc − Cr)·w·(2t³ − t⁴) inside the transition; at σ′p itself
 * the curve lies (Cc − Cr)·w·3/16 below the asymptotes' intersection.
 * w = 0 gives the idealised sharp kink.
 *
 * @param curve the curve's parameters (stresses kPa > 0, w ≥ 0 decades).
 * @param stressKpa effective stress, kPa > 0.
 * @returns the void ratio.
 * @throws RangeError when a stress is not positive, w is negative, or the transition starts at or below the starting stress.
 * @example firstLoadingVoidRatio({ initialVoidRatio: 1.1, startingEffectiveStressKpa: 5, recompressionIndex: 0.05, compressionIndex: 0.45, preconsolidationStressKpa: 150, transitionHalfWidthDecades: 0 }, 1500) // 1.1 − 0.05·log10(30) − 0.45 = 0.5761
 */
export function firstLoadingVoidRatio(curve: FirstLoadingCurve, stressKpa: number): number {
  const w = curve.transitionHalfWidthDecades;
  if (!(stressKpa > 0) || !(curve.startingEffectiveStressKpa > 0) || !(curve.preconsolidationStressKpa > 0)) {
    throw new RangeError('firstLoadingVoidRatio requires positive stresses');
  }
  if (!(w >= 0)) throw new RangeError('firstLoadingVoidRatio requires a transition half-width ≥ 0 decades');
  const xStart = Math.log10(curve.startingEffectiveStressKpa);
  const xp = Math.log10(curve.preconsolidationStressKpa);
  if (!(xp - w > xStart)) throw new RangeError('firstLoadingVoidRatio requires the transition to start above the starting stress');
  const x = Math.log10(stressKpa);
  const recompression = curve.initialVoidRatio - curve.recompressionIndex * (x - xStart);
  const beyond = x - xp;
  let excess: number;
  if (beyond >= w) excess = beyond;
  else if (beyond <= -w) excess = 0;
  else {
    const t = (beyond + w) / (2 * w);
    excess = w * (2 * t ** 3 - t ** 4);
  }
  return recompression - (curve.compressionIndex - curve.recompressionIndex) * excess;
}
