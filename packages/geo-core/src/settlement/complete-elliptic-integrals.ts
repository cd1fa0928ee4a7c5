/** Complete elliptic integrals of the first and second kind. */
export interface CompleteEllipticIntegrals {
  readonly k: number;
  readonly e: number;
}

/**
 * K(k) = ∫₀^π/2 dθ/√(1 − k² sin²θ) and E(k) = ∫₀^π/2 √(1 − k² sin²θ) dθ, by
 * Gauss's arithmetic–geometric mean: with a0 = 1, b0 = √(1 − k²), c0 = k and
 * a(n+1) = (an + bn)/2, b(n+1) = √(an·bn), c(n+1) = (an − bn)/2,
 * K = π/(2·a∞) and E = K·(1 − Σ 2^(n−1)·cn²). Quadratic convergence: five or six
 * steps reach double precision for k < 1.
 *
 * Source: Abramowitz & Stegun (1964), *Handbook of Mathematical Functions*,
 * §17.6 (the AGM) — modulus k, not parameter m = k².
 *
 * @param modulus k, 0 ≤ k < 1
 * @returns K and E
 * @throws RangeError when k is outside [0, 1)
 * @example completeEllipticIntegrals(0) // { k: π/2, e: π/2 }
 */
export function completeEllipticIntegrals(modulus: number): CompleteEllipticIntegrals {
  if (!(modulus >= 0 && modulus < 1)) throw new RangeError('completeEllipticIntegrals requires 0 <= modulus < 1');
  let a = 1;
  let b = Math.sqrt(1 - modulus * modulus);
  let c = modulus;
  let weight = 0.5;
  let sum = weight * c * c;
  for (let step = 0; step < 40 && Math.abs(c) > 1e-17; step += 1) {
    const nextA = (a + b) / 2;
    c = (a - b) / 2;
    b = Math.sqrt(a * b);
    a = nextA;
    weight *= 2;
    sum += weight * c * c;
  }
  const k = Math.PI / (2 * a);
  return { k, e: k * (1 - sum) };
}
