/** Drainage at a clay layer's boundary: free (a sand or gravel contact) or impermeable. */
export type DrainageBoundary = 'free' | 'impermeable';

/**
 * One layer of the ground model, top-down. Unit weights are required for every
 * layer; the compressibility fields only where the layer is meant to settle.
 * A layer with e0 and cc is compressible (primary and secondary settlement
 * from e–log σ′); a layer with mvM2PerKn but no cc is compressible too, its
 * primary settlement mv·Δσ′·H; a layer with elasticModulusKpa and
 * poissonRatio adds immediate settlement.
 */
export interface SoilLayer {
  readonly name: string;
  /** Thickness, m (> 0). */
  readonly thicknessM: number;
  /** Bulk unit weight above the water table, kN/m³. */
  readonly unitWeightKnPerM3: number;
  /** Saturated unit weight below the water table, kN/m³. */
  readonly saturatedUnitWeightKnPerM3: number;
  /** Initial void ratio, dimensionless. */
  readonly e0?: number;
  /** Compression index Cc on the virgin line, dimensionless. */
  readonly cc?: number;
  /** Recompression (Cr) or swell (Cs) index used on the overconsolidated branch, dimensionless. */
  readonly cs?: number;
  /**
   * Preconsolidation stress σ′p, kPa, taken as constant through the layer.
   * Give at most one of preconsolidationKpa, ocr and preOverburdenPressureKpa;
   * none: normally consolidated (with a warning).
   */
  readonly preconsolidationKpa?: number;
  /** Overconsolidation ratio σ′p/σ′v0 (≥ 1), applied at every depth of the layer: σ′p = OCR·σ′v0. */
  readonly ocr?: number;
  /**
   * Pre-overburden pressure POP = σ′p − σ′v0, kPa (≥ 0), constant through the
   * layer: σ′p = σ′v0 + POP at every depth — the usual picture of a crust or a
   * layer once loaded by ground since removed, where σ′p runs parallel to σ′v0.
   */
  readonly preOverburdenPressureKpa?: number;
  /**
   * Coefficient of volume compressibility mv over the stress range the layer
   * will see, m²/kN (1 m²/MN = 0.001 m²/kN). Used only where cc is not given:
   * e–log σ′ follows the stress level, a single mv does not.
   */
  readonly mvM2PerKn?: number;
  /** Coefficient of consolidation, m²/yr. */
  readonly cvM2PerYr?: number;
  /** Secondary compression index Cα = Δe/Δlog10 t, dimensionless. */
  readonly cAlpha?: number;
  /** Drained or undrained Young's modulus for immediate settlement, kPa. */
  readonly elasticModulusKpa?: number;
  /** Poisson's ratio matching the modulus, dimensionless (0 ≤ ν ≤ 0.5). */
  readonly poissonRatio?: number;
  /** Drainage at the top of the layer (needed with cvM2PerYr). */
  readonly drainageTop?: DrainageBoundary;
  /** Drainage at the bottom of the layer (needed with cvM2PerYr). */
  readonly drainageBottom?: DrainageBoundary;
}

/**
 * How σ′p is carried through a compressible layer: a constant stress, a
 * constant OCR, a constant POP (σ′p − σ′v0), or — none given — the layer is
 * taken as normally consolidated (σ′p = σ′v0), the cautious choice.
 */
export type PreconsolidationBasis = 'preconsolidation-stress' | 'ocr' | 'pre-overburden-pressure' | 'assumed-normally-consolidated';

/** The ground model of one site: level, water table and layers from the top down. */
export interface SoilProfile {
  /** Elevation of ground level, m (reported only; depths are measured from here). */
  readonly groundLevelM: number;
  /** Depth of the water table below ground level, m (≥ 0); hydrostatic pore pressure below it. */
  readonly waterTableDepthM: number;
  /**
   * Unit weight of the pore water γw, kN/m³ (9 ≤ γw ≤ 10.5). Default
   * WATER_UNIT_WEIGHT_KN_PER_M3 = 9.81; some references and exam papers use 10.
   * Every pore pressure and effective stress of the profile, the settlement
   * check and the sizing functions is worked out with it.
   */
  readonly waterUnitWeightKnPerM3?: number;
  readonly layers: readonly SoilLayer[];
}

/** A slice of a compressible layer over which stresses are taken at mid-depth. */
export interface Sublayer {
  readonly layerIndex: number;
  readonly layerName: string;
  readonly topDepthM: number;
  readonly bottomDepthM: number;
  readonly midDepthM: number;
  readonly thicknessM: number;
}

/** Stresses at one depth, kPa. */
export interface VerticalStressState {
  readonly totalStressKpa: number;
  readonly porePressureKpa: number;
  readonly effectiveStressKpa: number;
}
