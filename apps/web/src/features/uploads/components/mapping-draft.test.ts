import { guessFromMapping, type ImportMapping, type MappingGuess } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { draftFromGuess, mappingFromDraft } from './mapping-draft';
import { LENGTH_UNIT_OPTIONS, STRESS_UNIT_OPTIONS, TIME_UNIT_OPTIONS } from './unit-options';

/** The guess for a logger whose gauge reads in divisions of an unknown size ("Dial (div)"). */
const guess: MappingGuess = {
  delimiter: ';',
  decimalSeparator: '.',
  headerRow: 1,
  sheets: 'first',
  stressFrom: 'column',
  columns: { increment: 'Stage', stress: 'Load (kgf/cm2)', elapsedTime: 'Time (s)', deformation: 'Dial (div)' },
  units: { stress: 'kgfPerCm2', time: 's', deformation: 'mm' },
  time: { format: 'number', origin: 'increment', dateOrder: 'dmy' },
  deformationReading: { kind: 'dial', zeroReading: null, divisionSize: null, increasesWithCompression: false },
};

describe('unit option lists', () => {
  it('offer every stress unit the issue names, with kgf/cm² written as labs write it', () => {
    expect(STRESS_UNIT_OPTIONS.map((o) => o.label)).toEqual(expect.arrayContaining(['kPa', 'kgf/cm²', 'psi']));
    expect(STRESS_UNIT_OPTIONS.map((o) => o.value)).toEqual(expect.arrayContaining(['kPa', 'kgfPerCm2', 'tsf', 'psi']));
  });

  it('offer minutes, seconds, hours and days, and mm and inches', () => {
    expect(TIME_UNIT_OPTIONS.map((o) => o.value)).toEqual(['min', 's', 'h', 'd']);
    expect(LENGTH_UNIT_OPTIONS.map((o) => o.value)).toEqual(['mm', 'in']);
  });
});

describe('draftFromGuess(guess, open)', () => {
  it('fills in what was guessed and leaves blank what the file does not tell: no default division or direction', () => {
    const draft = draftFromGuess(guess, ['dialDivision']);
    expect(draft).toMatchObject({ stress: 'Load (kgf/cm2)', stressUnit: 'kgfPerCm2', timeUnit: 's', deformationKind: 'dial', dialDivision: '', dialDirection: 'decreases', dialZero: '' });
    expect(draftFromGuess({ ...guess, deformationReading: { ...guess.deformationReading, increasesWithCompression: null } }, ['dialDirection']).dialDirection).toBe('');
    expect(draftFromGuess(guess, ['stressUnit', 'timeUnit']).stressUnit).toBe('');
  });
});

describe('mappingFromDraft(draft)', () => {
  it('asks for the division and every unit left blank, each under its own setting', () => {
    const result = mappingFromDraft(draftFromGuess(guess, ['dialDivision', 'stressUnit', 'deformationUnit']));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['deformationUnit', 'dialDivision', 'stressUnit']);
  });

  it('asks for each required column that was not chosen, but not the stress when it comes from the sheet names', () => {
    const blank = { ...draftFromGuess(guess), dialDivision: '1', stress: '', elapsedTime: '', deformation: '' };
    const result = mappingFromDraft(blank);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['deformation', 'elapsedTime', 'stress']);
    const bySheet = mappingFromDraft({ ...blank, sheets: 'each', stressFrom: 'sheetName', elapsedTime: 'Time (s)', deformation: 'Dial (div)' });
    expect(bySheet.ok && bySheet.mapping.columns.stress).toBeNull();
  });

  it('refuses one column used for two fields', () => {
    const result = mappingFromDraft({ ...draftFromGuess(guess), dialDivision: '0.001', elapsedTime: 'Load (kgf/cm2)' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.elapsedTime).toMatch(/already chosen/);
  });

  it('builds the mapping the API takes, with units, delimiter, time and dial settings', () => {
    const result = mappingFromDraft({ ...draftFromGuess(guess, ['dialDivision']), dialDivision: '0.001', dialZero: '5000' });
    expect(result).toEqual({
      ok: true,
      mapping: {
        delimiter: ';',
        decimalSeparator: '.',
        headerRow: 1,
        sheets: 'first',
        stressFrom: 'column',
        columns: guess.columns,
        units: guess.units,
        time: guess.time,
        deformationReading: { kind: 'dial', divisionSize: 0.001, increasesWithCompression: false, zeroReading: 5000 },
      },
    });
  });

  it('round-trips a saved mapping through the form', () => {
    const first = mappingFromDraft({ ...draftFromGuess(guess), dialDivision: '0.002' });
    expect(first.ok).toBe(true);
    if (first.ok) expect(mappingFromDraft(draftFromGuess(guessFromMapping(first.mapping as ImportMapping)))).toEqual(first);
  });
});
