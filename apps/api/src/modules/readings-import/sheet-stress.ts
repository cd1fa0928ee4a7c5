import type { StressUnit } from '@porestack/types';
import { foldText, stressUnitOf } from './header-units.js';

const NUMBER_AND_UNIT = /(\d+(?:[.,]\d+)?)\s*([a-z][a-z/0-9]*)?/g;

/**
 * The stress written in a sheet's name — "100 kPa", "Stufe 4 - 0,5 kg/cm²", "25" — as its
 * value and unit (null when the name gives none: the mapping's unit applies). Where the name
 * has several numbers, the one followed by a stress unit wins, else the last one.
 * @returns null when the name holds no number.
 * @example stressFromSheetName('LS 3 – 50 kPa') // { value: 50, unit: 'kPa' }
 */
export function stressFromSheetName(name: string): { value: number; unit: StressUnit | null } | null {
  const folded = foldText(name);
  let last: { value: number; unit: StressUnit | null } | null = null;
  for (const match of folded.matchAll(NUMBER_AND_UNIT)) {
    const value = Number((match[1] as string).replace(',', '.'));
    const unit = match[2] === undefined ? null : stressUnitOf(match[2]);
    if (unit !== null) return { value, unit };
    last = { value, unit: null };
  }
  return last;
}
