import { overlappingFootingPairs } from '@porestack/geo-core';
import type { CheckOptions, FootingRow, GroundModelContent } from '@porestack/types';
import type { FieldIssue } from '../../errors/domain-error.js';
import { engineFootings } from './run-check-engine.js';

const rowLabel = (index: number, footing: FootingRow) => `Row ${index + 1} (${footing.id})`;

/**
 * What stops a check from running, and what the designer should look at first: each names the
 * footing's row and mark, or the option, and says what to do. Saving a draft allows an empty
 * schedule (and a uniform load without its Δσ); running does not.
 */
export function checkInputIssues(content: GroundModelContent, footings: readonly FootingRow[], options: CheckOptions, stage: 'save' | 'run'): { errors: FieldIssue[]; warnings: FieldIssue[] } {
  const errors: FieldIssue[] = [];
  const warnings: FieldIssue[] = [];
  const bottomM = content.layers.reduce((sum, layer) => sum + layer.thicknessM, 0);
  if (stage === 'save') {
    // A draft may be saved before its load is known; running it needs one.
  } else if (options.loading === 'uniform') {
    if (options.uniformStressIncreaseKpa === null) {
      errors.push({ path: 'options.uniformStressIncreaseKpa', message: 'A uniform load needs its stress increase Δσ (kPa). Enter it, or switch the loading to the footing schedule.' });
    }
  } else if (footings.length === 0) {
    errors.push({ path: 'footings', message: 'The schedule has no footings. Add at least one row (or paste or import the schedule) before running the check.' });
  }
  const firstRowOf = new Map<string, number>();
  footings.forEach((footing, index) => {
    const label = rowLabel(index, footing);
    const earlier = firstRowOf.get(footing.id);
    if (earlier !== undefined) errors.push({ path: `footings.${index}.id`, message: `${label}: the mark ${footing.id} is already used in row ${earlier + 1}. Give each footing its own mark.` });
    else firstRowOf.set(footing.id, index);
    if (footing.shape === 'rectangle' && footing.lengthM === null) {
      errors.push({ path: `footings.${index}.lengthM`, message: `${label}: a rectangle needs its length L (m). Enter L, or make the shape square.` });
    }
    if (footing.depthM >= bottomM) {
      errors.push({
        path: `footings.${index}.depthM`,
        message: `${label}: it is founded at ${footing.depthM} m, at or below the bottom of the ground model (${bottomM} m). Extend the ground model downwards or correct the depth.`,
      });
    }
  });
  if (options.loading === 'footings') warnings.push(...overlaps(footings));
  const settles = content.layers.some((layer) => layer.kind === 'compressible' || (options.immediate && layer.elasticModulusKpa !== null));
  if (!settles) {
    warnings.push({ path: 'groundModelId', message: 'No layer of the ground model can settle: none is compressible and none has E′ and ν. The check will report zero settlement.' });
  }
  return { errors, warnings };
}

/** Footings whose plan areas overlap (geo-core's overlappingFootingPairs), each pair once: usually a typing slip in x, y or a size. */
function overlaps(footings: readonly FootingRow[]): FieldIssue[] {
  const rowOf = new Map(footings.map((footing, index) => [footing.id, index]));
  return overlappingFootingPairs(engineFootings(footings)).map(([a, b]) => {
    const [first, second] = [rowOf.get(a) ?? 0, rowOf.get(b) ?? 0].sort((x, y) => x - y) as [number, number];
    return { path: `footings.${second}`, message: `Rows ${first + 1} (${footings[first]!.id}) and ${second + 1} (${footings[second]!.id}) overlap on plan. Check their x, y and sizes.` };
  });
}
