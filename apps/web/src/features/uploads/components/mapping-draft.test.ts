import { describe, expect, it } from 'vitest';
import { draftFromMapping, mappingFromDraft } from './mapping-draft';
import { LENGTH_UNIT_OPTIONS, STRESS_UNIT_OPTIONS, TIME_UNIT_OPTIONS } from './unit-options';

const complete = { ...draftFromMapping(null, ';'), stress: 'Load (kgf/cm2)', elapsedTime: 'Time (s)', deformation: 'Dial' };

describe('unit option lists', () => {
  it('offer every stress unit the issue names, with kgf/cm² written as labs write it', () => {
    expect(STRESS_UNIT_OPTIONS.map((o) => o.label)).toEqual(expect.arrayContaining(['kPa', 'kgf/cm²', 'psi']));
    expect(STRESS_UNIT_OPTIONS.map((o) => o.value)).toEqual(expect.arrayContaining(['kPa', 'kgfPerCm2', 'tsf', 'psi']));
  });

  it('offer minutes, seconds and hours, and mm and inches', () => {
    expect(TIME_UNIT_OPTIONS.map((o) => o.value)).toEqual(['min', 's', 'h']);
    expect(LENGTH_UNIT_OPTIONS.map((o) => o.value)).toEqual(['mm', 'in']);
  });
});

describe('mappingFromDraft(draft)', () => {
  it('asks for each required column that was not chosen', () => {
    const result = mappingFromDraft(draftFromMapping(null, null));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.errors).sort()).toEqual(['deformation', 'elapsedTime', 'stress']);
  });

  it('refuses one column used for two fields', () => {
    const result = mappingFromDraft({ ...complete, elapsedTime: 'Load (kgf/cm2)' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.elapsedTime).toMatch(/already chosen/);
  });

  it('needs the division size of a dial gauge', () => {
    const result = mappingFromDraft({ ...complete, deformationKind: 'dial', dialDivision: '' });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors.dialDivision).toMatch(/one gauge division/);
  });

  it('builds the mapping the API takes, with units, delimiter and dial settings', () => {
    const result = mappingFromDraft({ ...complete, stressUnit: 'kgfPerCm2', timeUnit: 's', deformationKind: 'dial', dialZero: '5.000', dialDivision: '0.01', dialDirection: 'decreases' });
    expect(result).toEqual({
      ok: true,
      mapping: {
        delimiter: ';',
        decimalSeparator: '.',
        headerRow: 1,
        columns: { increment: null, stress: 'Load (kgf/cm2)', elapsedTime: 'Time (s)', deformation: 'Dial' },
        units: { stress: 'kgfPerCm2', time: 's', deformation: 'mm' },
        deformationReading: { kind: 'dial', divisionSize: 0.01, increasesWithCompression: false, zeroReading: 5 },
      },
    });
  });

  it('round-trips a saved mapping through the form', () => {
    const first = mappingFromDraft({ ...complete, increment: 'Stage' });
    expect(first.ok).toBe(true);
    if (first.ok) expect(mappingFromDraft(draftFromMapping(first.mapping, null))).toEqual(first);
  });
});
