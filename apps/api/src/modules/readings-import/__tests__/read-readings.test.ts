import type { ImportMapping } from '@porestack/types';
import { describe, expect, it } from 'vitest';
import { demoReadings } from '../demo-readings.js';
import { LOGGER_MAPPING } from '../demo-files.js';
import { CANONICAL_MAPPING, detectLayout, headerOf, suggestMapping } from '../detect-layout.js';
import { ImportProblem } from '../import-problem.js';
import { parseCsvTable } from '../parse-csv-table.js';
import { readReadings } from '../read-readings.js';
import { csv, fixture } from './import-test-files.js';

const LIMITS = { maxFileBytes: 40 * 1024 * 1024, maxRows: 500_000 };

function table(bytes: Buffer, limits = LIMITS) {
  return parseCsvTable(bytes.toString('utf8'), limits);
}

/** The ImportProblem a call throws (fails the test when it does not throw one). */
function problemOf(run: () => unknown): ImportProblem {
  try {
    run();
  } catch (error) {
    if (error instanceof ImportProblem) return error;
    throw error;
  }
  throw new Error('expected an ImportProblem');
}

describe('parseCsvTable(text) and detectLayout(table)', () => {
  it('finds the canonical layout in the committed template and reads all 150 demo readings in 10 increments', () => {
    const parsed = table(fixture('canonical.csv'));
    expect(detectLayout(parsed)).toBe('canonical');
    const readings = readReadings(parsed, CANONICAL_MAPPING);
    expect(readings.count).toBe(150);
    expect(readings.incrementCount).toBe(10);
    expect(readings.rowNumber[0]).toBe(2);
    expect(readings.stressKpa[149]).toBe(100);
  });

  it('detects a semicolon delimiter on its own, and calls a renamed-column layout one that needs mapping', () => {
    const parsed = table(fixture('bench-logger.csv'));
    expect(parsed.delimiter).toBe(';');
    expect(detectLayout(parsed)).toBe('needs_mapping');
    expect(headerOf(parsed)).toEqual(['Stage', 'Load (kgf/cm2)', 'Time (s)', 'Dial (div)']);
  });

  it('when the chosen delimiter finds one column, names the delimiter the file seems to use', () => {
    const problem = problemOf(() => parseCsvTable(fixture('bench-logger.csv').toString('utf8'), LIMITS, { delimiter: ',' }));
    expect(problem.message).toContain("found only one column ('Stage;Load (kgf/cm2);Time (s);Dial (div)'): the file may use ';' between values — choose that delimiter");
  });

  it('when values are separated by a character it does not guess (colons), says found one column and names it', () => {
    const problem = problemOf(() => table(Buffer.from('increment:stress_kpa:elapsed_min:deformation_mm\n1:25:0:0\n')));
    expect(problem.message).toContain("found only one column");
    expect(problem.message).toContain("the file may use ':' between values");
  });

  it('drops blank lines and lines of empty cells but keeps each row’s number as a spreadsheet shows it', () => {
    const parsed = table(Buffer.from(`increment,stress_kpa,elapsed_min,deformation_mm\n${'\n'.repeat(50_000)},,,,\n1,25,0,0\n`));
    expect(parsed.rows.map((row) => row.rowNumber)).toEqual([1, 50_003]);
    expect(parsed.rows[1]?.cells).toEqual(['1', '25', '0', '0']);
  });

  it('refuses a row wider than 256 columns, naming the row', () => {
    const problem = problemOf(() => table(csv('1,25,0,0', `1,25,1,0.1${','.repeat(300)}x`)));
    expect(problem.message).toBe(
      'The file has a value in column 304 of row 3; a file of readings may be at most 256 columns wide. Delete the columns to the right of the readings (or move that value) and upload again.',
    );
  });

  it('refuses more rows than the limit before reading further', () => {
    const problem = problemOf(() => table(csv('1,25,0,0', '1,25,1,0.1', '1,25,2,0.2'), { maxFileBytes: 1e6, maxRows: 2 }));
    expect(problem.message).toContain('more than 2 rows of readings, the most one upload may hold');
  });
});

