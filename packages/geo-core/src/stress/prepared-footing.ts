import type { FootingShape } from './footing.types.js';

/**
 * A footing reduced to the numbers the stress and settlement sums need,
 * validated once. lengthM is the rectangle's L, the width again for a square
 * and a circle (D), and Infinity for a strip — internal only: every sum
 * dispatches on shape, and results report a strip's and a circle's length as null.
 */
export interface PreparedFooting {
  readonly id: string;
  readonly shape: FootingShape;
  readonly xM: number;
  readonly yM: number;
  readonly widthM: number;
  readonly lengthM: number;
  readonly depthM: number;
  /** Net pressure at founding level, kPa. */
  readonly pressureKpa: number;
  /** The gross pressure given and the overburden taken off it, kPa; absent for a net load. */
  readonly grossPressureKpa?: number;
  readonly overburdenRemovedKpa?: number;
  /** Fox's depth factor on this footing's immediate settlement under itself (the settlement check's option); absent: 1. */
  readonly immediateDepthFactor?: number;
}
