/** A point of the e–log σ′ curve. */
export interface StressVoidRatioPoint {
  readonly stressKpa: number;
  readonly voidRatio: number;
}

/** A construction line on the e–log σ′ plot (straight on the log-stress axis). */
export interface StressVoidRatioLine {
  readonly start: StressVoidRatioPoint;
  readonly end: StressVoidRatioPoint;
}

/** A straight line e = voidRatioAtOneKpa + voidRatioPerLogCycle·log10(σ′/1 kPa). */
export interface CompressionLine {
  /** Slope, change of e per log10 cycle of stress (negative in compression: −Cc). */
  readonly voidRatioPerLogCycle: number;
  /** e where the line crosses σ′ = 1 kPa. */
  readonly voidRatioAtOneKpa: number;
}
