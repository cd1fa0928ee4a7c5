/**
 * Void ratio from specimen height and height of solids: e = (H − Hs)/Hs
 * (ASTM D2435/D2435M §12.2.3; equivalently e = e0 − ΔH/Hs).
 *
 * @param heightMm current specimen height, mm (> 0).
 * @param heightOfSolidsMm Hs, mm (> 0).
 * @returns e, dimensionless (negative only if the readings compress the specimen past its solids — a data fault the caller reports).
 * @throws RangeError when either height is not positive and finite.
 * @example voidRatioFromHeight(25.4, 13.133) // ≈ 0.934
 */
export function voidRatioFromHeight(heightMm: number, heightOfSolidsMm: number): number {
  if (!(heightMm > 0 && Number.isFinite(heightMm)) || !(heightOfSolidsMm > 0 && Number.isFinite(heightOfSolidsMm))) {
    throw new RangeError('voidRatioFromHeight requires positive finite heights');
  }
  return (heightMm - heightOfSolidsMm) / heightOfSolidsMm;
}
