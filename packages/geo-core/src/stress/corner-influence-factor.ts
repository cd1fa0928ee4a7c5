// Beyond this ratio a side is treated as infinite: I(m, n) − I(∞, n) shrinks
// like 1/m, so the difference is below 1e-100, while m²n² would overflow a
// double once m·n passes about 1e154.
const EFFECTIVELY_INFINITE_RATIO = 1e100;

/**
 * Newmark's (1935) influence factor for the vertical stress under a corner of
 * a uniformly loaded rectangle on an elastic half-space, as tabulated by
 * Fadum (1948): Δσz = q·I(m, n) with m = B/z and n = L/z.
 *
 * With V = m² + n² + 1 and V1 = m²n²,
 * I = (1/4π)·[ (2mn√V/(V + V1))·((V + 1)/V) + atan2(2mn√V, V − V1) ].
 * The two-argument arctangent takes the +π branch by itself when V1 > V,
 * which the printed single-argument form needs a note for. When one side is
 * infinite the limit is I(m, ∞) = (1/4π)·[2m/(1 + m²) + atan2(2m, 1 − m²)]
 * (a corner of a semi-infinite strip); both infinite give 1/4.
 *
 * Assumptions: homogeneous, isotropic, linear-elastic half-space (Boussinesq
 * 1885), flexible uniform load, the point at depth z below one corner.
 * Source: Newmark (1935), Univ. Illinois Eng. Exp. Sta. Circular 24; Fadum
 * (1948); tabulated in Das, *Principles of Geotechnical Engineering*, and
 * NAVFAC DM-7.01, figure of influence values for a rectangle corner.
 *
 * @param m width over depth, B/z (dimensionless, ≥ 0; Infinity allowed)
 * @param n length over depth, L/z (dimensionless, ≥ 0; Infinity allowed)
 * @returns the influence factor, a fraction between 0 and 0.25
 * @throws RangeError when m or n is negative or NaN
 * @example cornerInfluenceFactor(1, 1) // 0.17522
 */
export function cornerInfluenceFactor(m: number, n: number): number {
  if (!(m >= 0) || !(n >= 0)) throw new RangeError('cornerInfluenceFactor requires m >= 0 and n >= 0');
  if (m === 0 || n === 0) return 0;
  const mInfinite = m > EFFECTIVELY_INFINITE_RATIO;
  const nInfinite = n > EFFECTIVELY_INFINITE_RATIO;
  if (mInfinite && nInfinite) return 0.25;
  if (mInfinite || nInfinite) {
    const finite = mInfinite ? n : m;
    return (2 * finite / (1 + finite * finite) + Math.atan2(2 * finite, 1 - finite * finite)) / (4 * Math.PI);
  }
  const v = m * m + n * n + 1;
  const v1 = m * m * n * n;
  const twoMnRootV = 2 * m * n * Math.sqrt(v);
  return ((twoMnRootV / (v + v1)) * ((v + 1) / v) + Math.atan2(twoMnRootV, v - v1)) / (4 * Math.PI);
}
