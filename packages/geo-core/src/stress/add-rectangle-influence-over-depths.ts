import { signedRectangleInfluence } from './signed-rectangle-influence.js';

/**
 * Adds q·I(z) of one rectangle at a fixed plan offset to a column of depths:
 * out[k] += q·rectangleInfluenceHoll(B/2, L/2, dx, dy, z[k] − base) for every
 * depth below the base. The plan geometry (edge distances, their squares and
 * signs) is worked out once per column instead of once per depth — the
 * settlement check's inner loop, where it saves a third of the time.
 *
 * The formula is rectangleInfluenceHoll's (Holl's form, arctangents paired);
 * depths at or above the base add nothing.
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
  const aa1 = a1 * a1;
  const aa2 = a2 * a2;
  const bb1 = b1 * b1;
  const bb2 = b2 * b2;
  const absA1B1 = Math.abs(a1 * b1);
  const absA1B2 = Math.abs(a1 * b2);
  const absA2B1 = Math.abs(a2 * b1);
  const absA2B2 = Math.abs(a2 * b2);
  const shallowLimitM = 1e-6 * (halfWidthM + halfLengthM);
  const scale = pressureKpa / (2 * Math.PI);
  for (let k = 0; k < depthsM.length; k += 1) {
    const zM = (depthsM[k] ?? 0) - baseDepthM;
    if (zM <= 0) continue;
    if (zM < shallowLimitM) {
      // Just below the base the paired arctangents could overflow; sum the corners one by one there.
      out[k] = (out[k] ?? 0) + pressureKpa * signedRectangleInfluence(a1, a2, b1, b2, zM);
      continue;
    }
    const z2 = zM * zM;
    const inverseA1 = 1 / (aa1 + z2);
    const inverseA2 = 1 / (aa2 + z2);
    const inverseB1 = 1 / (bb1 + z2);
    const inverseB2 = 1 / (bb2 + z2);
    const t11 = absA1B1 / (zM * Math.sqrt(aa1 + bb1 + z2));
    const t12 = absA1B2 / (zM * Math.sqrt(aa1 + bb2 + z2));
    const t21 = absA2B1 / (zM * Math.sqrt(aa2 + bb1 + z2));
    const t22 = absA2B2 / (zM * Math.sqrt(aa2 + bb2 + z2));
    const angles =
      s11 * (s11 === s12 ? Math.atan2(t11 + t12, 1 - t11 * t12) : Math.atan2(t11 - t12, 1 + t11 * t12)) +
      s21 * (s21 === s22 ? Math.atan2(t21 + t22, 1 - t21 * t22) : Math.atan2(t21 - t22, 1 + t21 * t22));
    const algebraic =
      z2 * (s11 * t11 * (inverseA1 + inverseB1) + s12 * t12 * (inverseA1 + inverseB2) + s21 * t21 * (inverseA2 + inverseB1) + s22 * t22 * (inverseA2 + inverseB2));
    out[k] = (out[k] ?? 0) + scale * (angles + algebraic);
  }
}
