import type { SettlementModel } from '../settlement/prepare-settlement-model.js';
import { settlementAtPoint } from '../settlement/settlement-at-point.js';
import { footingPressureKpa } from '../stress/footing-pressure.js';
import type { PreparedFooting } from '../stress/footing-stress-contribution.js';
import type { Footing, StressMethod } from '../stress/footing.types.js';

/** A footing whose plan size is being chosen; its load stays fixed. */
export interface FootingToSize {
  readonly id?: string;
  readonly xM?: number;
  readonly yM?: number;
  /** Founding depth below ground, m. */
  readonly depthM: number;
  /** Total net load, kN (> 0). */
  readonly loadKn: number;
  /** L/B, ≥ 1; default 1 (square). */
  readonly lengthToWidthRatio?: number;
}

/** What the trial settlement needs besides the width. */
export interface FootingSettlementForWidthInput {
  readonly model: SettlementModel;
  readonly footing: FootingToSize;
  readonly neighbours: readonly Footing[];
  readonly method: StressMethod;
  readonly includeNeighbours: boolean;
  readonly designLifeYears: number;
}

/**
 * Total settlement (immediate + primary + secondary) at the centre of a
 * footing of a trial width B, L = (L/B)·B, carrying its fixed load, with any
 * fixed neighbours — the function the sizing searches invert.
 *
 * @param input prepared ground model, the footing (m, kN), neighbours, method, design life (years)
 * @param widthM trial width B, m (> 0)
 * @returns total settlement at the centre, m
 * @throws RangeError when the width is not positive
 * @example footingSettlementForWidth(input, 2.5) // e.g. 0.043
 */
export function footingSettlementForWidth(input: FootingSettlementForWidthInput, widthM: number): number {
  if (!(widthM > 0) || !Number.isFinite(widthM)) throw new RangeError('footingSettlementForWidth requires a finite widthM > 0');
  const { footing } = input;
  const lengthM = widthM * (footing.lengthToWidthRatio ?? 1);
  const own: PreparedFooting = {
    id: footing.id ?? 'sized footing',
    xM: footing.xM ?? 0,
    yM: footing.yM ?? 0,
    widthM,
    lengthM,
    depthM: footing.depthM,
    pressureKpa: footing.loadKn / (widthM * lengthM),
  };
  const others: PreparedFooting[] = input.includeNeighbours
    ? input.neighbours.map((n) => ({ id: n.id, xM: n.xM, yM: n.yM, widthM: n.widthM, lengthM: n.lengthM, depthM: n.depthM, pressureKpa: footingPressureKpa(n) }))
    : [];
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
