/** Lunne, Berre & Strandvik's (1997) sample-quality categories. */
export type SampleQualityCategory = 'very good to excellent' | 'good to fair' | 'poor' | 'very poor';

/** Boundaries of Δe/e0 for the two OCR bands of the table. */
const BOUNDARIES: Record<'1-2' | '2-4', readonly [number, number, number]> = {
  '1-2': [0.04, 0.07, 0.14],
  '2-4': [0.03, 0.05, 0.1],
};

export interface SampleQualityAssessment {
  readonly category: SampleQualityCategory;
  /** Which row of the table was used. */
  readonly overconsolidationBand: '1-2' | '2-4';
}

/**
 * Sample quality by Lunne, Berre & Strandvik (1997) from Δe/e0, the void-ratio
 * change needed to reload the specimen to its in-situ vertical effective
 * stress, divided by e0.
 *
 * OCR 1–2: < 0.04 very good to excellent, 0.04–0.07 good to fair, 0.07–0.14
 * poor, > 0.14 very poor; OCR 2–4: 0.03, 0.05, 0.10. Convention: a value on a
 * boundary falls in the worse category (each band is [lower, upper)). OCR below
 * 1 (a σ′p under the in-situ stress, itself a sign of disturbance) uses the
 * 1–2 row. Criteria of Lunne, T., Berre, T. & Strandvik, S. (1997) Sample
 * disturbance effects in soft low plastic Norwegian clay, Proc. Symp. Recent
 * Developments in Soil and Pavement Mechanics, Rio de Janeiro, 81–102, as the
 * literature quotes them; the paper was not at hand to check them against.
 *
 * @param voidRatioChangeRatio Δe/e0, dimensionless.
 * @param overconsolidationRatio OCR = σ′p/σ′v0 (> 0).
 * @returns the category, or null when OCR exceeds 4 (outside the table).
 * @throws RangeError when Δe/e0 is not finite or OCR is not positive and finite.
 * @example sampleQualityLunne(0.05, 1.5)?.category // 'good to fair'
 */
export function sampleQualityLunne(voidRatioChangeRatio: number, overconsolidationRatio: number): SampleQualityAssessment | null {
  if (!Number.isFinite(voidRatioChangeRatio)) throw new RangeError('sampleQualityLunne requires a finite Δe/e0');
  if (!(overconsolidationRatio > 0 && Number.isFinite(overconsolidationRatio))) {
    throw new RangeError('sampleQualityLunne requires a positive finite OCR');
  }
  if (overconsolidationRatio > 4) return null;
  const band = overconsolidationRatio < 2 ? '1-2' : '2-4';
  const [good, fair, poor] = BOUNDARIES[band];
  const category: SampleQualityCategory =
    voidRatioChangeRatio < good ? 'very good to excellent' : voidRatioChangeRatio < fair ? 'good to fair' : voidRatioChangeRatio < poor ? 'poor' : 'very poor';
  return { category, overconsolidationBand: band };
}
