import type { PreparedFooting } from '../stress/prepared-footing.js';
import { addRectangleInfluenceOverDepths } from '../stress/add-rectangle-influence-over-depths.js';
import { footingStressContributionKpa } from '../stress/footing-stress-contribution.js';
import type { StressMethod } from '../stress/footing.types.js';
import { elasticSettlementContributionM } from './elastic-settlement-contribution.js';
import type { SettlementModel } from './prepare-settlement-model.js';
import { primaryConsolidationSettlement } from './primary-consolidation-settlement.js';
import { primaryConsolidationSettlementMv } from './primary-consolidation-settlement-mv.js';
import { secondaryCompressionSettlement } from './secondary-compression-settlement.js';
import type { SublayerConsolidationCase, SublayerSettlementRow } from './settlement-check.types.js';

/** How one point is evaluated. */
export interface SettlementAtPointInput {
  readonly model: SettlementModel;
  readonly footings: readonly PreparedFooting[];
  /** Index in `footings` of the footing the point belongs to. */
  readonly ownIndex: number;
  readonly xM: number;
  readonly yM: number;
  readonly method: StressMethod;
  readonly includeNeighbours: boolean;
  readonly designLifeYears: number;
  /** Keep the per-sublayer rows (the centre) or only the sums (corners, sizing). */
  readonly withSublayers: boolean;
}

/** Settlements at the point, m, with optional detail. */
export interface SettlementAtPointResult {
  readonly immediateM: number;
  readonly primaryM: number;
  readonly secondaryM: number;
  readonly totalM: number;
  readonly primaryByLayer: ReadonlyMap<number, number>;
  readonly sublayers: readonly SublayerSettlementRow[];
}

/**
 * Settlement at one point of a footing: immediate (layered Steinbrenner, or
 * its analogue for a circle; own footing and neighbours), primary consolidation summed over the sublayers
 * below the footing's base with Δσ at each mid-depth from every footing (each
 * by its own shape: footingStressContributionKpa), and
 * secondary compression of the same sublayers over the design life.
 *
 * Primary settlement per sublayer is Terzaghi's e–log σ′ (three cases) or,
 * on a layer given mv and no Cc, mv·Δσ′·H.
 *
 * Secondary compression uses Cα on sublayers that reach the virgin line (and
 * on mv layers, whose branch is not known) and
 * Cα·Cs/Cc on those that stay overconsolidated, after Mesri & Godlewski's
 * (1977) constant Cα/Cc ratio (the recompression branch creeps in proportion to
 * its own index); ep = e0 − (1 + e0)·Sc/H.
 *
 * @param input prepared model and footings, point (m), method, design life (years)
 * @returns settlements in m
 * @example settlementAtPoint({ model, footings, ownIndex: 0, xM: 0, yM: 0, method: 'boussinesq', includeNeighbours: true, designLifeYears: 50, withSublayers: true }).totalM
 */
