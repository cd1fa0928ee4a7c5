/**
 * Quantile of Student's t distribution: the t with P(T ≤ t) = probability for
 * an integer number of degrees of freedom ν.
 *
 * simple-statistics 7.12 has a t test but no t quantile, so this inverts the
 * exact finite-sum distribution function for integer ν (Abramowitz & Stegun
 * 1964, 26.7.3–26.7.4): with θ = atan(t/√ν), P(|T| < t) =
 * (2/π)·[θ + sin θ·(cos θ + (2/3)cos³θ + … )] for odd ν and
 * sin θ·[1 + (1/2)cos²θ + (1·3)/(2·4)cos⁴θ + … ] for even ν, the series ending
 * at the power ν − 2. The sum is monotone in t, so bisection on a bracket
 * found by doubling converges to 1e-12 relative.
 *
 * @param probability P(T ≤ t), strictly between 0 and 1
 * @param degreesOfFreedom ν, an integer ≥ 1 (n − 1 for a sample of n)
 * @returns t, dimensionless
 * @throws RangeError when the probability is not in (0, 1) or ν is not an integer ≥ 1
 * @example studentTQuantile(0.95, 4) // 2.1318 (published t table: 2.132)
 */
export function studentTQuantile(probability: number, degreesOfFreedom: number): number {
  if (!(probability > 0 && probability < 1)) throw new RangeError('studentTQuantile requires probability strictly between 0 and 1');
  if (!(Number.isInteger(degreesOfFreedom) && degreesOfFreedom >= 1)) throw new RangeError('studentTQuantile requires degreesOfFreedom to be an integer >= 1');
  if (probability === 0.5) return 0;
  if (probability < 0.5) return -studentTQuantile(1 - probability, degreesOfFreedom);
  const targetCentralProbability = 2 * probability - 1;
  let lowT = 0;
  let highT = 1;
  while (centralProbability(highT, degreesOfFreedom) < targetCentralProbability) highT *= 2;
  for (let step = 0; step < 200 && highT - lowT > 1e-12 * highT; step += 1) {
    const midT = (lowT + highT) / 2;
    if (centralProbability(midT, degreesOfFreedom) < targetCentralProbability) lowT = midT;
    else highT = midT;
  }
  return (lowT + highT) / 2;
}

/** P(|T| < t) for integer ν, Abramowitz & Stegun 26.7.3 (odd ν) and 26.7.4 (even ν). */
function centralProbability(t: number, degreesOfFreedom: number): number {
  const theta = Math.atan(t / Math.sqrt(degreesOfFreedom));
  const sine = Math.sin(theta);
  const cosine = Math.cos(theta);
  const cosineSquared = cosine * cosine;
  if (degreesOfFreedom % 2 === 0) {
    let term = 1;
    let sum = 1;
    for (let power = 2; power <= degreesOfFreedom - 2; power += 2) {
      term *= ((power - 1) / power) * cosineSquared;
      sum += term;
    }
    return sine * sum;
  }
  if (degreesOfFreedom === 1) return (2 / Math.PI) * theta;
  let term = cosine;
  let sum = cosine;
  for (let power = 3; power <= degreesOfFreedom - 2; power += 2) {
    term *= ((power - 1) / power) * cosineSquared;
    sum += term;
  }
  return (2 / Math.PI) * (theta + sine * sum);
}
