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
  /** Default 'rectangle'. */
  readonly shape?: 'rectangle' | 'circle';
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
 * @returns settlement in m with α, or null and a warning
 * @throws RangeError for non-positive sides or modulus, ν outside 0–0.5, L < B, or non-finite pressure
 * @example immediateSettlement({ pressureKpa: 100, widthM: 2, lengthM: 2, elasticModulusKpa: 10000, poissonRatio: 0.3, position: 'centre' }) // settlementM 0.02042
 */
export function immediateSettlement(input: ImmediateSettlementInput): ImmediateSettlementResult {
  const { pressureKpa, widthM, lengthM, elasticModulusKpa, poissonRatio, position } = input;
  const shape = input.shape ?? 'rectangle';
  if (!Number.isFinite(pressureKpa)) throw new RangeError('immediateSettlement requires a finite pressureKpa');
  if (!(widthM > 0) || !Number.isFinite(widthM)) throw new RangeError('immediateSettlement requires a finite widthM > 0');
  if (shape === 'rectangle' && !(lengthM >= widthM && Number.isFinite(lengthM))) throw new RangeError('immediateSettlement requires a finite lengthM >= widthM');
  if (!(elasticModulusKpa > 0) || !Number.isFinite(elasticModulusKpa)) throw new RangeError('immediateSettlement requires a finite elasticModulusKpa > 0');
  if (!(poissonRatio >= 0 && poissonRatio <= 0.5)) throw new RangeError('immediateSettlement requires 0 <= poissonRatio <= 0.5');
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
