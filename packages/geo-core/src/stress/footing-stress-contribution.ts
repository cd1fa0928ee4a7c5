import type { StressMethod } from './footing.types.js';
import { rectangleInfluenceHoll } from './rectangle-influence-holl.js';

/** A footing reduced to the numbers the stress sum needs, validated once. */
export interface PreparedFooting {
  readonly id: string;
  readonly xM: number;
  readonly yM: number;
  readonly widthM: number;
  readonly lengthM: number;
  readonly depthM: number;
  readonly pressureKpa: number;
  /** Fox's depth factor on this footing's immediate settlement under itself (the settlement check's option); absent: 1. */
  readonly immediateDepthFactor?: number;
}

/**
 * One footing's vertical stress increase at a point offset (dx, dy) from its
 * centre and zM below its base: Boussinesq by signed corner rectangles
 * (Newmark 1935; in Holl's equivalent form for speed), or 2V:1H inside the spread area (B + z) × (L + z) and zero
 * outside it. Zero when the point is not below the base (zM ≤ 0).
 *
 * The inner step of stressIncreaseFromFootings and of the settlement check,
 * which calls it millions of times: inputs are validated by the callers.
 *
 * @param footing prepared footing (m, kPa)
 * @param dxM offset from the footing centre along x, m
 * @param dyM offset along y, m
 * @param zM depth below the footing base, m
 * @param method 'boussinesq' | '2to1'
 * @returns Δσz in kPa
 * @example footingStressContributionKpa({ id: 'A', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 0, pressureKpa: 100 }, 0, 0, 1, 'boussinesq') // 70.09
 */
export function footingStressContributionKpa(footing: PreparedFooting, dxM: number, dyM: number, zM: number, method: StressMethod): number {
  if (zM <= 0) return 0;
  if (method === 'boussinesq') {
    return footing.pressureKpa * rectangleInfluenceHoll(footing.widthM / 2, footing.lengthM / 2, dxM, dyM, zM);
  }
  const spreadWidthM = footing.widthM + zM;
  const spreadLengthM = footing.lengthM + zM;
  if (Math.abs(dxM) > spreadWidthM / 2 || Math.abs(dyM) > spreadLengthM / 2) return 0;
  return (footing.pressureKpa * footing.widthM * footing.lengthM) / (spreadWidthM * spreadLengthM);
}
