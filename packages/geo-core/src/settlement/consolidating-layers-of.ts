import type { ConsolidatingLayer } from '../time-rate/consolidating-layer.types.js';
import type { SettlementModel } from './prepare-settlement-model.js';

/**
 * The clay layers that take part in the time rate of one point: each layer with a cv, drainage
 * at both faces and a primary settlement > 0, carrying that settlement (Terzaghi's U(Tv) is then
 * applied layer by layer on its own drainage path).
 *
 * @param model the prepared ground model
 * @param primaryByLayer primary settlement per layer index, m
 * @returns the layers for settlementTimeCurve and timeForPrimaryShare
 * @example consolidatingLayersOf(model, new Map([[1, 0.05]])) // [{ primarySettlementM: 0.05, thicknessM: 4, cvM2PerYr: 2, … }]
 */
export function consolidatingLayersOf(model: SettlementModel, primaryByLayer: ReadonlyMap<number, number>): ConsolidatingLayer[] {
  const consolidating: ConsolidatingLayer[] = [];
  for (const [layerIndex, primarySettlementM] of primaryByLayer) {
    const layer = model.layers[layerIndex];
    if (layer === undefined || layer.cvM2PerYr === null || layer.drainageTop === null || layer.drainageBottom === null || !(primarySettlementM > 0)) continue;
    consolidating.push({
      primarySettlementM,
      thicknessM: layer.bottomDepthM - layer.topDepthM,
      cvM2PerYr: layer.cvM2PerYr,
      drainageTop: layer.drainageTop,
      drainageBottom: layer.drainageBottom,
    });
  }
  return consolidating;
}
