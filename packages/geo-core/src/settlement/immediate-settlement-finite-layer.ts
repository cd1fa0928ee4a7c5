import type { FootingShape } from '../stress/footing.types.js';
import { circleDisplacementFactor } from './circle-displacement-factor.js';
import { foxDepthFactor } from './fox-depth-factor.js';
import { steinbrennerFactors } from './steinbrenner-factors.js';

/** A flexible footing on an elastic layer of finite thickness. */
export interface ImmediateSettlementFiniteLayerInput {
  /** Uniform net pressure, kPa. */
  readonly pressureKpa: number;
  /** Width B, m (> 0): the diameter of a circle, the width across a strip. */
  readonly widthM: number;
  /** Length L, m (≥ widthM) for a rectangle; equal to widthM for a square; not read for a circle or strip. */
  readonly lengthM: number;
  /** Thickness of the compressible elastic layer below the base, m (> 0; Infinity for a half-space, not for a strip). */
  readonly layerThicknessM: number;
  /** Young's modulus, kPa (> 0). */
  readonly elasticModulusKpa: number;
  /** Poisson's ratio, dimensionless (0–0.5). */
  readonly poissonRatio: number;
  /** 'corner': a rectangle's or square's corner, a circle's rim, a strip's edge. */
  readonly position: 'centre' | 'corner';
  /** Default 'rectangle'. */
  readonly shape?: FootingShape;
  /**
   * Fox (1948) depth factor If for an embedded footing, given by the designer
   * (0 < If ≤ 1). Give this or foundationDepthM, not both; neither: 1, no reduction.
   */
  readonly depthFactor?: number;
  /**
   * Depth Df of the base below ground, m (≥ 0): If is then worked out by
   * foxDepthFactor(L/B, Df/B, ν) — rectangles and squares only (Fox's solution is for them).
   */
  readonly foundationDepthM?: number;
}

/** Settlement and the factors behind it. */
export interface ImmediateSettlementFiniteLayerResult {
  readonly settlementM: number;
  /** Steinbrenner's F1 and F2 of the corner rectangles used; null for a circle, which has no corners. */
  readonly f1: number | null;
  readonly f2: number | null;
  /**
   * Dimensionless: Is = F1 + (1 − 2ν)/(1 − ν)·F2 for a rectangle, square or
   * strip; for a circle, the settlement over q·D·(1 − ν²)/E (on a half-space 1
   * at the centre and 2/π at the rim).
   */
  readonly shapeFactor: number;
  /** The Fox depth factor If applied, dimensionless (1: none). */
  readonly depthFactor: number;
}

/**
 * Immediate settlement of a flexible footing on an elastic layer over a rigid
 * base, Steinbrenner's (1934) method as set out by Bowles and Das:
 * Se = q·(α·B′)·(1 − ν²)/E·Is·If, Is = F1 + (1 − 2ν)/(1 − ν)·F2, with
 * α = 4, B′ = B/2, m′ = L/B, n′ = H/(B/2) for the centre and α = 1, B′ = B,
 * n′ = H/B for a corner. A square is L = B. A strip (plane strain) takes the
 * corner rectangles infinitely long, F1 = ln(1 + n′²)/(2π) and
 * F2 = (n′/2π)·atan(1/n′) (Steinbrenner's factors as m′ → ∞), with α = 4 at the
 * centre and α = 2 at an edge (the semi-infinite corners on both sides along
 * the strip); a strip needs a finite layer. A circle takes the same route —
 * the half-space displacement at the top of the layer less that at its base —
 * with the displacement below a uniformly loaded circle
 * (circleDisplacementFactor): Se = q·[W(r, 0) − W(r, H)]·If/E, r = 0 at the
 * centre and the radius at the rim; on a half-space this is Timoshenko &
 * Goodier's q·D·(1 − ν²)/E·α with α = 1 (centre) and 2/π (rim).
 * If is given, or worked out from the founding depth with foxDepthFactor
 * (Fox 1948, the factor Das and Bowles chart) for rectangles and squares.
 *
 * Assumptions: homogeneous elastic layer, rough rigid base at depth H, flexible
 * uniform load at the layer's top.
 * Source: Das, *Principles of Foundation Engineering*, elastic settlement based
 * on the theory of elasticity (Steinbrenner's F1 and F2); Bowles, *Foundation
 * Analysis and Design*, ch. 5; Timoshenko & Goodier (1970), *Theory of
 * Elasticity*, 3rd ed. (the uniformly loaded circle).
 *
 * @param input pressure and modulus in kPa, lengths in m, ν and If dimensionless
 * @returns settlement in m with F1, F2 (null for a circle) and the shape factor
 * @throws RangeError for non-positive sizes, thickness or modulus, L < B for a rectangle or L ≠ B for a square,
 *   ν outside 0–0.5, If outside (0, 1], Df < 0, both depthFactor and foundationDepthM, foundationDepthM
 *   for a circle or strip, an infinite layer under a strip, or an unknown shape
 * @example immediateSettlementFiniteLayer({ pressureKpa: 100, widthM: 2, lengthM: 2, layerThicknessM: 1, elasticModulusKpa: 10000, poissonRatio: 0.3, position: 'centre' }) // settlementM ≈ 0.0069
 * @example immediateSettlementFiniteLayer({ shape: 'circle', pressureKpa: 100, widthM: 2, lengthM: 2, layerThicknessM: Infinity, elasticModulusKpa: 10000, poissonRatio: 0.3, position: 'centre' }) // settlementM 0.0182 (q·D·(1 − ν²)/E)
 */
