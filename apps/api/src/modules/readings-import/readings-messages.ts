import type { ImportField, ImportMapping, StressUnit, TimeUnit } from '@porestack/types';

export const STRESS_SYMBOL: Record<StressUnit, string> = { kPa: 'kPa', kgfPerCm2: 'kgf/cm²', tsf: 'tsf', psi: 'psi', MPa: 'MPa' };
const TIME_WORDS: Record<TimeUnit, string> = { min: 'minutes', s: 'seconds', h: 'hours', d: 'days' };

export const FIELD_LABEL: Record<ImportField, string> = { increment: 'the increment number', stress: 'the stress', elapsedTime: 'the elapsed time', deformation: 'the deformation' };

/** What to write in each field's cells, in the mapping's units and formats, for the row messages. */
export function hintsFor(mapping: ImportMapping): Record<ImportField, string> {
  const time =
    mapping.time.format === 'duration'
      ? 'enter the time since the load was applied as h:mm:ss, e.g. 0:15:00 (or 26:00:00 past a day)'
      : mapping.time.format === 'datetime'
        ? `enter the date and time of the reading, e.g. ${mapping.time.dateOrder === 'mdy' ? '03/05/2024' : '05.03.2024'} 14:30:00 or 2024-03-05 14:30:00`
        : `enter the time since the load was applied, in ${TIME_WORDS[mapping.units.time]}, e.g. 15`;
  return {
    increment: 'enter the increment number, e.g. 3',
    stress: `enter the applied stress in ${STRESS_SYMBOL[mapping.units.stress]}, e.g. ${mapping.units.stress === 'kPa' ? '200' : '2'}`,
    elapsedTime: time,
    deformation:
      mapping.deformationReading.kind === 'dial'
        ? 'enter the gauge reading, e.g. 1254'
        : `enter the deformation in ${mapping.units.deformation} since the start of the test, compression positive, e.g. 0.412`,
  };
}

/** Why a cell is not the value its field needs, with what to enter. */
export function cellProblem(value: 'empty' | 'not-a-number' | 'decimal-comma' | 'not-a-duration' | 'not-a-date-time', written: string, hint: string): string {
  if (value === 'empty') return `the cell is empty; ${hint}.`;
  if (value === 'not-a-duration') return `'${written}' is not a time written as h:mm:ss; ${hint}.`;
  if (value === 'not-a-date-time') return `'${written}' is not a date and time; ${hint}.`;
  return `'${written}' is not a number; ${hint}${value === 'decimal-comma' ? " (it has a decimal comma: choose ',' as the decimal separator in the import settings)" : ''}.`;
}
