import type { ConsolidationTestInput } from '@porestack/geo-core';
import type { FieldIssue } from '../../errors/domain-error.js';

/** A refusal of the analysis in words a technician can act on, and the field it concerns. */
export interface AnalysisRefusal {
  readonly message: string;
  readonly issue: FieldIssue;
}

const mm = (value: number): string => `${Number(value.toFixed(3))} mm`;

/**
 * What to check when geo-core refuses a test (a RangeError naming the function and the
 * condition broken, its failure policy): the increment concerned, the numbers that make the
 * data impossible, and where to put them right — the specimen form, the import mapping of
 * the stored file, or the picks — in plain words, never a function's name.
 */
export function explainRefusal(input: ConsolidationTestInput, error: RangeError): AnalysisRefusal {
  const text = error.message;
  const { specimen, increments } = input;
  const area = (Math.PI * specimen.diameterMm * specimen.diameterMm) / 4;
  const dryMass = specimen.dryMassG ?? (specimen.wetMassG !== undefined && specimen.initialWaterContent !== undefined ? specimen.wetMassG / (1 + specimen.initialWaterContent) : null);
  const solidsMm = dryMass === null ? null : dryMass / (specimen.specificGravity * 0.001 * area);

  const past = /increment (-?\d+) compresses it past its solids/.exec(text);
  if (past) {
    const index = Number(past[1]);
    const increment = increments.find((candidate) => candidate.index === index);
    const deformation = increment?.readings[increment.readings.length - 1]?.deformationMm ?? null;
    return {
      message: `Increment ${index}${increment ? ` (${increment.stressKpa} kPa)` : ''} compresses the specimen by ${deformation === null ? 'more than it can' : mm(deformation)}, which would leave it thinner than its solids alone (${solidsMm === null ? 'the height of solids' : mm(solidsMm)} of its ${mm(specimen.initialHeightMm)}). The deformations are likely read too large: check the gauge's division size and unit in the import mapping (change the mapping of the stored file — no new upload needed), then the specimen's dry mass, specific gravity and ring diameter.`,
      issue: { path: `increments.${index}`, message: `Increment ${index} compresses the specimen past its solids.` },
    };
  }
  if (/height of solids to be less than the initial height/.test(text)) {
    return {
      message: `The specimen's solids alone would be ${solidsMm === null ? 'taller than the specimen' : `${mm(solidsMm)} tall`}, not less than its initial height of ${mm(specimen.initialHeightMm)}, so there would be no voids. Check the dry mass (g), the specific gravity and the ring's diameter and initial height in the specimen form.`,
      issue: { path: 'specimen.dryMassG', message: 'The dry mass, Gs and dimensions leave no room for voids.' },
    };
  }
  const blankReason = /reason for leaving out increment (-?\d+)/.exec(text);
  if (blankReason) {
    return { message: `Increment ${blankReason[1]} is left out of the analysis without a reason. Say why it is left out, or take it back in.`, issue: { path: 'picks.excludedIncrements', message: 'Give the reason.' } };
  }
  if (/at least one increment left/.test(text)) {
    return { message: 'Every increment is left out of the analysis, so there is nothing to analyse. Take back in the increments whose readings are sound.', issue: { path: 'picks.excludedIncrements', message: 'Leave at least one increment in.' } };
  }
  if (/positive initial height and diameter|positive specific gravity|water contents|drainage/.test(text)) {
    return { message: 'The specimen data are incomplete or out of range: the initial height, ring diameter and specific gravity must be above zero and water contents given as 0 or more. Correct them in the specimen form.', issue: { path: 'specimen', message: 'Check the specimen data.' } };
  }
  if (/in-situ vertical effective stress/.test(text)) {
    return { message: "The sample's in-situ vertical effective stress is zero or negative. Check the sample's depth, unit weight and the borehole's water table.", issue: { path: 'sample.inSituStressKpa', message: 'Must be above zero.' } };
  }
  if (/picked preconsolidation stress/.test(text)) {
    return { message: 'The picked preconsolidation stress must be above zero (kPa). Change or clear the pick.', issue: { path: 'picks.preconsolidationStressKpa', message: 'Must be above zero.' } };
  }
  if (/at least two distinct stresses|at least three points|at least two points/.test(text)) {
    return { message: 'Too few increments at different stresses are left to draw the compression curve. Import the whole test, or take back in increments left out of the analysis.', issue: { path: 'increments', message: 'Too few increments.' } };
  }
  // A condition not foreseen here: said without the function's name.
  const condition = text.replace(/^\w+ requires /, '');
  return { message: `The data break a condition of the analysis (it needs ${condition}). Check the specimen data and the readings of the stored file, then run it again.`, issue: { path: 'readings', message: `Needs ${condition}.` } };
}