describe('readReadings(table, mapping)', () => {
  const read = (bytes: Buffer, mapping: ImportMapping = CANONICAL_MAPPING) => readReadings(table(bytes), mapping);

  it('when the file has only a header, says there are no readings', () => {
    expect(problemOf(() => read(csv())).message).toBe('The file has a header (row 1) but no readings below it. Add one row per reading, or download a template to see the layout.');
  });

  it('lists text in a numeric column with its row, column and what to enter', () => {
    const problem = problemOf(() => read(csv('1,25,0,0', '1,25,abc,0.1', '1,25,2,n/a')));
    expect(problem.issues).toEqual([
      { row: 3, column: 'elapsed_min', message: "Row 3, column elapsed_min: 'abc' is not a number; enter the time since the load was applied, in minutes, e.g. 15." },
      { row: 4, column: 'deformation_mm', message: "Row 4, column deformation_mm: 'n/a' is not a number; enter the deformation in mm since the start of the test, compression positive, e.g. 0.412." },
    ]);
    expect(problem.message).toMatch(/^2 problems found, so nothing was imported\. The first — Row 3, column elapsed_min/);
  });

  it('rejects negative and zero stress, and stress changing within an increment', () => {
    const problem = problemOf(() => read(csv('1,-25,0,0', '2,0,0,0', '3,50,0,0.1', '3,45,1,0.2')));
    expect(problem.issues.map((issue) => [issue.row, issue.column])).toEqual([
      [2, 'stress_kpa'],
      [3, 'stress_kpa'],
      [5, 'stress_kpa'],
    ]);
    expect(problem.issues[0]?.message).toContain('-25 kPa is negative; the applied stress must be above zero');
    expect(problem.issues[2]?.message).toContain('45 kPa differs from the 50 kPa of increment 3 (from row 4); every row of an increment carries the same stress');
  });

  it('rejects time going backwards within an increment, naming the earlier reading', () => {
    const problem = problemOf(() => read(csv('1,25,0,0', '1,25,4,0.1', '1,25,2,0.2')));
    expect(problem.issues).toEqual([
      { row: 4, column: 'elapsed_min', message: "Row 4, column elapsed_min: time goes backwards within increment 1: 2 after 4 at row 3; list each increment's readings in time order." },
    ]);
  });

  it('still reports time going backwards right after a row rejected for its deformation', () => {
    const problem = problemOf(() => read(csv('1,25,0,0', '1,25,4,abc', '1,25,2,0.2')));
    expect(problem.issues.map((issue) => [issue.row, issue.column])).toEqual([
      [3, 'deformation_mm'],
      [4, 'elapsed_min'],
    ]);
    expect(problem.issues[1]?.message).toContain('time goes backwards within increment 1: 2 after 4 at row 3');
  });

  it('rejects a repeated row and a second reading at the same time', () => {
    const problem = problemOf(() => read(csv('1,25,0,0', '1,25,1,0.1', '1,25,1,0.1', '1,25,2,0.2', '1,25,2,0.25')));
    expect(problem.issues.map((issue) => issue.message)).toEqual([
      'Row 4: repeats row 3 (increment 1 at 1); remove the duplicate row.',
      'Row 6: a second reading of increment 1 at 2 (row 5 has one); keep one reading per time.',
    ]);
  });

  it('rejects an increment split apart and increments not numbered one after another', () => {
    const problem = problemOf(() => read(csv('1,25,0,0', '2,50,0,0.1', '1,25,5,0.2', '4,100,0,0.3')));
    expect(problem.issues.map((issue) => issue.message)).toEqual([
      'Row 4, column increment: increment 1 appears again after other increments (it started at row 2); keep all readings of an increment together, increments in test order.',
      'Row 5, column increment: increment 4 follows increment 2 (row 3); increments must be numbered one after another in test order (3 expected here).',
    ]);
  });

  it('rejects a negative time and a fractional increment number', () => {
    const problem = problemOf(() => read(csv('1,25,-1,0', '1.5,25,0,0')));
    expect(problem.issues.map((issue) => issue.column)).toEqual(['elapsed_min', 'increment']);
  });

  it('suggests the decimal-comma setting for 0,25 and reads it once chosen', () => {
    const semicolons = Buffer.from('increment;stress_kpa;elapsed_min;deformation_mm\n1;25;0;0\n1;25;0,25;0,012\n');
    expect(problemOf(() => read(semicolons)).issues[0]?.message).toContain("it has a decimal comma: choose ',' as the decimal separator");
    const readings = read(semicolons, { ...CANONICAL_MAPPING, decimalSeparator: ',' });
    expect(Array.from(readings.elapsedMin)).toEqual([0, 0.25]);
  });

  it('lists at most 200 problems but counts them all', () => {
    const rows = Array.from({ length: 250 }, (_, i) => `1,25,${i},x`);
    const problem = problemOf(() => read(csv(...rows)));
    expect(problem.issues).toHaveLength(200);
    expect(problem.issueCount).toBe(250);
  });

  it('when a chosen column is missing, lists the columns found', () => {
    const problem = problemOf(() => read(fixture('canonical.csv'), { ...CANONICAL_MAPPING, columns: { ...CANONICAL_MAPPING.columns, stress: 'Load' } }));
    expect(problem.message).toContain("The column 'Load' chosen for the stress is not in row 1 of the file (found 'increment', 'stress_kpa', 'elapsed_min', 'deformation_mm')");
  });

  it('converts the logger layout (kgf/cm², seconds, falling dial of 0.001 mm) to the same readings as the canonical file', () => {
    const logger = read(fixture('bench-logger.csv'), LOGGER_MAPPING);
    const demo = demoReadings();
    expect(logger.count).toBe(demo.length);
    demo.forEach((reading, i) => {
      // Written rounded: load to 1e-6 kgf/cm² (≈ 1e-4 kPa), time to 1 ms, the dial to whole 0.001 mm divisions.
      expect(Math.abs((logger.stressKpa[i] as number) - reading.stressKpa)).toBeLessThan(1e-4);
      expect(Math.abs((logger.elapsedMin[i] as number) - reading.elapsedMin)).toBeLessThan(1e-4);
      expect(Math.abs((logger.deformationMm[i] as number) - reading.deformationMm)).toBeLessThanOrEqual(0.0005 + 1e-9);
    });
  });

  it('converts psi, hours and inches (1 psi = 6.894757 kPa, 1 h = 60 min, 1 in = 25.4 mm)', () => {
    const file = Buffer.from('inc,p,t,d\n1,10,0,0\n1,10,0.5,0.01\n');
    const readings = read(file, {
      ...CANONICAL_MAPPING,
      columns: { increment: 'inc', stress: 'p', elapsedTime: 't', deformation: 'd' },
      units: { stress: 'psi', time: 'h', deformation: 'in' },
    });
    expect(readings.stressKpa[0]).toBeCloseTo(68.94757, 5);
    expect(readings.elapsedMin[1]).toBe(30);
    expect(readings.deformationMm[1]).toBeCloseTo(0.254, 12);
  });

  it('without an increment column, starts a new increment wherever the stress changes, and takes the dial zero from the first reading', () => {
    const file = Buffer.from('load,t,dial\n25,0,1000\n25,1,1100\n50,0,1100\n50,1,1300\n');
    const readings = read(file, {
      ...CANONICAL_MAPPING,
      columns: { increment: null, stress: 'load', elapsedTime: 't', deformation: 'dial' },
      deformationReading: { kind: 'dial', divisionSize: 0.002, increasesWithCompression: true },
    });
    expect(Array.from(readings.incrementIndex)).toEqual([1, 1, 2, 2]);
    expect(Array.from(readings.deformationMm).map((d) => Math.round(d * 1000) / 1000)).toEqual([0, 0.2, 0.2, 0.6]);
  });

  it('suggests the logger mapping from its column names', () => {
    expect(suggestMapping(['Stage', 'Load (kgf/cm2)', 'Time (s)', 'Dial (div)'])).toMatchObject({
      columns: LOGGER_MAPPING.columns,
      units: LOGGER_MAPPING.units,
      deformationReading: { kind: 'dial', increasesWithCompression: true },
    });
    expect(suggestMapping(['a', 'b'])).toBeNull();
  });
});
