import { circleStressInfluence } from './circle-stress-influence.js';
import type { StressMethod } from './footing.types.js';
import type { PreparedFooting } from './prepared-footing.js';
import { rectangleInfluenceHoll } from './rectangle-influence-holl.js';
import { stripStressInfluence } from './strip-stress-influence.js';

/**
 * One footing's vertical stress increase at a point offset (dx, dy) from its
 * centre and zM below its base, by shape and method:
 * - Boussinesq: a rectangle or square by signed corner rectangles (Newmark 1935,
 *   in Holl's form for speed); a circle by circleStressInfluence at the radial
 *   offset √(dx² + dy²); a strip by stripStressInfluence at dx (independent of dy).
 * - 2V:1H: the load spread uniformly over (B + z)(L + z) for a rectangle or
 *   square, over a circle of diameter D + z for a circle, over a width B + z for
 *   a strip (q·B/(B + z)); zero outside the spread area.
 * Zero when the point is not below the base (zM ≤ 0).
 *
 * The inner step of stressIncreaseFromFootings and of the 2V:1H settlement
 * check: inputs are validated by the callers.
 *
 * @param footing prepared footing (m, kPa)
 * @param dxM offset from the footing centre along x, m
 * @param dyM offset along y, m
 * @param zM depth below the footing base, m
 * @param method 'boussinesq' | '2to1'
 * @returns Δσz in kPa
 * @example footingStressContributionKpa({ id: 'A', shape: 'rectangle', xM: 0, yM: 0, widthM: 2, lengthM: 2, depthM: 0, pressureKpa: 100 }, 0, 0, 1, 'boussinesq') // 70.09
 */
export function footingStressContributionKpa(footing: PreparedFooting, dxM: number, dyM: number, zM: number, method: StressMethod): number {
  if (zM <= 0) return 0;
  const { shape, widthM, pressureKpa } = footing;
  if (method === 'boussinesq') {
    if (shape === 'circle') return pressureKpa * circleStressInfluence(widthM / 2, Math.hypot(dxM, dyM), zM);
    if (shape === 'strip') return pressureKpa * stripStressInfluence(widthM / 2, dxM, zM);
    return pressureKpa * rectangleInfluenceHoll(widthM / 2, footing.lengthM / 2, dxM, dyM, zM);
  }
  const spreadWidthM = widthM + zM;
  if (shape === 'circle') {
    return Math.hypot(dxM, dyM) > spreadWidthM / 2 ? 0 : (pressureKpa * widthM * widthM) / (spreadWidthM * spreadWidthM);
  }
  if (Math.abs(dxM) > spreadWidthM / 2) return 0;
  if (shape === 'strip') return (pressureKpa * widthM) / spreadWidthM;
  const spreadLengthM = footing.lengthM + zM;
  if (Math.abs(dyM) > spreadLengthM / 2) return 0;
  return (pressureKpa * widthM * footing.lengthM) / (spreadWidthM * spreadLengthM);
}
