import { degreeOfConsolidation } from '../time-curves/degree-of-consolidation.js';
import type { ConsolidatingLayer } from './consolidating-layer.types.js';
import { drainagePathLengthM } from './drainage-path-length.js';

/** Primary settlement reached at one time, in total and per layer. */
export interface SettlementAtTimeResult {
  readonly timeYears: number;
  /** Σ Ui·Sci, m. */
  readonly settlementM: number;
  /** The share of the final primary settlement reached, a fraction 0–1 (null when the final settlement is zero). */
  readonly shareOfPrimary: number | null;
  readonly layers: ReadonlyArray<{ readonly timeFactor: number | null; readonly degreeOfConsolidation: number; readonly settlementM: number }>;
}

/**
 * Primary consolidation settlement reached at a time t, layer by layer:
 * Tv = cv·t/Hdr², U = U(Tv) from Terzaghi's (1943) series, S(t) = Σ U·Sc.
 * Each clay layer consolidates on its own drainage path; a layer with both
 * faces impermeable stays at U = 0.
 *
 * Assumptions: Terzaghi's one-dimensional theory for each layer separately
 * (layers separated by free-draining strata, uniform initial excess pore
 * pressure, instantaneous loading).
 * Source: Das, *Principles of Geotechnical Engineering*, ch. "Consolidation"
 * (settlement at a time from U and Tv).
 *
 * @param layers clay layers with final primary settlement (m), thickness (m), cv (m²/yr), drainage
 * @param timeYears time since loading, years (≥ 0)
 * @returns settlement at the time in m, its share of the final, per-layer detail
 * @throws RangeError for a negative or non-finite time, or a layer with non-positive cv or thickness
 * @example settlementAtTime([{ primarySettlementM: 0.1, thicknessM: 4, cvM2PerYr: 0.788, drainageTop: 'free', drainageBottom: 'free' }], 1) // settlementM ≈ 0.05 (Tv = 0.197)
 */
export function settlementAtTime(layers: readonly ConsolidatingLayer[], timeYears: number): SettlementAtTimeResult {
  if (!(timeYears >= 0) || !Number.isFinite(timeYears)) throw new RangeError('settlementAtTime requires a finite timeYears >= 0');
  let settlementM = 0;
  let finalM = 0;
  const perLayer = layers.map((layer) => {
    if (!(layer.cvM2PerYr > 0) || !Number.isFinite(layer.cvM2PerYr)) throw new RangeError('settlementAtTime requires every layer to have a finite cvM2PerYr > 0');
    if (!(layer.primarySettlementM >= 0)) throw new RangeError('settlementAtTime requires every layer to have primarySettlementM >= 0');
    const pathM = drainagePathLengthM(layer);
    const timeFactor = pathM === null ? null : (layer.cvM2PerYr * timeYears) / (pathM * pathM);
    const degree = timeFactor === null ? 0 : degreeOfConsolidation(timeFactor);
    settlementM += degree * layer.primarySettlementM;
    finalM += layer.primarySettlementM;
    return { timeFactor, degreeOfConsolidation: degree, settlementM: degree * layer.primarySettlementM };
  });
  return { timeYears, settlementM, shareOfPrimary: finalM > 0 ? settlementM / finalM : null, layers: perLayer };
}
