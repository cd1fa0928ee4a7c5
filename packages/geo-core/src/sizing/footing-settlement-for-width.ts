import type { SoilProfile } from '../profile/soil-profile.types.js';
import { verticalStressAtDepth } from '../profile/vertical-stress-at-depth.js';
import type { SettlementModel } from '../settlement/prepare-settlement-model.js';
import { settlementAtPoint } from '../settlement/settlement-at-point.js';
import type { Footing, PressureBasis, StressMethod } from '../stress/footing.types.js';
import { prepareFooting } from '../stress/prepare-footing.js';
import type { PreparedFooting } from '../stress/prepared-footing.js';

/**
 * A footing whose plan size is being chosen; its load stays fixed. The width
 * searched is B of a rectangle (L = (L/B)·B) or square, the diameter of a
 * circle, the width across a strip.
 */
export type FootingToSize = {
  readonly id?: string;
  readonly xM?: number;
  readonly yM?: number;
  /** Founding depth below ground, m. */
  readonly depthM: number;
  /** Default 'net'; 'gross': the net pressure at each trial width is the gross pressure less σv0 at the founding depth. */
  readonly pressureBasis?: PressureBasis;
} & (
  | {
      /** Omitted: a rectangle. */
      readonly shape?: 'rectangle';
      /** Total net load, kN (> 0). */
      readonly loadKn: number;
      /** L/B, ≥ 1; default 1 (a square). */
      readonly lengthToWidthRatio?: number;
      readonly loadKnPerM?: never;
    }
  | { readonly shape: 'square' | 'circle'; readonly loadKn: number; readonly lengthToWidthRatio?: never; readonly loadKnPerM?: never }
  | {
      readonly shape: 'strip';
      /** Net load per metre run, kN/m (> 0). */
      readonly loadKnPerM: number;
      readonly loadKn?: never;
      readonly lengthToWidthRatio?: never;
    }
);

/** What the trial settlement needs besides the width. */
export interface FootingSettlementForWidthInput {
  /** The ground model, for the overburden of gross loads. */
  readonly profile: SoilProfile;
  readonly model: SettlementModel;
  readonly footing: FootingToSize;
  readonly neighbours: readonly Footing[];
  readonly method: StressMethod;
  readonly includeNeighbours: boolean;
  readonly designLifeYears: number;
}

/**
 * The footing to size at a trial width, as the settlement sums take it: the
 * fixed load spread over the trial plan — Q/(B·L), Q/B², 4Q/(πB²) or Q′/B —
 * less the overburden removed where the load is gross (not below zero).
 *
 * @param footing the footing to size (m, kN or kN/m)
 * @param widthM trial width (diameter for a circle), m (> 0)
 * @param overburdenRemovedKpa σv0 at the founding depth for a gross load, kPa; 0 for a net one
 * @returns the prepared footing
 * @example sizedFootingAtWidth({ shape: 'circle', depthM: 1, loadKn: 314.16 }, 2, 0).pressureKpa // 100.0
 */
export function sizedFootingAtWidth(footing: FootingToSize, widthM: number, overburdenRemovedKpa: number): PreparedFooting {
  const shape = footing.shape ?? 'rectangle';
  const lengthM = shape === 'strip' ? Infinity : shape === 'rectangle' ? widthM * (footing.lengthToWidthRatio ?? 1) : widthM;
  const areaM2 = shape === 'circle' ? (Math.PI * widthM * widthM) / 4 : widthM * lengthM;
  const appliedKpa = shape === 'strip' ? (footing.loadKnPerM ?? Number.NaN) / widthM : (footing.loadKn ?? Number.NaN) / areaM2;
  const base = { id: footing.id ?? 'sized footing', shape, xM: footing.xM ?? 0, yM: footing.yM ?? 0, widthM, lengthM, depthM: footing.depthM };
  if (footing.pressureBasis !== 'gross') return { ...base, pressureKpa: appliedKpa };
  return { ...base, pressureKpa: Math.max(0, appliedKpa - overburdenRemovedKpa), grossPressureKpa: appliedKpa, overburdenRemovedKpa };
}

/**
 * Total settlement (immediate + primary + secondary) at the centre of a
 * footing of a trial width carrying its fixed load, with any fixed
 * neighbours — the function the sizing searches invert.
 *
 * @param input prepared ground model, the footing (m, kN or kN/m), neighbours, method, design life (years)
 * @param widthM trial width B (the diameter for a circle), m (> 0)
 * @returns total settlement at the centre, m
 * @throws RangeError when the width is not positive
 * @example footingSettlementForWidth(input, 2.5) // e.g. 0.043
 */
export function footingSettlementForWidth(input: FootingSettlementForWidthInput, widthM: number): number {
  if (!(widthM > 0) || !Number.isFinite(widthM)) throw new RangeError('footingSettlementForWidth requires a finite widthM > 0');
  const overburdenRemovedKpa = input.footing.pressureBasis === 'gross' ? verticalStressAtDepth(input.profile, input.footing.depthM).totalStressKpa : 0;
  const own = sizedFootingAtWidth(input.footing, widthM, overburdenRemovedKpa);
  const others: PreparedFooting[] = input.includeNeighbours ? input.neighbours.map((neighbour) => prepareFooting(neighbour, input.profile)) : [];
  return settlementAtPoint({
    model: input.model,
    footings: [own, ...others],
    ownIndex: 0,
    xM: own.xM,
    yM: own.yM,
    method: input.method,
    includeNeighbours: input.includeNeighbours,
    designLifeYears: input.designLifeYears,
    withSublayers: false,
  }).totalM;
}
