import type { CheckOptions, FootingRow, GroundModelContent } from '@porestack/types';
import type { FieldIssue } from '../../errors/domain-error.js';
import { planExtent } from './footing-geometry.js';

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
    if (footing.shape === 'circle' || footing.shape === 'strip') {
      errors.push({
        path: `footings.${index}.shape`,
        message: `${label}: ${footing.shape} footings are not yet handled by this version of the settlement engine. Enter it as a rectangle for now (a circle of diameter D as a square of side 0.886·D; a strip as a rectangle 10 times as long as it is wide).`,
      });
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

/** Footings whose plan areas overlap (each pair once): usually a typing slip in x, y or a size. */
function overlaps(footings: readonly FootingRow[]): FieldIssue[] {
  const extents = footings.map(planExtent);
  const order = extents.map((_, index) => index).sort((a, b) => extents[a]!.minX - extents[b]!.minX);
  const issues: FieldIssue[] = [];
  // Sweep along x: only footings whose x-ranges overlap are compared, so 2,000 rows stay quick.
  for (let i = 0; i < order.length; i += 1) {
    const a = extents[order[i]!]!;
    for (let j = i + 1; j < order.length; j += 1) {
      const b = extents[order[j]!]!;
      if (b.minX >= a.maxX) break;
      if (b.minY < a.maxY && a.minY < b.maxY) {
        const [first, second] = [order[i]!, order[j]!].sort((x, y) => x - y) as [number, number];
        issues.push({
          path: `footings.${second}`,
          message: `Rows ${first + 1} (${footings[first]!.id}) and ${second + 1} (${footings[second]!.id}) overlap on plan. Check their x, y and sizes.`,
        });
      }
    }
  }
  return issues;
}
