import type { MappingSetting, MappingSuggestion, UploadPreview } from '@porestack/types';
import type { ReactNode } from 'react';
import { Select, type SelectOption } from '../../../components/select';
import { TextField } from '../../../components/text-field';
import { guessHint } from './guess-hint';
import type { MappingDraft, MappingErrors } from './mapping-draft';
import {
  DATE_ORDER_OPTIONS,
  DEFORMATION_KIND_OPTIONS,
  DELIMITER_OPTIONS,
  DIAL_DIRECTION_OPTIONS,
  LENGTH_UNIT_OPTIONS,
  SHEET_OPTIONS,
  STRESS_FROM_OPTIONS,
  STRESS_UNIT_OPTIONS,
  TIME_FORMAT_OPTIONS,
  TIME_ORIGIN_OPTIONS,
  TIME_UNIT_OPTIONS,
  withChoose,
} from './unit-options';

export type FieldsProps = {
  preview: UploadPreview;
  suggestion: MappingSuggestion;
  draft: MappingDraft;
  errors: MappingErrors;
  set: <K extends keyof MappingDraft>(key: K, value: MappingDraft[K]) => void;
};

/** A select of the mapping form, with the guess's reason (or "choose this") under it. */
type SettingProps = { setting: MappingSetting; label: string; options: readonly SelectOption[]; value: string; onChange: (value: string) => void; error: string | undefined; suggestion: MappingSuggestion };

function Setting({ setting, label, options, value, onChange, error, suggestion }: SettingProps) {
  return <Select label={label} name={setting} options={withChoose(options, value)} value={value} onChange={(e) => onChange(e.target.value)} error={error} hint={guessHint(suggestion, setting)} />;
}

const grid = (children: ReactNode) => <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">{children}</div>;

/** Where the readings are: the header row and delimiter (read again at once), decimal mark, sheets, stress source. */
export function FileLayoutFields({ preview, suggestion, draft, errors, set, onHeaderRow, onDelimiter }: FieldsProps & { onHeaderRow: (row: number) => void; onDelimiter: (delimiter: MappingDraft['delimiter']) => void }) {
  const rows = preview.topRows.map((row) => ({ value: String(row.rowNumber), label: `Row ${row.rowNumber}: ${row.cells.filter((c) => c !== null && c !== '').slice(0, 3).join(' · ').slice(0, 48) || '(empty)'}` }));
  return grid(
    <>
      <Setting setting="headerRow" label="Row of the column names" options={rows} value={draft.headerRow} onChange={(v) => onHeaderRow(Number(v))} error={errors.headerRow} suggestion={suggestion} />
      {preview.detectedType === 'csv' ? (
        <Setting setting="delimiter" label="Delimiter" options={DELIMITER_OPTIONS} value={draft.delimiter ?? ''} onChange={(v) => onDelimiter(v as MappingDraft['delimiter'])} error={errors.delimiter} suggestion={suggestion} />
      ) : null}
      <Setting setting="decimalSeparator" label="Decimal separator" options={[{ value: '.', label: 'Point (1.25)' }, { value: ',', label: 'Comma (1,25)' }]} value={draft.decimalSeparator} onChange={(v) => set('decimalSeparator', v as '.' | ',')} error={errors.decimalSeparator} suggestion={suggestion} />
      {preview.sheets.length > 1 ? (
        <>
          <Setting setting="sheets" label="Readings are on" options={SHEET_OPTIONS} value={draft.sheets} onChange={(v) => set('sheets', v as MappingDraft['sheets'])} error={errors.sheets} suggestion={suggestion} />
          {draft.sheets === 'each' ? <Setting setting="stressFrom" label="Stress from" options={STRESS_FROM_OPTIONS} value={draft.stressFrom} onChange={(v) => set('stressFrom', v as MappingDraft['stressFrom'])} error={errors.stressFrom} suggestion={suggestion} /> : null}
        </>
      ) : null}
    </>,
  );
}

