import { signedRectangleInfluence } from './signed-rectangle-influence.js';

/**
 * Adds q·I(z) of one rectangle at a fixed plan offset to a column of depths:
 * out[k] += q·rectangleInfluenceHoll(B/2, L/2, dx, dy, z[k] − base) for every
 * depth below the base. The plan geometry (edge distances, their squares and
 * signs) is worked out once per column instead of once per depth — the
 * settlement check's inner loop, where it saves a third of the time.
 *
 * The formula is rectangleInfluenceHoll's (Holl's form), with the four signed
 * arctangents combined into one: Σ s·atan t = arg Π (1 + i·s·t), a product of
 * four complex numbers and a single atan2 per depth (the settlement check
 * evaluates this two million times). atan2 answers in (−π, π]; the true sum
 * lies in [0, 2π) when the column is under the rectangle (every s = +1, each
 * atan below π/2) and in (−π, π) otherwise (two differences of arctangents
 * each in (−π/2, π/2)), so 2π is added back only under the rectangle when the
 * argument comes out negative. Depths at or above the base add nothing.
 *
 * @param halfWidthM B/2, m
 * @param halfLengthM L/2, m
 * @param dxM offset of the column from the rectangle centre along x, m
 * @param dyM offset along y, m
 * @param baseDepthM depth of the loaded base below ground, m
 * @param pressureKpa uniform pressure q, kPa
 * @param depthsM depths below ground of the column's points, m
 * @param out Δσz accumulators in kPa, one per depth (modified in place)
 * @example addRectangleInfluenceOverDepths(1, 1, 0, 0, 0, 100, Float64Array.of(1), out) // out[0] += 70.088
 */
export function addRectangleInfluenceOverDepths(
  halfWidthM: number,
  halfLengthM: number,
  dxM: number,
  dyM: number,
  baseDepthM: number,
  pressureKpa: number,
  depthsM: Float64Array,
  out: Float64Array,
): void {
  const a1 = halfWidthM - dxM;
  const a2 = halfWidthM + dxM;
  const b1 = halfLengthM - dyM;
  const b2 = halfLengthM + dyM;
  const s11 = (a1 < 0 ? -1 : 1) * (b1 < 0 ? -1 : 1);
  const s12 = (a1 < 0 ? -1 : 1) * (b2 < 0 ? -1 : 1);
  const s21 = (a2 < 0 ? -1 : 1) * (b1 < 0 ? -1 : 1);
  const s22 = (a2 < 0 ? -1 : 1) * (b2 < 0 ? -1 : 1);
  const underRectangle = s11 === 1 && s12 === 1 && s21 === 1 && s22 === 1;
  const aa1 = a1 * a1;
  const aa2 = a2 * a2;
  const bb1 = b1 * b1;
  const bb2 = b2 * b2;
  // Signed products s·|a·b|, so that u = s·t below carries its sign.
  const signedA1B1 = s11 * Math.abs(a1 * b1);
  const signedA1B2 = s12 * Math.abs(a1 * b2);
  const signedA2B1 = s21 * Math.abs(a2 * b1);
  const signedA2B2 = s22 * Math.abs(a2 * b2);
  const shallowLimitM = 1e-6 * (halfWidthM + halfLengthM);
  const scale = pressureKpa / (2 * Math.PI);
  for (let k = 0; k < depthsM.length; k += 1) {
    const zM = (depthsM[k] ?? 0) - baseDepthM;
    if (zM <= 0) continue;
    if (zM < shallowLimitM) {
      // Just below the base t grows without bound; sum the corners one by one there.
      out[k] = (out[k] ?? 0) + pressureKpa * signedRectangleInfluence(a1, a2, b1, b2, zM);
      continue;
    }
    const z2 = zM * zM;
    const inverseZ = 1 / zM;
    const a1z = aa1 + z2;
    const a2z = aa2 + z2;
    const b1z = bb1 + z2;
    const b2z = bb2 + z2;
    const u11 = (signedA1B1 * inverseZ) / Math.sqrt(a1z + bb1);
    const u12 = (signedA1B2 * inverseZ) / Math.sqrt(a1z + bb2);
    const u21 = (signedA2B1 * inverseZ) / Math.sqrt(a2z + bb1);
    const u22 = (signedA2B2 * inverseZ) / Math.sqrt(a2z + bb2);
    // (1 + i·u11)(1 + i·u12) and (1 + i·u21)(1 + i·u22), then their product.
    const x1 = 1 - u11 * u12;
    const y1 = u11 + u12;
    const x2 = 1 - u21 * u22;
    const y2 = u21 + u22;
    let angles = Math.atan2(x1 * y2 + x2 * y1, x1 * x2 - y1 * y2);
    if (underRectangle && angles < 0) angles += 2 * Math.PI;
    const inverseA1 = 1 / a1z;
    const inverseA2 = 1 / a2z;
    const inverseB1 = 1 / b1z;
    const inverseB2 = 1 / b2z;
    const algebraic = z2 * (u11 * (inverseA1 + inverseB1) + u12 * (inverseA1 + inverseB2) + u21 * (inverseA2 + inverseB1) + u22 * (inverseA2 + inverseB2));
    out[k] = (out[k] ?? 0) + scale * (angles + algebraic);
  }
}