export function settlementAtPoint(input: SettlementAtPointInput): SettlementAtPointResult {
  const { model, footings, ownIndex, xM, yM, method, includeNeighbours, designLifeYears, withSublayers } = input;
  const own = footings[ownIndex];
  if (own === undefined) throw new RangeError('settlementAtPoint requires ownIndex to name one of the footings');
  let immediateM = 0;
  for (let index = 0; index < footings.length; index += 1) {
    const footing = footings[index];
    if (footing === undefined || (!includeNeighbours && index !== ownIndex)) continue;
    const depthFactor = index === ownIndex ? (footing.immediateDepthFactor ?? 1) : 1;
    immediateM += depthFactor * elasticSettlementContributionM(footing, xM - footing.xM, yM - footing.yM, model.elasticLayers);
  }
  let primaryM = 0;
  let secondaryM = 0;
  const primaryByLayer = new Map<number, number>();
  const rows: SublayerSettlementRow[] = [];
  const ownStressKpa = new Float64Array(model.sublayers.length);
  const neighboursStressKpa = new Float64Array(model.sublayers.length);
  for (let index = 0; index < footings.length; index += 1) {
    const footing = footings[index];
    if (footing === undefined || (!includeNeighbours && index !== ownIndex)) continue;
    const out = index === ownIndex ? ownStressKpa : neighboursStressKpa;
    const dxM = xM - footing.xM;
    const dyM = yM - footing.yM;
    if (method === 'boussinesq' && footing.lengthM !== Infinity && footing.shape !== 'circle') {
      addRectangleInfluenceOverDepths(footing.widthM / 2, footing.lengthM / 2, dxM, dyM, footing.depthM, footing.pressureKpa, model.midDepthsM, out);
    } else {
      addFootingStressOverDepths(footing, dxM, dyM, method, model.midDepthsM, out);
    }
  }
  for (let k = 0; k < model.sublayers.length; k += 1) {
    const sublayer = model.sublayers[k];
    if (sublayer === undefined || sublayer.midDepthM <= own.depthM) continue;
    const ownKpa = ownStressKpa[k] ?? 0;
    const neighboursKpa = neighboursStressKpa[k] ?? 0;
    // Superposed Boussinesq terms can round to −1e-17 far from every footing.
    const stressIncreaseKpa = Math.max(0, ownKpa + neighboursKpa);
    const primary = primaryForSublayer(sublayer, stressIncreaseKpa);
    const secondary = secondaryForSublayer(sublayer, primary.settlementM, primary.consolidationCase === 'overconsolidated-below', designLifeYears);
    primaryM += primary.settlementM;
    secondaryM += secondary ?? 0;
    primaryByLayer.set(sublayer.layerIndex, (primaryByLayer.get(sublayer.layerIndex) ?? 0) + primary.settlementM);
    if (withSublayers) {
      rows.push({
        layerIndex: sublayer.layerIndex,
        layerName: sublayer.layerName,
        topDepthM: sublayer.topDepthM,
        bottomDepthM: sublayer.bottomDepthM,
        midDepthM: sublayer.midDepthM,
        thicknessM: sublayer.thicknessM,
        initialEffectiveStressKpa: sublayer.initialEffectiveStressKpa,
        preconsolidationKpa: sublayer.preconsolidationKpa,
        ownStressIncreaseKpa: ownKpa,
        neighboursStressIncreaseKpa: neighboursKpa,
        stressIncreaseKpa,
        consolidationCase: primary.consolidationCase,
        primarySettlementM: primary.settlementM,
        secondarySettlementM: secondary,
      });
    }
  }
  return { immediateM, primaryM, secondaryM, totalM: immediateM + primaryM + secondaryM, primaryByLayer, sublayers: rows };
}

/** Primary settlement of one prepared sublayer under a stress increase, with the branch used. */
export function primaryForSublayer(
  sublayer: SettlementModel['sublayers'][number],
  stressIncreaseKpa: number,
): { readonly settlementM: number; readonly consolidationCase: SublayerConsolidationCase } {
  if (sublayer.primaryMethod === 'mv' || sublayer.e0 === null) {
    const settlementM = primaryConsolidationSettlementMv({ thicknessM: sublayer.thicknessM, mvM2PerKn: sublayer.mvM2PerKn ?? 0, stressIncreaseKpa });
    return { settlementM, consolidationCase: 'volume-compressibility' };
  }
  return primaryConsolidationSettlement({
    thicknessM: sublayer.thicknessM,
    e0: sublayer.e0,
    cc: sublayer.cc,
    cs: sublayer.cs,
    initialEffectiveStressKpa: sublayer.initialEffectiveStressKpa,
    stressIncreaseKpa,
    preconsolidationKpa: sublayer.preconsolidationKpa,
  });
}

/** Secondary compression of one prepared sublayer over the design life; null where it cannot be dated. */
export function secondaryForSublayer(
  sublayer: SettlementModel['sublayers'][number],
  primarySettlementM: number,
  staysOverconsolidated: boolean,
  designLifeYears: number,
): number | null {
  if (sublayer.cAlpha === null || sublayer.cAlpha === 0) return 0;
  if (sublayer.endOfPrimaryYears === null || sublayer.e0 === null) return null;
  const cAlpha = staysOverconsolidated && sublayer.cc > 0 ? (sublayer.cAlpha * sublayer.cs) / sublayer.cc : sublayer.cAlpha;
  const voidRatioAtEndOfPrimary = sublayer.e0 - ((1 + sublayer.e0) * primarySettlementM) / sublayer.thicknessM;
  if (!(voidRatioAtEndOfPrimary > 0)) return null;
  return secondaryCompressionSettlement({ thicknessM: sublayer.thicknessM, cAlpha, voidRatioAtEndOfPrimary, endOfPrimaryYears: sublayer.endOfPrimaryYears, designLifeYears });
}

/** Circles, strips and the 2V:1H spread, one depth at a time (kept out of settlementAtPoint, whose loop stays small). */
function addFootingStressOverDepths(footing: PreparedFooting, dxM: number, dyM: number, method: StressMethod, depthsM: Float64Array, out: Float64Array): void {
  for (let k = 0; k < depthsM.length; k += 1) {
    out[k] = (out[k] ?? 0) + footingStressContributionKpa(footing, dxM, dyM, (depthsM[k] ?? 0) - footing.depthM, method);
  }
}