/** Which column holds each field. */
export function ColumnFields({ preview, suggestion, draft, errors, set }: FieldsProps) {
  const columns = preview.columns.filter((c) => c !== '').map((c) => ({ value: c, label: c }));
  const none = draft.sheets === 'each' ? 'None: each sheet is one increment' : 'None: a new increment when the stress changes';
  return grid(
    <>
      <Select label="Increment column" name="increment" options={[{ value: '', label: none }, ...columns]} value={draft.increment} onChange={(e) => set('increment', e.target.value)} error={errors.increment} hint={guessHint(suggestion, 'increment')} />
      {draft.stressFrom === 'column' ? <Setting setting="stress" label="Stress column" options={columns} value={draft.stress} onChange={(v) => set('stress', v)} error={errors.stress} suggestion={suggestion} /> : null}
      <Setting setting="elapsedTime" label="Time column" options={columns} value={draft.elapsedTime} onChange={(v) => set('elapsedTime', v)} error={errors.elapsedTime} suggestion={suggestion} />
      <Setting setting="deformation" label="Deformation column" options={columns} value={draft.deformation} onChange={(v) => set('deformation', v)} error={errors.deformation} suggestion={suggestion} />
    </>,
  );
}

/** Units and how time is written and counted. */
export function UnitFields({ suggestion, draft, errors, set }: FieldsProps) {
  return grid(
    <>
      <Setting setting="stressUnit" label="Stress unit" options={STRESS_UNIT_OPTIONS} value={draft.stressUnit} onChange={(v) => set('stressUnit', v as MappingDraft['stressUnit'])} error={errors.stressUnit} suggestion={suggestion} />
      <Setting setting="timeFormat" label="Time written as" options={TIME_FORMAT_OPTIONS} value={draft.timeFormat} onChange={(v) => set('timeFormat', v as MappingDraft['timeFormat'])} error={errors.timeFormat} suggestion={suggestion} />
      {draft.timeFormat === 'number' ? <Setting setting="timeUnit" label="Time unit" options={TIME_UNIT_OPTIONS} value={draft.timeUnit} onChange={(v) => set('timeUnit', v as MappingDraft['timeUnit'])} error={errors.timeUnit} suggestion={suggestion} /> : null}
      {draft.timeFormat === 'datetime' ? (
        <Setting setting="dateOrder" label="Dates written" options={DATE_ORDER_OPTIONS} value={draft.dateOrder} onChange={(v) => set('dateOrder', v as MappingDraft['dateOrder'])} error={errors.dateOrder} suggestion={suggestion} />
      ) : (
        <Setting setting="timeOrigin" label="Times count from" options={TIME_ORIGIN_OPTIONS} value={draft.timeOrigin} onChange={(v) => set('timeOrigin', v as MappingDraft['timeOrigin'])} error={errors.timeOrigin} suggestion={suggestion} />
      )}
    </>,
  );
}

/** What the deformation column holds; for a gauge, its zero, division and direction (no defaults). */
export function GaugeFields({ suggestion, draft, errors, set }: FieldsProps) {
  return grid(
    <>
      <Setting setting="deformationKind" label="The deformation column holds" options={DEFORMATION_KIND_OPTIONS} value={draft.deformationKind} onChange={(v) => set('deformationKind', v as MappingDraft['deformationKind'])} error={errors.deformationKind} suggestion={suggestion} />
      <Setting setting="deformationUnit" label="Deformation unit" options={LENGTH_UNIT_OPTIONS} value={draft.deformationUnit} onChange={(v) => set('deformationUnit', v as MappingDraft['deformationUnit'])} error={errors.deformationUnit} suggestion={suggestion} />
      {draft.deformationKind === 'dial' ? (
        <>
          <TextField label="One division" name="dialDivision" inputMode="decimal" hint={guessHint(suggestion, 'dialDivision') ?? 'In the deformation unit: 1 when the gauge reads in mm or inches'} value={draft.dialDivision} onChange={(e) => set('dialDivision', e.target.value)} error={errors.dialDivision} />
          <Setting setting="dialDirection" label="Direction" options={DIAL_DIRECTION_OPTIONS} value={draft.dialDirection} onChange={(v) => set('dialDirection', v as MappingDraft['dialDirection'])} error={errors.dialDirection} suggestion={suggestion} />
          <TextField label="Zero reading" name="dialZero" inputMode="decimal" hint={guessHint(suggestion, 'dialZero') ?? 'Blank: the first reading'} value={draft.dialZero} onChange={(e) => set('dialZero', e.target.value)} error={errors.dialZero} />
        </>
      ) : null}
    </>,
  );
}
