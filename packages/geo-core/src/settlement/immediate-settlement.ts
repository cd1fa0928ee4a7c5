import type { FootingShape } from '../stress/footing.types.js';
import { elasticInfluenceFactor, type ElasticSettlementPosition } from './elastic-influence-factor.js';

/** A footing on an elastic half-space. */
export interface ImmediateSettlementInput {
  /** Uniform net pressure, kPa. */
  readonly pressureKpa: number;
  /** Width B (the shorter side; the diameter for a circle), m (> 0). */
  readonly widthM: number;
  /** Length L, m (≥ widthM; ignored for a circle). */
  readonly lengthM: number;
  /** Young's modulus of the soil, kPa (> 0); undrained for a saturated clay loaded quickly. */
  readonly elasticModulusKpa: number;
  /** Poisson's ratio, dimensionless (0–0.5; 0.5 undrained). */
  readonly poissonRatio: number;
  readonly position: ElasticSettlementPosition;
  /** Default 'rectangle'. A square needs lengthM = widthM; a strip has no half-space value (null with a warning). */
  readonly shape?: FootingShape;
}

/** Immediate settlement and the factor used; null with a warning where no published factor applies. */
export interface ImmediateSettlementResult {
  readonly settlementM: number | null;
  readonly influenceFactor: number | null;
  readonly warnings: readonly string[];
}

/**
 * Immediate (elastic) settlement of a footing on a homogeneous elastic half-space:
 * Se = q·B·(1 − ν²)/E·α, with α from elasticInfluenceFactor.
 *
 * Assumptions: linear-elastic, homogeneous, semi-infinite ground; flexible
 * footings at the surface (no depth reduction) unless the rigid position is
 * asked for. For a layer of finite thickness use immediateSettlementFiniteLayer.
 * Source: Das, *Principles of Foundation Engineering*, elastic settlement of
 * shallow foundations (the α, αav, αr table); Timoshenko & Goodier, *Theory of Elasticity*.
 *
 * @param input pressure and modulus in kPa, sides in m, ν dimensionless
 * @returns settlement in m with α, or null and a warning for a strip (unbounded on a half-space) or a rigid rectangle beyond the table
 * @throws RangeError for non-positive sides or modulus, ν outside 0–0.5, L < B, a square with L ≠ B, or non-finite pressure
 * @example immediateSettlement({ pressureKpa: 100, widthM: 2, lengthM: 2, elasticModulusKpa: 10000, poissonRatio: 0.3, position: 'centre' }) // settlementM 0.02042
 */
export function immediateSettlement(input: ImmediateSettlementInput): ImmediateSettlementResult {
  const { pressureKpa, widthM, lengthM, elasticModulusKpa, poissonRatio, position } = input;
  const shape = input.shape ?? 'rectangle';
  if (!Number.isFinite(pressureKpa)) throw new RangeError('immediateSettlement requires a finite pressureKpa');
  if (!(widthM > 0) || !Number.isFinite(widthM)) throw new RangeError('immediateSettlement requires a finite widthM > 0');
  if (shape === 'rectangle' && !(lengthM >= widthM && Number.isFinite(lengthM))) throw new RangeError('immediateSettlement requires a finite lengthM >= widthM');
  if (shape === 'square' && lengthM !== widthM) throw new RangeError('immediateSettlement requires lengthM = widthM for a square');
  if (!(elasticModulusKpa > 0) || !Number.isFinite(elasticModulusKpa)) throw new RangeError('immediateSettlement requires a finite elasticModulusKpa > 0');
  if (!(poissonRatio >= 0 && poissonRatio <= 0.5)) throw new RangeError('immediateSettlement requires 0 <= poissonRatio <= 0.5');
  if (shape === 'strip') {
    return {
      settlementM: null,
      influenceFactor: null,
      warnings: ['A strip on an elastic half-space settles without bound (plane strain), so it has no half-space factor. Give the thickness of the compressible ground and use the finite-layer method (immediateSettlementFiniteLayer).'],
    };
  }
  const influenceFactor = elasticInfluenceFactor(shape, lengthM / widthM, position);
  if (influenceFactor === null) {
    return {
      settlementM: null,
      influenceFactor: null,
      warnings: [`No published rigid-footing factor is held for L/B = ${(lengthM / widthM).toFixed(2)} (the table stops at 10). Use the flexible average settlement as an upper estimate, or a finite-layer method.`],
    };
  }
  const settlementM = ((pressureKpa * widthM * (1 - poissonRatio * poissonRatio)) / elasticModulusKpa) * influenceFactor;
  return { settlementM, influenceFactor, warnings: [] };
}
