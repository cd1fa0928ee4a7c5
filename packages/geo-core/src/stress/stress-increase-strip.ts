import { stripStressInfluence } from './strip-stress-influence.js';

/** A uniformly loaded strip (infinitely long) and a point in its cross-section. */
export interface StressIncreaseStripInput {
  /** Uniform pressure on the strip, kPa. */
  readonly pressureKpa: number;
  /** Width of the strip, m (> 0). */
  readonly widthM: number;
  /** Horizontal offset of the point from the strip's centre line, m (any sign). */
  readonly xM: number;
  /** Depth of the point below the loaded surface, m (> 0). */
  readonly depthM: number;
}

/**
 * Vertical stress increase below a uniformly loaded flexible strip, from
 * Boussinesq's line-load solution integrated across the width (plane strain).
 *
 * With θ1 = atan((x + B/2)/z) and θ2 = atan((x − B/2)/z), the angles from the
 * vertical to the two edges, Δσz = (q/π)·[θ1 − θ2 + sin θ1 cos θ1 − sin θ2 cos θ2],
 * the same as the printed (q/π)[α + sin α cos(α + 2δ)].
 *
 * Assumptions: elastic half-space, plane strain, flexible uniform load.
 * Source: Das, *Principles of Geotechnical Engineering*, section on a uniformly
 * loaded strip (table of Δσz/q against 2z/B and 2x/B); Poulos & Davis (1974), ch. 2.
 *
 * @param input pressure in kPa, width, offset and depth in m
 * @returns Δσz in kPa
 * @throws RangeError when width or depth are not positive or any value is not finite
 * @example stressIncreaseStrip({ pressureKpa: 100, widthM: 2, xM: 0, depthM: 2 }) // 54.98
 */
export function stressIncreaseStrip(input: StressIncreaseStripInput): number {
  const { pressureKpa, widthM, xM, depthM } = input;
  if (!Number.isFinite(pressureKpa) || !Number.isFinite(xM)) throw new RangeError('stressIncreaseStrip requires finite pressureKpa and xM');
  if (!(widthM > 0) || !Number.isFinite(widthM)) throw new RangeError('stressIncreaseStrip requires finite widthM > 0');
  if (!(depthM > 0) || !Number.isFinite(depthM)) throw new RangeError('stressIncreaseStrip requires finite depthM > 0');
  return pressureKpa * stripStressInfluence(widthM / 2, xM, depthM);
}
