import type { SoilProfile } from '../profile/soil-profile.types.js';
import type { Footing, StressMethod } from './footing.types.js';
import { footingStressContributionKpa } from './footing-stress-contribution.js';
import { prepareFooting } from './prepare-footing.js';

/** A point in the ground and the footings that load it. */
export interface StressIncreaseFromFootingsInput {
  readonly footings: readonly Footing[];
  /** Plan position of the point, m. */
  readonly xM: number;
  readonly yM: number;
  /** Depth of the point below ground level, m (> 0). */
  readonly depthBelowGroundM: number;
  readonly method: StressMethod;
  /** The footing the point belongs to; needed when neighbours are ignored. */
  readonly ownFootingId?: string;
  /** false: only the own footing counts. Default true. */
  readonly includeNeighbours?: boolean;
  /** The ground model, needed only where a footing's load is gross (σv0 at its founding depth is taken off). */
  readonly profile?: SoilProfile;
}

/** The stress increase at the point, split into the own footing's share and the neighbours'. */
export interface StressIncreaseFromFootingsResult {
  readonly totalKpa: number;
  readonly ownKpa: number;
  readonly neighboursKpa: number;
}

/**
 * Vertical stress increase at a point from several footings, by superposition
 * (linear elasticity makes the contributions add): Δσz = Σ over footings of each
 * footing's own Δσz, with z measured below that footing's base.
 *
 * Boussinesq: a rectangle or square by corner-rectangle superposition
 * (Newmark 1935; Fadum 1948), a circle by the point load integrated over it
 * (circleStressInfluence), a strip by the plane-strain strip solution — each
 * valid for points inside or outside its plan area. 2V:1H: a footing adds its
 * load spread uniformly over its spread area — (B + z) × (L + z), a circle of
 * diameter D + z, or a width B + z under a strip — and nothing outside, the
 * method's own crude picture (footingStressContributionKpa).
 * A footing whose base is at or below the point adds nothing: its half-space
 * starts at its base.
 * Source: Das, *Principles of Geotechnical Engineering*, stress from several
 * loads by superposition; Poulos & Davis (1974), ch. 3.
 *
 * @param input footings (m, kN, kN/m or kPa; net, or gross with the profile), point position (m), depth below ground (m), method
 * @returns total, own and neighbours' Δσz in kPa
 * @throws RangeError when the depth is not positive, a footing is invalid, a load is gross and no profile is given,
 *   or neighbours are ignored without ownFootingId
 * @example stressIncreaseFromFootings({ footings: [{ id: 'A', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 0, pressureKpa: 100 }], xM: 0, yM: 0, depthBelowGroundM: 1, method: 'boussinesq' }) // { totalKpa: 70.09, ownKpa: 70.09, neighboursKpa: 0 }
 */
export function stressIncreaseFromFootings(input: StressIncreaseFromFootingsInput): StressIncreaseFromFootingsResult {
  const { footings, xM, yM, depthBelowGroundM, method, ownFootingId } = input;
  const includeNeighbours = input.includeNeighbours ?? true;
  if (!Number.isFinite(xM) || !Number.isFinite(yM)) throw new RangeError('stressIncreaseFromFootings requires finite xM and yM');
  if (!(depthBelowGroundM > 0) || !Number.isFinite(depthBelowGroundM)) {
    throw new RangeError('stressIncreaseFromFootings requires finite depthBelowGroundM > 0');
  }
  if (!includeNeighbours && ownFootingId === undefined) {
    throw new RangeError('stressIncreaseFromFootings requires ownFootingId when includeNeighbours is false');
  }
  let ownKpa = 0;
  let neighboursKpa = 0;
  for (const footing of footings) {
    const isOwn = footing.id === ownFootingId;
    if (!isOwn && !includeNeighbours) continue;
    const contributionKpa = footingStressContributionKpa(prepareFooting(footing, input.profile ?? null), xM - footing.xM, yM - footing.yM, depthBelowGroundM - footing.depthM, method);
    if (isOwn) ownKpa += contributionKpa;
    else neighboursKpa += contributionKpa;
  }
  return { totalKpa: ownKpa + neighboursKpa, ownKpa, neighboursKpa };
}
