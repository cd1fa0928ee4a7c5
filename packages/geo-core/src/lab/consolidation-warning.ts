/** What kind of weakness a warning reports; the message says it in plain words. */
export type ConsolidationWarningCode =
  | 'few-virgin-points'
  | 'no-virgin-line'
  | 'no-unload-branch'
  | 'no-recompression-branch'
  | 'primary-not-reached'
  | 'short-secondary-line'
  | 'time-curve-not-drawn'
  | 'time-curves-not-applied'
  | 'non-monotonic-time'
  | 'readings-backwards'
  | 'pick-outside-data'
  | 'pick-not-applied'
  | 'compliance-outside-calibration'
  | 'mass-inconsistent'
  | 'preconsolidation-not-found'
  | 'sample-quality-not-assessed';

export interface ConsolidationWarning {
  readonly code: ConsolidationWarningCode;
  readonly message: string;
  /** The increment concerned, or null for the test as a whole. */
  readonly incrementIndex: number | null;
}
