import type { PathPoint } from './branch-fits.js';
import { casagrandePreconsolidation } from './casagrande-preconsolidation.js';
import type { ConsolidationPicks } from './consolidation-test-input.js';
import type { AppliedPick, CompressionIndexFit, ConsolidationTestResult } from './consolidation-test-result.js';
import type { ConsolidationWarningCode } from './consolidation-warning.js';
import { fitCompressionLine } from './fit-compression-line.js';
import { pachecoSilvaPreconsolidation } from './pacheco-silva-preconsolidation.js';
import { selectVirginLine } from './select-virgin-line.js';

export interface PreconsolidationAndCompression {
  readonly compressionFit: CompressionIndexFit | null;
  readonly preconsolidation: ConsolidationTestResult['preconsolidation'];
}

/**
 * The virgin compression line (Cc) and σ′p by Casagrande's and Pacheco
 * Silva's constructions on the first-loading points of the path, honouring the
 * reviewer's virgin-line and σ′p picks (recorded in picksApplied, warned when
 * outside the data or not usable).
 *
 * @param path every increment's end point in test order.
 * @param initialVoidRatio e0.
 * @param picks the reviewer's picks.
 * @param warn collects warnings; @param picksApplied collects the picks' records.
 * @returns Cc's fit and the preconsolidation block of the result.
 * @example preconsolidationAndCompression(path, 1.1, {}, warn, []).compressionFit?.value
 */
export function preconsolidationAndCompression(
  path: readonly PathPoint[],
  initialVoidRatio: number,
  picks: ConsolidationPicks,
  warn: (code: ConsolidationWarningCode, message: string, incrementIndex?: number | null) => void,
  picksApplied: AppliedPick[],
): PreconsolidationAndCompression {
  const loading = path.filter((point) => point.kind === 'loading');
  let virgin = selectVirginLine(loading).map((position) => loading[position] as PathPoint);
  let source: 'automatic' | 'pick' = 'automatic';
  if (picks.virginLine !== undefined) {
    const { firstIncrementIndex, lastIncrementIndex } = picks.virginLine;
    const from = path.findIndex((point) => point.index === firstIncrementIndex);
    const to = path.findIndex((point) => point.index === lastIncrementIndex);
    const chosen = from < 0 || to < from ? [] : path.slice(from, to + 1).filter((point) => point.kind === 'loading');
    const usable = new Set(chosen.map((point) => point.stressKpa)).size >= 2;
    picksApplied.push({ target: 'virginLine', incrementIndex: null, value: { firstIncrementIndex, lastIncrementIndex }, applied: usable });
    if (usable) {
      virgin = chosen;
      source = 'pick';
    } else {
      warn('pick-not-applied', `The picked virgin line (increments ${firstIncrementIndex} to ${lastIncrementIndex}) does not hold two first-loading increments of this test, so the automatic choice was kept.`);
    }
  }
  let compressionFit: CompressionIndexFit | null = null;
  if (virgin.length < 2) {
    warn('no-virgin-line', 'There are fewer than two first-loading points, so no virgin compression line (Cc) or σ′p can be found.');
  } else {
    const fit = fitCompressionLine(virgin);
    compressionFit = { value: -fit.line.voidRatioPerLogCycle, line: fit.line, rSquared: fit.rSquared, incrementIndices: virgin.map((point) => point.index), source };
    if (virgin.length < 3) {
      warn('few-virgin-points', `Only ${virgin.length} points define the virgin compression line, so Cc and σ′p rest on too few data; load further (at least three increments beyond σ′p) or pick the virgin line.`);
    }
  }
  let casagrande = null;
  let pachecoSilva = null;
  if (compressionFit !== null) {
    const virginStart = Math.min(...virgin.map((point) => point.stressKpa));
    const casagrandeResult = casagrandePreconsolidation(loading, compressionFit.line, virginStart);
    casagrande = casagrandeResult.construction;
    for (const message of casagrandeResult.warnings) warn('preconsolidation-not-found', message);
    const pachecoResult = pachecoSilvaPreconsolidation(loading, compressionFit.line, initialVoidRatio);
    pachecoSilva = pachecoResult.construction;
    for (const message of pachecoResult.warnings) warn('preconsolidation-not-found', message);
  }
  const casagrandeKpa = casagrande?.preconsolidationStressKpa ?? null;
  const pachecoSilvaKpa = pachecoSilva?.preconsolidationStressKpa ?? null;
  let adoptedKpa = casagrandeKpa ?? pachecoSilvaKpa;
  let adoptedFrom: ConsolidationTestResult['preconsolidation']['adoptedFrom'] = casagrandeKpa !== null ? 'casagrande' : pachecoSilvaKpa !== null ? 'pacheco-silva' : null;
  if (picks.preconsolidationStressKpa !== undefined) {
    const stresses = path.map((point) => point.stressKpa);
    const pick = picks.preconsolidationStressKpa;
    if (pick < Math.min(...stresses) || pick > Math.max(...stresses)) {
      warn('pick-outside-data', `The picked σ′p of ${pick} kPa lies outside the stresses applied in the test (${Math.min(...stresses)}–${Math.max(...stresses)} kPa); it was used as given, but check it.`);
    }
    adoptedKpa = pick;
    adoptedFrom = 'pick';
    picksApplied.push({ target: 'preconsolidationStressKpa', incrementIndex: null, value: pick, applied: true });
  }
  return { compressionFit, preconsolidation: { casagrandeKpa, pachecoSilvaKpa, adoptedKpa, adoptedFrom, casagrande, pachecoSilva } };
}
