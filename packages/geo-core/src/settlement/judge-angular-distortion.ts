import { ANGULAR_DISTORTION_LIMITS, type AngularDistortionLimit } from './angular-distortion-limits.js';

/** Where an angular distortion falls among one source's limits. */
export interface AngularDistortionVerdict {
  readonly source: AngularDistortionLimit['source'];
  /** The most severe limit of this source that is exceeded, or null. */
  readonly exceededLimit: AngularDistortionLimit | null;
  /** The next limit of this source not yet reached, or null when all are exceeded. */
  readonly nextLimit: AngularDistortionLimit | null;
  /** One sentence for the report. */
  readonly statement: string;
}

interface SourceLimits {
  readonly source: AngularDistortionLimit['source'];
  readonly limits: readonly AngularDistortionLimit[];
}

// Each source's limits, strictest first, split once: a check judges thousands of
// pairs, and closures made per call were a fifth of its first (cold) run.
const limitsOf = (source: AngularDistortionLimit['source']): SourceLimits => ({ source, limits: ANGULAR_DISTORTION_LIMITS.filter((limit) => limit.source === source) });
const LIMITS_BY_SOURCE: readonly [SourceLimits, SourceLimits] = [limitsOf('Bjerrum (1963)'), limitsOf('Skempton & MacDonald (1956)')];

/**
 * Places an angular distortion δ/L among the published limits of Bjerrum (1963)
 * and of Skempton & MacDonald (1956), naming the most severe limit exceeded and
 * the next one ahead. A value exactly at a limit counts as reaching it, not
 * exceeding it.
 *
 * @param angularDistortion δ/L, dimensionless (≥ 0)
 * @returns one verdict per source, Bjerrum first
 * @throws RangeError when the distortion is negative or not finite
 * @example judgeAngularDistortion(1 / 400)[0].statement // 'Bjerrum (1963): 1/400 exceeds 1/500 (safe limit for buildings where cracking is not permissible); next limit 1/300 (…)'
 */
export function judgeAngularDistortion(angularDistortion: number): AngularDistortionVerdict[] {
  if (!(angularDistortion >= 0) || !Number.isFinite(angularDistortion)) throw new RangeError('judgeAngularDistortion requires a finite angularDistortion >= 0');
  const printed = angularDistortion === 0 ? '0' : `1/${Math.round(1 / angularDistortion)}`;
  return [verdictForSource(LIMITS_BY_SOURCE[0], angularDistortion, printed), verdictForSource(LIMITS_BY_SOURCE[1], angularDistortion, printed)];
}

function verdictForSource({ source, limits }: SourceLimits, angularDistortion: number, printed: string): AngularDistortionVerdict {
  let exceededLimit: AngularDistortionLimit | null = null;
  let nextLimit: AngularDistortionLimit | null = null;
  for (const limit of limits) {
    if (angularDistortion > limit.angularDistortion) exceededLimit = limit;
    else if (nextLimit === null) nextLimit = limit;
  }
  const statement =
    exceededLimit === null
      ? `${source}: ${printed} is within every limit; the strictest is ${nextLimit === null ? 'none' : describeLimit(nextLimit)}.`
      : `${source}: ${printed} exceeds ${describeLimit(exceededLimit)}${nextLimit === null ? '; every published limit is exceeded.' : `; next limit ${describeLimit(nextLimit)}.`}`;
  return { source, exceededLimit, nextLimit, statement };
}

function describeLimit(limit: AngularDistortionLimit): string {
  return `${limit.ratioLabel} (${limit.description})`;
}
