import type { LengthUnit, StressUnit, TimeUnit } from '@porestack/types';
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
];

export const LENGTH_UNIT_OPTIONS: readonly (SelectOption & { value: LengthUnit })[] = [
  { value: 'mm', label: 'mm' },
  { value: 'in', label: 'inches' },
];

export const DEFORMATION_KIND_OPTIONS: readonly SelectOption[] = [
  { value: 'deformation', label: 'Deformation (compression positive)' },
  { value: 'dial', label: 'Dial gauge reading' },
];

export const DIAL_DIRECTION_OPTIONS: readonly SelectOption[] = [
  { value: 'increases', label: 'Reading rises as the specimen compresses' },
  { value: 'decreases', label: 'Reading falls as the specimen compresses' },
];
