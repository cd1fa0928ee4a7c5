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
  const sources = ['Bjerrum (1963)', 'Skempton & MacDonald (1956)'] as const;
  const printed = angularDistortion === 0 ? '0' : `1/${Math.round(1 / angularDistortion)}`;
  return sources.map((source) => {
    const limits = ANGULAR_DISTORTION_LIMITS.filter((limit) => limit.source === source);
    const exceeded = limits.filter((limit) => angularDistortion > limit.angularDistortion);
    const exceededLimit = exceeded[exceeded.length - 1] ?? null;
    const nextLimit = limits.find((limit) => angularDistortion <= limit.angularDistortion) ?? null;
    const describe = (limit: AngularDistortionLimit) => `${limit.ratioLabel} (${limit.description})`;
    const statement =
      exceededLimit === null
        ? `${source}: ${printed} is within every limit; the strictest is ${nextLimit === null ? 'none' : describe(nextLimit)}.`
        : `${source}: ${printed} exceeds ${describe(exceededLimit)}${nextLimit === null ? '; every published limit is exceeded.' : `; next limit ${describe(nextLimit)}.`}`;
    return { source, exceededLimit, nextLimit, statement };
  });
}
