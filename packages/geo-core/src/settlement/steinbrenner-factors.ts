/** Steinbrenner's two factors for one corner rectangle, dimensionless. */
export interface SteinbrennerFactors {
  readonly f1: number;
  readonly f2: number;
}

/**
 * Steinbrenner's (1934) influence factors F1 and F2 for the settlement of the
 * corner of a flexible uniformly loaded rectangle B′ × L′ on an elastic layer of
 * thickness H over a rigid base; m′ = L′/B′, n′ = H/B′:
 * A0 = m′·ln[(1 + √(m′² + 1))·√(m′² + n′²) / (m′·(1 + √(m′² + n′² + 1)))],
 * A1 = ln[(m′ + √(m′² + 1))·√(1 + n′²) / (m′ + √(m′² + n′² + 1))],
 * A2 = m′/(n′·√(m′² + n′² + 1)), F1 = (A0 + A1)/π, F2 = (n′/2π)·atan(A2).
 * As n′ → ∞ F2 → 0 and F1 tends to the half-space corner factor. As m′ → ∞
 * (the corner of a semi-infinite strip, for strip footings in plane strain)
 * A0 → 0, so F1 = ln(1 + n′²)/(2π) and F2 = (n′/2π)·atan(1/n′) — finite for a
 * finite layer; a strip on a half-space (both infinite) settles without bound.
 *
 * Source: Steinbrenner (1934), *Die Strasse* 1:121–124; the equations as printed
 * in Das, *Principles of Foundation Engineering*, elastic settlement, and in
 * Bowles, *Foundation Analysis and Design*, ch. 5. m′ = n′ = 1 gives F1 = 0.1419 and
 * F2 = 1/12 (worked by hand in the tests); F1 and F2 equal the half-space corner
 * displacement at the surface less that at depth H (tested by quadrature).
 *
 * @param lengthRatio m′ = L′/B′, dimensionless (> 0; Infinity for a strip)
 * @param depthRatio n′ = H/B′, dimensionless (≥ 0; Infinity for a half-space)
 * @returns F1 and F2
 * @throws RangeError when m′ ≤ 0, n′ < 0, either is NaN, or both are infinite
 * @example steinbrennerFactors(1, 1) // { f1: 0.1419, f2: 0.0833 }
 */
export function steinbrennerFactors(lengthRatio: number, depthRatio: number): SteinbrennerFactors {
  const m = lengthRatio;
  const n = depthRatio;
  if (!(m > 0)) throw new RangeError('steinbrennerFactors requires lengthRatio > 0');
  if (!(n >= 0)) throw new RangeError('steinbrennerFactors requires depthRatio >= 0');
  if (m === Infinity && n === Infinity) throw new RangeError('steinbrennerFactors requires a finite depthRatio for a strip (lengthRatio Infinity): a strip on an elastic half-space settles without bound');
  if (n === 0) return { f1: 0, f2: 0 };
  if (m === Infinity) return { f1: Math.log1p(n * n) / (2 * Math.PI), f2: (n / (2 * Math.PI)) * Math.atan(1 / n) };
  const rootM = Math.sqrt(m * m + 1);
  if (n === Infinity) return { f1: (m * Math.log((1 + rootM) / m) + Math.log(m + rootM)) / Math.PI, f2: 0 };
  const rootMn = Math.sqrt(m * m + n * n + 1);
  const a0 = m * Math.log(((1 + rootM) * Math.sqrt(m * m + n * n)) / (m * (1 + rootMn)));
  const a1 = Math.log(((m + rootM) * Math.sqrt(1 + n * n)) / (m + rootMn));
  const a2 = m / (n * rootMn);
  return { f1: (a0 + a1) / Math.PI, f2: (n / (2 * Math.PI)) * Math.atan(a2) };
}
