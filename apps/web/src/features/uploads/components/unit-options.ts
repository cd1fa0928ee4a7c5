import type { CsvDelimiter, DateOrder, LengthUnit, SheetLayout, StressSource, StressUnit, TimeFormat, TimeOrigin, TimeUnit } from '@porestack/types';
import type { SelectOption } from '../../../components/select';

/** Every unit the importer accepts, in the words a lab sheet uses. Readings are stored in kPa, min and mm. */
export const STRESS_UNIT_OPTIONS: readonly (SelectOption & { value: StressUnit })[] = [
  { value: 'kPa', label: 'kPa' },
  { value: 'kgfPerCm2', label: 'kgf/cm²' },
  { value: 'tsf', label: 'tsf (short tons per ft²)' },
  { value: 'psi', label: 'psi' },
  { value: 'MPa', label: 'MPa' },
];

export const TIME_UNIT_OPTIONS: readonly (SelectOption & { value: TimeUnit })[] = [
  { value: 'min', label: 'minutes' },
  { value: 's', label: 'seconds' },
  { value: 'h', label: 'hours' },
  { value: 'd', label: 'days' },
];

export const LENGTH_UNIT_OPTIONS: readonly (SelectOption & { value: LengthUnit })[] = [
  { value: 'mm', label: 'mm' },
  { value: 'in', label: 'inches' },
];

export const TIME_FORMAT_OPTIONS: readonly (SelectOption & { value: TimeFormat })[] = [
  { value: 'number', label: 'A number (in the time unit)' },
  { value: 'duration', label: 'h:mm:ss (or a time cell)' },
  { value: 'datetime', label: 'A date and time of day' },
];

export const TIME_ORIGIN_OPTIONS: readonly (SelectOption & { value: TimeOrigin })[] = [
  { value: 'increment', label: 'Each increment’s start (the clock restarts)' },
  { value: 'test', label: 'The test’s start (the clock runs on)' },
];

export const DATE_ORDER_OPTIONS: readonly (SelectOption & { value: DateOrder })[] = [
  { value: 'dmy', label: 'Day first (31/03/2024)' },
  { value: 'mdy', label: 'Month first (03/31/2024)' },
];

export const SHEET_OPTIONS: readonly (SelectOption & { value: SheetLayout })[] = [
  { value: 'first', label: 'The first sheet' },
  { value: 'each', label: 'One sheet per increment' },
];

export const STRESS_FROM_OPTIONS: readonly (SelectOption & { value: StressSource })[] = [
  { value: 'column', label: 'A column' },
  { value: 'sheetName', label: 'Each sheet’s name (“100 kPa”)' },
];

export const DELIMITER_OPTIONS: readonly (SelectOption & { value: CsvDelimiter })[] = [
  { value: ',', label: 'Comma ,' },
  { value: ';', label: 'Semicolon ;' },
  { value: '\t', label: 'Tab' },
  { value: '|', label: 'Bar |' },
];

export const DEFORMATION_KIND_OPTIONS: readonly SelectOption[] = [
  { value: 'deformation', label: 'Deformation (compression positive)' },
  { value: 'dial', label: 'Gauge reading (zero, division, direction)' },
];

export const DIAL_DIRECTION_OPTIONS: readonly SelectOption[] = [
  { value: 'increases', label: 'Rises as the specimen compresses' },
  { value: 'decreases', label: 'Falls as the specimen compresses' },
];

/** A select's options with a blank first choice, for settings the file does not tell. */
export function withChoose(options: readonly SelectOption[], chosen: string): readonly SelectOption[] {
  return chosen === '' ? [{ value: '', label: 'Choose…' }, ...options] : options;
}
