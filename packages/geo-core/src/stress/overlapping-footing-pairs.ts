import type { Footing } from './footing.types.js';
import { prepareFooting } from './prepare-footing.js';
import type { PreparedFooting } from './prepared-footing.js';

/**
 * The pairs of footings whose plan areas overlap (share more than an edge):
 * rectangles and squares as boxes along the x and y axes, circles as discs,
 * strips as bands infinitely long along y. Overlapping footings are almost
 * always a slip in a schedule (a wrong position or size); the stress sums
 * still add both loads where they overlap, so the check warns rather than stops.
 *
 * @param footings the footings (m; loads are not read beyond validation)
 * @returns id pairs in schedule order, each pair once
 * @throws RangeError for an invalid footing (as footingPressureKpa)
 * @example overlappingFootingPairs([{ id: 'A', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 1, loadKn: 1 }, { id: 'B', shape: 'circle', xM: 1.8, yM: 0, widthM: 1, depthM: 1, loadKn: 1 }]) // [['A', 'B']]
 */
export function overlappingFootingPairs(footings: readonly Footing[]): Array<[string, string]> {
  // Only the plan matters: a gross load is read as net so no profile is needed.
  const plans = footings.map((footing) => prepareFooting({ ...footing, pressureBasis: 'net' }, null));
  const pairs: Array<[string, string]> = [];
  for (let i = 0; i < plans.length; i += 1) {
    for (let j = i + 1; j < plans.length; j += 1) {
      const a = plans[i] as PreparedFooting;
      const b = plans[j] as PreparedFooting;
      if (overlap(a, b)) pairs.push([a.id, b.id]);
    }
  }
  return pairs;
}

/** Half extent along y of a box (a band is infinite along y; a disc is handled apart). */
function halfLengthM(footing: PreparedFooting): number {
  return footing.shape === 'strip' ? Infinity : footing.lengthM / 2;
}

function overlap(a: PreparedFooting, b: PreparedFooting): boolean {
  const dx = Math.abs(a.xM - b.xM);
  const dy = Math.abs(a.yM - b.yM);
  if (a.shape === 'circle' && b.shape === 'circle') return Math.hypot(dx, dy) < (a.widthM + b.widthM) / 2;
  if (a.shape === 'circle' || b.shape === 'circle') {
    const disc = a.shape === 'circle' ? a : b;
    const other = a.shape === 'circle' ? b : a;
    // Distance from the disc's centre to the nearest point of the box or band.
    const gapX = Math.max(0, dx - other.widthM / 2);
    const gapY = Math.max(0, dy - halfLengthM(other));
    return Math.hypot(gapX, gapY) < disc.widthM / 2;
  }
  return dx < (a.widthM + b.widthM) / 2 && dy < halfLengthM(a) + halfLengthM(b);
}
