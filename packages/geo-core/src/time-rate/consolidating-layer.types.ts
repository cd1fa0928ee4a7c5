import type { DrainageBoundary } from '../profile/soil-profile.types.js';

/** One clay layer's share in the time rate: its final primary settlement and how it drains. */
export interface ConsolidatingLayer {
  /** Final primary consolidation settlement of the layer, m (≥ 0). */
  readonly primarySettlementM: number;
  /** Layer thickness, m (> 0). */
  readonly thicknessM: number;
  /** Coefficient of consolidation, m²/yr (> 0). */
  readonly cvM2PerYr: number;
  readonly drainageTop: DrainageBoundary;
  readonly drainageBottom: DrainageBoundary;
}
