import type { DrainageBoundary } from '../profile/soil-profile.types.js';

/** A clay layer's thickness and its boundaries. */
export interface DrainagePathLengthInput {
  /** Layer thickness, m (> 0). */
  readonly thicknessM: number;
  readonly drainageTop: DrainageBoundary;
  readonly drainageBottom: DrainageBoundary;
}

/**
 * The longest drainage path Hdr of a clay layer in Terzaghi's theory: half the
 * thickness when both faces drain (double drainage), the whole thickness when
 * one does (single drainage), and none when neither does — the layer then
 * cannot consolidate by vertical flow at all.
 *
 * Source: Terzaghi (1943), *Theoretical Soil Mechanics*; Das, *Principles of
 * Geotechnical Engineering*, ch. "Consolidation" (Hdr for one- and two-way drainage).
 *
 * @param input thickness in m and the two boundaries
 * @returns Hdr in m, or null when both boundaries are impermeable
 * @throws RangeError when the thickness is not positive and finite
 * @example drainagePathLengthM({ thicknessM: 6, drainageTop: 'free', drainageBottom: 'free' }) // 3
 */
export function drainagePathLengthM(input: DrainagePathLengthInput): number | null {
  if (!(input.thicknessM > 0) || !Number.isFinite(input.thicknessM)) throw new RangeError('drainagePathLengthM requires a finite thicknessM > 0');
  const drainingFaces = (input.drainageTop === 'free' ? 1 : 0) + (input.drainageBottom === 'free' ? 1 : 0);
  if (drainingFaces === 0) return null;
  return input.thicknessM / drainingFaces;
}
