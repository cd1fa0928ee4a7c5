import { z } from 'zod';
import { numberIn, positiveNumber } from './design-fields.js';

/** Published limits a check can be judged against; the screen and the export name the one used. */
export const LIMIT_SOURCES = ['bjerrum-1963', 'skempton-macdonald-1956', 'en-1997-1-annex-h', 'designer'] as const;
export const LimitSourceSchema = z.enum(LIMIT_SOURCES);
export type LimitSource = z.infer<typeof LimitSourceSchema>;

export const LIMIT_SOURCE_LABELS: Record<LimitSource, string> = {
  'bjerrum-1963': 'Bjerrum (1963)',
  'skempton-macdonald-1956': 'Skempton & MacDonald (1956)',
  'en-1997-1-annex-h': 'EN 1997-1 Annex H',
  designer: 'the designer’s own limit',
};

/** The defaults, each with the published table it comes from (domain notes on tolerable movement). */
export const DEFAULT_LIMITS = {
  /** 1/500: Bjerrum's safe limit where no cracking is allowed, Skempton & MacDonald's design limit. */
  angularDistortionDenominator: 500,
  angularDistortionSource: 'bjerrum-1963' as LimitSource,
  /** 50 mm: EN 1997-1 Annex H, often acceptable for isolated foundations. */
  totalSettlementMm: 50,
  totalSettlementSource: 'en-1997-1-annex-h' as LimitSource,
};

/** 'footings': the schedule; 'uniform': one stress increase at every depth (a wide fill, or Δσ given). */
export const LOADINGS = ['footings', 'uniform'] as const;
export const LoadingSchema = z.enum(LOADINGS);
export type Loading = z.infer<typeof LoadingSchema>;

export const CheckOptionsSchema = z.object({
  loading: LoadingSchema.default('footings'),
  /** With loading 'uniform': Δσ, kPa. */
  uniformStressIncreaseKpa: positiveNumber('stress increase Δσ', 'kPa').max(10_000).nullable().default(null),
  stressMethod: z.enum(['boussinesq', '2to1']).default('boussinesq'),
  includeNeighbours: z.boolean().default(true),
  /** 'thickness': slices no thicker than sublayerMaxThicknessM; 'count': sublayerCount slices per layer (1: mid-depth stresses). */
  sublayerMode: z.enum(['thickness', 'count']).default('thickness'),
  sublayerMaxThicknessM: numberIn('largest sublayer thickness (m)', 0.05, 10).default(0.5),
  sublayerCount: z.number().int({ message: 'The number of sublayers must be a whole number.' }).min(1).max(200).default(10),
  immediate: z.boolean().default(true),
  secondary: z.boolean().default(true),
  designLifeYears: numberIn('design life (years)', 1, 200).default(50),
  evaluationPoints: z.enum(['centre', 'centre-and-corners']).default('centre-and-corners'),
  applyFoxDepthFactor: z.boolean().default(false),
  totalSettlementLimitMm: positiveNumber('total settlement limit', 'mm').max(2000).nullable().default(DEFAULT_LIMITS.totalSettlementMm),
  totalSettlementSource: LimitSourceSchema.default(DEFAULT_LIMITS.totalSettlementSource),
  /** The limit on angular distortion as 1/n; n here. */
  angularDistortionDenominator: numberIn('angular distortion limit 1/n (n)', 50, 5000).default(DEFAULT_LIMITS.angularDistortionDenominator),
  angularDistortionSource: LimitSourceSchema.default(DEFAULT_LIMITS.angularDistortionSource),
  /** Footing pairs further apart than this (centre to centre) are not judged as neighbours, m. */
  pairMaxDistanceM: positiveNumber('largest distance between neighbouring footings', 'm').max(1000).nullable().default(12),
});
export type CheckOptions = z.infer<typeof CheckOptionsSchema>;
export type CheckOptionsInput = z.input<typeof CheckOptionsSchema>;
