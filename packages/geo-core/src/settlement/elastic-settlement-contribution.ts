import type { PreparedFooting } from '../stress/prepared-footing.js';
import type { PreparedElasticLayer } from './prepare-settlement-model.js';
import { circleDisplacementFactor } from './circle-displacement-factor.js';
import { steinbrennerFactors } from './steinbrenner-factors.js';
import { steinbrennerFactorsInto } from './steinbrenner-factors-into.js';

/**
 * One footing's immediate settlement at a point offset (dx, dy) from its
 * centre, over layered elastic ground: Steinbrenner's (1934) corner solution
 * superposed over the four signed corner rectangles meeting at the point (as
 * for stresses), and over the layers below the footing base by differences,
 * S = Σ layers q·B′·(1 − ν²)/E·[Is(z_bottom) − Is(z_top)], Is = F1 + (1 − 2ν)/(1 − ν)·F2
 * — the layered use of Steinbrenner's factors set out by Bowles, *Foundation
 * Analysis and Design*, ch. 5. B′ is the shorter side of each corner rectangle.
 * A strip takes the same sum with semi-infinite corner rectangles,
 * Steinbrenner's factors in their m′ → ∞ limit. A circle takes the
 * same route without corners: each layer adds q·[W(z_top) − W(z_bottom)]/E, W the
 * half-space displacement factor below a uniformly loaded circle at the point's
 * radial offset (circleDisplacementFactor) — which is what Steinbrenner's
 * F1 and F2 are for a rectangle's corner.
 *
 * Assumptions: flexible footing, no depth (Fox) reduction here (the caller
 * applies it), the last elastic layer's base taken as rigid.
 *
 * @param footing prepared footing (m, kPa)
 * @param dxM offset along x, m
 * @param dyM offset along y, m
 * @param elasticLayers layers with E (kPa) and ν, top-down
 * @returns settlement in m
 * @example elasticSettlementContributionM(footing, 0, 0, layers) // the centre settlement of a flexible footing
 */
export function elasticSettlementContributionM(footing: PreparedFooting, dxM: number, dyM: number, elasticLayers: readonly PreparedElasticLayer[]): number {
  // Kept small and shape-free: it runs half a million Steinbrenner pairs per check, and V8 inlines only small functions.
  if (footing.shape === 'circle') return footing.pressureKpa * circleLayeredSettlement(footing.widthM / 2, Math.hypot(dxM, dyM), footing.depthM, elasticLayers);
  if (footing.shape === 'strip') return footing.pressureKpa * stripLayeredSettlement(footing.widthM / 2, dxM, footing.depthM, elasticLayers);
  const halfWidthM = footing.widthM / 2;
  const halfLengthM = footing.lengthM / 2;
  return (
    footing.pressureKpa *
    (signedCornerSettlement(halfWidthM - dxM, halfLengthM - dyM, footing.depthM, elasticLayers) +
      signedCornerSettlement(halfWidthM - dxM, halfLengthM + dyM, footing.depthM, elasticLayers) +
      signedCornerSettlement(halfWidthM + dxM, halfLengthM - dyM, footing.depthM, elasticLayers) +
      signedCornerSettlement(halfWidthM + dxM, halfLengthM + dyM, footing.depthM, elasticLayers))
  );
}

// Scratch for F1 and F2: the loop below is synchronous, so one pair serves every call.
const FACTORS = new Float64Array(2);

/** Settlement per unit pressure under the corner of an |a| × |b| rectangle, signed as in the stress superposition. */
function signedCornerSettlement(a: number, b: number, baseDepthM: number, elasticLayers: readonly PreparedElasticLayer[]): number {
  if (a === 0 || b === 0) return 0;
  const absA = Math.abs(a);
  const absB = Math.abs(b);
  const shortM = absA < absB ? absA : absB;
  const lengthRatio = (absA < absB ? absB : absA) / shortM;
  let sum = 0;
  let previousDepthM = 0;
  let previousF1 = 0;
  let previousF2 = 0;
  for (let index = 0; index < elasticLayers.length; index += 1) {
    const layer = elasticLayers[index];
    if (layer === undefined || layer.bottomDepthM <= baseDepthM) continue;
    const topM = Math.max(0, layer.topDepthM - baseDepthM);
    const bottomM = layer.bottomDepthM - baseDepthM;
    if (topM !== previousDepthM) {
      steinbrennerFactorsInto(lengthRatio, topM / shortM, FACTORS);
      previousF1 = FACTORS[0] ?? 0;
      previousF2 = FACTORS[1] ?? 0;
    }
    steinbrennerFactorsInto(lengthRatio, bottomM / shortM, FACTORS);
    const f1 = FACTORS[0] ?? 0;
    const f2 = FACTORS[1] ?? 0;
    const nu = layer.poissonRatio;
    const shapeFactorChange = f1 - previousF1 + ((1 - 2 * nu) / (1 - nu)) * (f2 - previousF2);
    sum += (shortM * (1 - nu * nu) * shapeFactorChange) / layer.elasticModulusKpa;
    previousDepthM = bottomM;
    previousF1 = f1;
    previousF2 = f2;
  }
  return (a > 0) === (b > 0) ? sum : -sum;
}

/** Settlement per unit pressure at radial offset r from a circle's centre, layer by layer: Σ [W(top) − W(bottom)]/E. */
function circleLayeredSettlement(radiusM: number, offsetM: number, baseDepthM: number, elasticLayers: readonly PreparedElasticLayer[]): number {
  let sum = 0;
  for (let index = 0; index < elasticLayers.length; index += 1) {
    const layer = elasticLayers[index];
    if (layer === undefined || layer.bottomDepthM <= baseDepthM) continue;
    const topM = Math.max(0, layer.topDepthM - baseDepthM);
    const bottomM = layer.bottomDepthM - baseDepthM;
    const nu = layer.poissonRatio;
    sum += (circleDisplacementFactor(radiusM, offsetM, topM, nu) - circleDisplacementFactor(radiusM, offsetM, bottomM, nu)) / layer.elasticModulusKpa;
  }
  return sum;
}

/**
 * Settlement per unit pressure at offset dx across a strip: the two semi-infinite corner rectangles on each side of
 * the point's station (four in all), Steinbrenner's factors in their m′ → ∞ limit (steinbrennerFactors), signed as
 * for stresses. Kept apart from signedCornerSettlement so that the rectangles' hot loop stays as small as before.
 */
function stripLayeredSettlement(halfWidthM: number, dxM: number, baseDepthM: number, elasticLayers: readonly PreparedElasticLayer[]): number {
  const side = (a: number): number => {
    if (a === 0) return 0;
    const widthM = Math.abs(a);
    let sum = 0;
    for (const layer of elasticLayers) {
      if (layer.bottomDepthM <= baseDepthM) continue;
      const topM = Math.max(0, layer.topDepthM - baseDepthM);
      const bottomM = layer.bottomDepthM - baseDepthM;
      const nu = layer.poissonRatio;
      const shapeFactor = (depthM: number) => {
        const { f1, f2 } = steinbrennerFactors(Infinity, depthM / widthM);
        return f1 + ((1 - 2 * nu) / (1 - nu)) * f2;
      };
      sum += (widthM * (1 - nu * nu) * (shapeFactor(bottomM) - shapeFactor(topM))) / layer.elasticModulusKpa;
    }
    return a > 0 ? sum : -sum;
  };
  return 2 * (side(halfWidthM - dxM) + side(halfWidthM + dxM));
}
