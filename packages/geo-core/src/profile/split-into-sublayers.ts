import type { SoilProfile, Sublayer } from './soil-profile.types.js';

/** How finely to slice each compressible layer: a count per layer, or a largest thickness. */
export type SublayerSpacing = { readonly count: number; readonly maxThicknessM?: never } | { readonly maxThicknessM: number; readonly count?: never };

/**
 * Splits every compressible layer (one with e0 and cc, or with mvM2PerKn) into equal sublayers, so
 * that settlement is integrated with stresses taken at each slice's mid-depth
 * rather than once at the middle of a thick layer, which underestimates the
 * stress increase near the footing and misreads the log of stress.
 *
 * With a count, each compressible layer gets that many slices; with a maximum
 * thickness, each gets ceil(H/hmax) slices of equal thickness.
 * Source: the usual practice of dividing a thick clay into sublayers (Das,
 * *Principles of Foundation Engineering*, consolidation settlement of a thick layer).
 *
 * @param profile the ground model (m)
 * @param spacing { count } slices per layer (integer ≥ 1) or { maxThicknessM } (m, > 0)
 * @returns sublayers top-down, each naming its parent layer
 * @throws RangeError when the count is not a positive integer or the thickness not positive
 * @example splitIntoSublayers({ groundLevelM: 0, waterTableDepthM: 0, layers: [{ name: 'clay', thicknessM: 4, unitWeightKnPerM3: 18, saturatedUnitWeightKnPerM3: 18, e0: 1, cc: 0.3 }] }, { count: 2 }) // two 2 m slices, mid-depths 1 m and 3 m
 */
export function splitIntoSublayers(profile: SoilProfile, spacing: SublayerSpacing): Sublayer[] {
  if (spacing.count !== undefined && !(Number.isInteger(spacing.count) && spacing.count >= 1)) {
    throw new RangeError('splitIntoSublayers requires count to be an integer >= 1');
  }
  if (spacing.maxThicknessM !== undefined && !(spacing.maxThicknessM > 0 && Number.isFinite(spacing.maxThicknessM))) {
    throw new RangeError('splitIntoSublayers requires a finite maxThicknessM > 0');
  }
  const sublayers: Sublayer[] = [];
  let layerTopM = 0;
  profile.layers.forEach((layer, layerIndex) => {
    if ((layer.e0 !== undefined && layer.cc !== undefined) || layer.mvM2PerKn !== undefined) {
      // The 1e-9 keeps 4.0000000001 m / 2 m from becoming three slices through rounding.
      const count = spacing.count ?? Math.max(1, Math.ceil(layer.thicknessM / (spacing.maxThicknessM ?? layer.thicknessM) - 1e-9));
      const thicknessM = layer.thicknessM / count;
      for (let slice = 0; slice < count; slice += 1) {
        const topDepthM = layerTopM + slice * thicknessM;
        sublayers.push({ layerIndex, layerName: layer.name, topDepthM, bottomDepthM: topDepthM + thicknessM, midDepthM: topDepthM + thicknessM / 2, thicknessM });
      }
    }
    layerTopM += layer.thicknessM;
  });
  return sublayers;
}