export function immediateSettlementFiniteLayer(input: ImmediateSettlementFiniteLayerInput): ImmediateSettlementFiniteLayerResult {
  const { pressureKpa, widthM, lengthM, layerThicknessM, elasticModulusKpa, poissonRatio, position } = input;
  const shape = input.shape ?? 'rectangle';
  const name = 'immediateSettlementFiniteLayer';
  if (shape !== 'rectangle' && shape !== 'square' && shape !== 'circle' && shape !== 'strip') throw new RangeError(`${name} requires shape 'rectangle', 'square', 'circle' or 'strip'`);
  if (input.depthFactor !== undefined && input.foundationDepthM !== undefined) throw new RangeError(`${name} requires depthFactor or foundationDepthM, not both`);
  if (input.foundationDepthM !== undefined && !(input.foundationDepthM >= 0 && Number.isFinite(input.foundationDepthM))) {
    throw new RangeError(`${name} requires a finite foundationDepthM >= 0`);
  }
  if ((shape === 'circle' || shape === 'strip') && input.foundationDepthM !== undefined) {
    throw new RangeError(`${name} requires depthFactor, not foundationDepthM, for a ${shape}: Fox's (1948) solution is for rectangles`);
  }
  if (!Number.isFinite(pressureKpa)) throw new RangeError(`${name} requires a finite pressureKpa`);
  if (!(widthM > 0) || !Number.isFinite(widthM)) throw new RangeError(`${name} requires finite widthM > 0 and lengthM >= widthM`);
  if (shape === 'rectangle' && !(lengthM >= widthM && Number.isFinite(lengthM))) throw new RangeError(`${name} requires finite widthM > 0 and lengthM >= widthM`);
  if (shape === 'square' && lengthM !== widthM) throw new RangeError(`${name} requires lengthM = widthM for a square`);
  if (!(layerThicknessM > 0)) throw new RangeError(`${name} requires layerThicknessM > 0`);
  if (shape === 'strip' && !Number.isFinite(layerThicknessM)) throw new RangeError(`${name} requires a finite layerThicknessM under a strip: a strip on an elastic half-space settles without bound`);
  if (!(elasticModulusKpa > 0) || !Number.isFinite(elasticModulusKpa)) throw new RangeError(`${name} requires a finite elasticModulusKpa > 0`);
  if (!(poissonRatio >= 0 && poissonRatio <= 0.5)) throw new RangeError(`${name} requires 0 <= poissonRatio <= 0.5`);
  const depthFactor = input.foundationDepthM !== undefined ? foxDepthFactor(lengthM / widthM, input.foundationDepthM / widthM, poissonRatio) : (input.depthFactor ?? 1);
  if (!(depthFactor > 0 && depthFactor <= 1)) throw new RangeError(`${name} requires 0 < depthFactor <= 1`);
  const isCentre = position === 'centre';
  const perUnitPressure = (widthM * (1 - poissonRatio * poissonRatio)) / elasticModulusKpa;
  if (shape === 'circle') {
    const radiusM = widthM / 2;
    const offsetM = isCentre ? 0 : radiusM;
    const bottom = Number.isFinite(layerThicknessM) ? circleDisplacementFactor(radiusM, offsetM, layerThicknessM, poissonRatio) : 0;
    const displacementFactorM = circleDisplacementFactor(radiusM, offsetM, 0, poissonRatio) - bottom;
    const shapeFactor = displacementFactorM / (widthM * (1 - poissonRatio * poissonRatio));
    return { settlementM: pressureKpa * perUnitPressure * shapeFactor * depthFactor, f1: null, f2: null, shapeFactor, depthFactor };
  }
  const cornerWidthM = isCentre ? widthM / 2 : widthM;
  const lengthRatio = shape === 'strip' ? Infinity : shape === 'square' ? 1 : lengthM / widthM;
  const { f1, f2 } = steinbrennerFactors(lengthRatio, layerThicknessM / cornerWidthM);
  const steinbrennerFactor = f1 + ((1 - 2 * poissonRatio) / (1 - poissonRatio)) * f2;
  const cornerCount = isCentre ? 4 : shape === 'strip' ? 2 : 1;
  const settlementM = ((pressureKpa * cornerCount * cornerWidthM * (1 - poissonRatio * poissonRatio)) / elasticModulusKpa) * steinbrennerFactor * depthFactor;
  return { settlementM, f1, f2, shapeFactor: steinbrennerFactor, depthFactor };
}
