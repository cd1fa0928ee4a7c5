/** Largest number of intervals on the half rim; beyond it a point lies within 1e-4·R of the rim at a depth below 1e-4·R. */
const MAXIMUM_HALF_RIM_INTERVALS = 16384;
/** e^(−α·2n) below 1e-13 needs α·n ≥ 15. */
const EXPONENT_FOR_1E_13 = 15;

const COSINE_TABLES = new Map<number, Float64Array>();

/**
 * The rule by which a circle's rim integrals are summed: the trapezoidal rule
 * over the rim angle t, on [0, π] by the integrand's symmetry (it depends on
 * t through cos t only). For a smooth periodic integrand the trapezoidal rule
 * converges geometrically, its error about e^(−α·N) for N points on the full
 * rim, where α is the distance of the nearest singularity from the real axis;
 * for the Boussinesq kernels below a circle of radius a at offset r and depth z
 * that singularity sits where the distance to the rim squared equals −z², at
 * α = acosh((a² + r² + z²)/(2ar)). The number of intervals is chosen so that
 * e^(−α·N) < 1e-13: a handful far from the circle, thousands just below its rim.
 *
 * Source: Trefethen & Weideman (2014), "The exponentially convergent trapezoidal
 * rule", SIAM Review 56(3):385–458.
 *
 * @param radiusM a, m (> 0)
 * @param offsetM r, horizontal distance of the point from the circle's centre, m (> 0)
 * @param depthM z, m (≥ 0)
 * @returns cos t at the n + 1 nodes t = πk/n, k = 0…n (n a power of two, 4 ≤ n ≤ 16384); shared tables: do not modify
 * @example circleRimCosines(1, 3, 1).length // 9 (n = 8: α = 1.21, far from the rim)
 */
export function circleRimCosines(radiusM: number, offsetM: number, depthM: number): Float64Array {
  const alpha = Math.acosh((radiusM * radiusM + offsetM * offsetM + depthM * depthM) / (2 * radiusM * offsetM));
  let intervals = 4;
  while (intervals < MAXIMUM_HALF_RIM_INTERVALS && intervals * alpha < EXPONENT_FOR_1E_13) intervals *= 2;
  let table = COSINE_TABLES.get(intervals);
  if (table === undefined) {
    table = Float64Array.from({ length: intervals + 1 }, (_, k) => Math.cos((Math.PI * k) / intervals));
    COSINE_TABLES.set(intervals, table);
  }
  return table;
}
