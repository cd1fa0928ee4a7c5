/** How a footing's load is given: a total load or a uniform pressure, never both. */
export type FootingLoad = { readonly loadKn: number; readonly pressureKpa?: never } | { readonly pressureKpa: number; readonly loadKn?: never };

/**
 * A rectangular footing on plan. x runs along the width, y along the length;
 * coordinates and the founding depth are in metres, the load is the net
 * increase at founding level (gross load less the weight of soil removed,
 * if the designer means the excavation to count).
 */
export type Footing = FootingLoad & {
  readonly id: string;
  /** Centre of the footing on plan, m. */
  readonly xM: number;
  readonly yM: number;
  /** Side along x, m (> 0). */
  readonly widthM: number;
  /** Side along y, m (> 0). */
  readonly lengthM: number;
  /** Founding depth of the base below ground level, m (≥ 0). */
  readonly depthM: number;
};

/** The way stress spreads below a footing. */
export type StressMethod = 'boussinesq' | '2to1';
