import type { PathPoint } from './branch-fits.js';
import type { ConsolidationTestResult } from './consolidation-test-result.js';
import type { ConsolidationWarningCode } from './consolidation-warning.js';
import { sampleQualityLunne } from './sample-quality-lunne.js';

/**
 * Δe/e0 at the in-situ vertical effective stress and its Lunne et al. (1997)
 * category. e(σ′v0) is read on the first-loading curve, straight in log σ′
 * between points; below the first applied stress, straight in σ′ from
 * (0, e0) — a log axis has no zero.
 *
 * @param path every increment's end point; @param initialVoidRatio e0.
 * @param inSituStressKpa σ′v0, kPa; @param overconsolidationRatio OCR or null.
 * @param warn collects warnings.
 * @returns the assessment, or null when σ′v0 lies beyond the first loading.
 * @example sampleQualityAtInSituStress(path, 1.1, 80, 1.9, warn)?.category
 */
export function sampleQualityAtInSituStress(
  path: readonly PathPoint[],
  initialVoidRatio: number,
  inSituStressKpa: number,
  overconsolidationRatio: number | null,
  warn: (code: ConsolidationWarningCode, message: string) => void,
): ConsolidationTestResult['sampleQuality'] {
  const loading = path.filter((point) => point.kind === 'loading');
  const first = loading[0];
  let voidRatioAtInSituStress: number | null = null;
  if (first !== undefined && inSituStressKpa <= first.stressKpa) {
    voidRatioAtInSituStress = initialVoidRatio + (first.voidRatio - initialVoidRatio) * (inSituStressKpa / first.stressKpa);
  } else {
    for (let position = 1; position < loading.length; position += 1) {
      const high = loading[position] as PathPoint;
      if (inSituStressKpa <= high.stressKpa) {
        const low = loading[position - 1] as PathPoint;
        const fraction = Math.log10(inSituStressKpa / low.stressKpa) / Math.log10(high.stressKpa / low.stressKpa);
        voidRatioAtInSituStress = low.voidRatio + fraction * (high.voidRatio - low.voidRatio);
        break;
      }
    }
  }
  if (voidRatioAtInSituStress === null) {
    warn('sample-quality-not-assessed', `The in-situ stress of ${inSituStressKpa} kPa lies beyond the first loading of the test, so sample quality cannot be assessed.`);
    return null;
  }
  const voidRatioChangeRatio = (initialVoidRatio - voidRatioAtInSituStress) / initialVoidRatio;
  const assessment = overconsolidationRatio === null ? null : sampleQualityLunne(voidRatioChangeRatio, overconsolidationRatio);
  if (overconsolidationRatio === null) warn('sample-quality-not-assessed', 'σ′p could not be found, so the OCR row of Lunne\'s table is unknown and Δe/e0 is reported without a category.');
  else if (assessment === null) warn('sample-quality-not-assessed', `OCR ${overconsolidationRatio.toFixed(1)} is above 4, outside Lunne's table, so Δe/e0 is reported without a category.`);
  return {
    method: 'Lunne, Berre & Strandvik (1997)',
    voidRatioAtInSituStress,
    voidRatioChangeRatio,
    category: assessment?.category ?? null,
    overconsolidationBand: assessment?.overconsolidationBand ?? null,
  };
}
