import type { StressVoidRatioPoint } from './compression-curve-types.js';
import type { CompressionIndexFit, RecompressionIndexFit } from './consolidation-test-result.js';
import { fitCompressionLine } from './fit-compression-line.js';
import type { LoadingKind } from './loading-kinds.js';

/** An increment's end point with its place on the stress path. */
export interface PathPoint extends StressVoidRatioPoint {
  readonly index: number;
  readonly kind: LoadingKind;
}

export interface BranchFits {
  readonly swell: CompressionIndexFit | null;
  readonly recompression: RecompressionIndexFit | null;
}

/** Fit the slope of points that span at least two stresses, as an index (−slope). */
function fitBranch(points: readonly PathPoint[]): CompressionIndexFit | null {
  if (new Set(points.map((point) => point.stressKpa)).size < 2) return null;
  const fit = fitCompressionLine(points);
  return { value: -fit.line.voidRatioPerLogCycle, line: fit.line, rSquared: fit.rSquared, incrementIndices: points.map((point) => point.index), source: 'automatic' };
}

/**
 * Swell index Cs and recompression index Cr from the stress path.
 *
 * Cs: the last unloading branch (the final rebound, the one a designer uses
 * for heave), from the point unloading started through every unloading point
 * of the run. Cr: the first reload branch, from the lowest point of the
 * preceding unloading up to the last reloading point; when the test has no
 * reload, the first-loading points below σ′p (ASTM D2435/D2435M §12.2.6;
 * Holtz & Kovacs §8.7). Each is the negated least-squares slope of e against
 * log10 σ′.
 *
 * @param path every increment's end point in test order.
 * @param preconsolidationStressKpa the adopted σ′p, or null.
 * @returns the fits, null where the branch is missing.
 * @example branchFits(path, 150).swell?.value
 */
export function branchFits(path: readonly PathPoint[], preconsolidationStressKpa: number | null): BranchFits {
  const runs = (kind: LoadingKind): PathPoint[][] => {
    const found: PathPoint[][] = [];
    path.forEach((point, position) => {
      if (point.kind !== kind) return;
      const previous = path[position - 1];
      const current = found[found.length - 1];
      if (current !== undefined && current[current.length - 1] === previous) current.push(point);
      else found.push(previous === undefined ? [point] : [previous, point]);
    });
    return found;
  };
  const unloading = runs('unloading');
  const lastUnloading = unloading[unloading.length - 1];
  const swell = lastUnloading === undefined ? null : fitBranch(lastUnloading);
  const reloading = runs('reloading').filter((run) => run.length > 1 && run.some((point) => point.kind === 'reloading' && point.stressKpa > (run[0] as PathPoint).stressKpa));
  const firstReload = reloading[0];
  if (firstReload !== undefined) {
    const fit = fitBranch(firstReload);
    if (fit !== null) return { swell, recompression: { ...fit, branch: 'reloading' } };
  }
  if (preconsolidationStressKpa === null) return { swell, recompression: null };
  const below = path.filter((point) => point.kind === 'loading' && point.stressKpa < preconsolidationStressKpa);
  const fit = below.length >= 2 ? fitBranch(below) : null;
  return { swell, recompression: fit === null ? null : { ...fit, branch: 'initial-loading' } };
}
