/** What the analysis stored about sample quality (geo-core's sampleQuality). */
export type SampleQualityResult = {
  voidRatioChangeRatio: number;
  category: string | null;
  overconsolidationBand?: '1-2' | '2-4' | null;
} | null;

/** What each class means for the use of the results, in plain words. */
const MEANING: Record<string, string> = {
  'very good to excellent':
    'The sample was barely disturbed on its way from the ground to the test, so its measured compressibility and preconsolidation stress represent the ground well.',
  'good to fair': 'The sample was somewhat disturbed. The results are usable; the preconsolidation stress may read a little low and the bend of the curve a little rounded.',
  poor: 'The sample was clearly disturbed. The preconsolidation stress is likely to read low and the compression index may be understated; compare with other tests before relying on it.',
  'very poor': 'The sample was badly disturbed. Its parameters do not represent the ground; do not design from this test alone.',
};

/**
 * Sample quality in words for a reader who is not a laboratory specialist: the class from Lunne,
 * Berre & Strandvik (1997) — Δe/e0 at the in-situ vertical effective stress — and what it means
 * for using the results.
 */
export function sampleQualityInWords(quality: SampleQualityResult): { headline: string; meaning: string } {
  if (!quality) {
    return {
      headline: 'Not assessed',
      meaning: 'Sample quality needs the in-situ vertical effective stress at the sample depth, which was not available for this test.',
    };
  }
  const ratio = `Δe/e0 = ${quality.voidRatioChangeRatio.toFixed(3)} at the in-situ stress`;
  if (!quality.category) {
    return {
      headline: 'Not classed',
      meaning: `${ratio}. The published classes cover overconsolidation ratios of 1 to 4 only, and this sample lies outside them.`,
    };
  }
  const band = quality.overconsolidationBand ? ` (class for OCR ${quality.overconsolidationBand.replace('-', '–')})` : '';
  return {
    headline: quality.category.charAt(0).toUpperCase() + quality.category.slice(1),
    meaning: `${ratio}${band}. ${MEANING[quality.category] ?? ''}`.trim(),
  };
}
