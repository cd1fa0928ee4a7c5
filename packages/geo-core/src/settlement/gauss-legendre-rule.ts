/** Nodes on (−1, 1) and their weights. */
export interface GaussLegendreRule {
  readonly nodes: Float64Array;
  readonly weights: Float64Array;
}

/**
 * The n-point Gauss–Legendre quadrature rule on (−1, 1): the nodes are the
 * roots of the Legendre polynomial Pn, found by Newton's method from
 * Tricomi's starting values cos(π(i − ¼)/(n + ½)), with weights
 * 2/((1 − x²)·Pn′(x)²). Exact for polynomials of degree 2n − 1.
 *
 * Source: Abramowitz & Stegun (1964), *Handbook of Mathematical Functions*,
 * §25.4.29 (the rule) and table 25.4 (nodes and weights to check against).
 *
 * @param pointCount n, an integer from 1 to 200
 * @returns the nodes (ascending) and weights
 * @throws RangeError when n is not an integer in 1–200
 * @example gaussLegendreRule(2) // nodes ∓0.5773502692, weights 1, 1
 */
export function gaussLegendreRule(pointCount: number): GaussLegendreRule {
  if (!Number.isInteger(pointCount) || pointCount < 1 || pointCount > 200) throw new RangeError('gaussLegendreRule requires an integer pointCount from 1 to 200');
  const nodes = new Float64Array(pointCount);
  const weights = new Float64Array(pointCount);
  for (let i = 1; i <= pointCount; i += 1) {
    let x = Math.cos((Math.PI * (i - 0.25)) / (pointCount + 0.5));
    let derivative = 1;
    for (let iteration = 0; iteration < 100; iteration += 1) {
      let previous = 1;
      let current = x;
      for (let degree = 2; degree <= pointCount; degree += 1) {
        const next = ((2 * degree - 1) * x * current - (degree - 1) * previous) / degree;
        previous = current;
        current = next;
      }
      derivative = (pointCount * (x * current - previous)) / (x * x - 1);
      const step = current / derivative;
      x -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    nodes[pointCount - i] = x;
    weights[pointCount - i] = 2 / ((1 - x * x) * derivative * derivative);
  }
  return { nodes, weights };
}
