import { foxDepthFactor } from './fox-depth-factor.js';
import { steinbrennerFactors } from './steinbrenner-factors.js';

/** A flexible rectangle on an elastic layer of finite thickness. */
export interface ImmediateSettlementFiniteLayerInput {
  /** Uniform net pressure, kPa. */
  readonly pressureKpa: number;
  /** Width B, m (> 0). */
  readonly widthM: number;
  /** Length L, m (≥ widthM). */
  readonly lengthM: number;
  /** Thickness of the compressible elastic layer below the base, m (> 0; Infinity for a half-space). */
  readonly layerThicknessM: number;
  /** Young's modulus, kPa (> 0). */
  readonly elasticModulusKpa: number;
  /** Poisson's ratio, dimensionless (0–0.5). */
  readonly poissonRatio: number;
  readonly position: 'centre' | 'corner';
  /**
   * Fox (1948) depth factor If for an embedded footing, given by the designer
   * (0 < If ≤ 1). Give this or foundationDepthM, not both; neither: 1, no reduction.
   */
  readonly depthFactor?: number;
  /**
   * Depth Df of the base below ground, m (≥ 0): If is then worked out by
   * foxDepthFactor(L/B, Df/B, ν).
   */
  readonly foundationDepthM?: number;
}

/** Settlement and the factors behind it. */
export interface ImmediateSettlementFiniteLayerResult {
  readonly settlementM: number;
  readonly f1: number;
  readonly f2: number;
  /** Is = F1 + (1 − 2ν)/(1 − ν)·F2, dimensionless. */
  readonly shapeFactor: number;
  /** The Fox depth factor If applied, dimensionless (1: none). */
  readonly depthFactor: number;
}

/**
 * Immediate settlement of a flexible rectangle on an elastic layer over a rigid
 * base, Steinbrenner's (1934) method as set out by Bowles and Das:
 * Se = q·(α·B′)·(1 − ν²)/E·Is·If, Is = F1 + (1 − 2ν)/(1 − ν)·F2, with
 * α = 4, B′ = B/2, m′ = L/B, n′ = H/(B/2) for the centre and α = 1, B′ = B,
 * n′ = H/B for a corner. If is given, or worked out from the founding depth
 * with foxDepthFactor (Fox 1948, the factor Das and Bowles chart).
 *
 * Assumptions: homogeneous elastic layer, rough rigid base at depth H, flexible
 * uniform load at the layer's top.
 * Source: Das, *Principles of Foundation Engineering*, elastic settlement based
 * on the theory of elasticity (Steinbrenner's F1 and F2); Bowles, *Foundation
 * Analysis and Design*, ch. 5.
 *
 * @param input pressure and modulus in kPa, lengths in m, ν and If dimensionless
 * @returns settlement in m with F1, F2 and Is
 * @throws RangeError for non-positive sides, thickness or modulus, L < B, ν outside 0–0.5, If outside (0, 1],
 *   Df < 0, or both depthFactor and foundationDepthM
 * @example immediateSettlementFiniteLayer({ pressureKpa: 100, widthM: 2, lengthM: 2, layerThicknessM: 1, elasticModulusKpa: 10000, poissonRatio: 0.3, position: 'centre' }) // settlementM ≈ 0.0069
 */
export function immediateSettlementFiniteLayer(input: ImmediateSettlementFiniteLayerInput): ImmediateSettlementFiniteLayerResult {
  const { pressureKpa, widthM, lengthM, layerThicknessM, elasticModulusKpa, poissonRatio, position } = input;
  const name = 'immediateSettlementFiniteLayer';
  if (input.depthFactor !== undefined && input.foundationDepthM !== undefined) throw new RangeError(`${name} requires depthFactor or foundationDepthM, not both`);
  if (input.foundationDepthM !== undefined && !(input.foundationDepthM >= 0 && Number.isFinite(input.foundationDepthM))) {
    throw new RangeError(`${name} requires a finite foundationDepthM >= 0`);
  }
  if (!Number.isFinite(pressureKpa)) throw new RangeError(`${name} requires a finite pressureKpa`);
  if (!(widthM > 0) || !Number.isFinite(widthM) || !(lengthM >= widthM) || !Number.isFinite(lengthM)) {
    throw new RangeError(`${name} requires finite widthM > 0 and lengthM >= widthM`);
  }
  if (!(layerThicknessM > 0)) throw new RangeError(`${name} requires layerThicknessM > 0`);
  if (!(elasticModulusKpa > 0) || !Number.isFinite(elasticModulusKpa)) throw new RangeError(`${name} requires a finite elasticModulusKpa > 0`);
  if (!(poissonRatio >= 0 && poissonRatio <= 0.5)) throw new RangeError(`${name} requires 0 <= poissonRatio <= 0.5`);
  const depthFactor = input.foundationDepthM !== undefined ? foxDepthFactor(lengthM / widthM, input.foundationDepthM / widthM, poissonRatio) : (input.depthFactor ?? 1);
  if (!(depthFactor > 0 && depthFactor <= 1)) throw new RangeError(`${name} requires 0 < depthFactor <= 1`);
  const isCentre = position === 'centre';
  const cornerWidthM = isCentre ? widthM / 2 : widthM;
  const { f1, f2 } = steinbrennerFactors(lengthM / widthM, layerThicknessM / cornerWidthM);
  const shapeFactor = f1 + ((1 - 2 * poissonRatio) / (1 - poissonRatio)) * f2;
  const settlementM = ((pressureKpa * (isCentre ? 4 : 1) * cornerWidthM * (1 - poissonRatio * poissonRatio)) / elasticModulusKpa) * shapeFactor * depthFactor;
  return { settlementM, f1, f2, shapeFactor, depthFactor };
}
