import { describe, expect, it } from 'vitest';
import { dialReadingsToDeformation } from './dial-readings-to-deformation.js';
import { readingsFromCsv } from './readings-from-csv.js';

const HEADER = 'increment,stress_kpa,elapsed_min,deformation_mm';

describe('readingsFromCsv(text)', () => {
  it('groups rows into increments in test order, accepting a BOM, CRLF and blank lines', () => {
    const result = readingsFromCsv(`\uFEFF${HEADER}\r\n1,25,0,0\r\n1,25,1,0.05\r\n\r\n2,50,0,0.05\r\n2,50,1,0.11\r\n`);
    expect(result).toEqual({
      ok: true,
      readingCount: 4,
      increments: [
        { index: 1, stressKpa: 25, readings: [{ elapsedMin: 0, deformationMm: 0 }, { elapsedMin: 1, deformationMm: 0.05 }] },
        { index: 2, stressKpa: 50, readings: [{ elapsedMin: 0, deformationMm: 0.05 }, { elapsedMin: 1, deformationMm: 0.11 }] },
      ],
    });
  });

  it('names the row (header = row 1), the column and what to enter for a value that is not a number', () => {
    const lines = [HEADER, ...Array.from({ length: 12 }, (_, i) => `1,25,${i},0.0${i % 10}`), '1,25,abc,0.2'];
    const result = readingsFromCsv(lines.join('\n'));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors).toEqual([
        { row: 14, column: 'elapsed_min', message: "Row 14, column elapsed_min: 'abc' is not a number; enter minutes since the load was applied, e.g. 0.25." },
      ]);
    }
  });

  it('lists every problem: wrong header, column count, negative time, changing stress, an increment split apart', () => {
    expect(readingsFromCsv('inc,stress,t,d\n1,2,3,4').ok).toBe(false);
    const result = readingsFromCsv([HEADER, '1,25,0', '1,25,0,0', '1,25,-1,0', '1,30,2,0.1', '2,50,0,0.1', '1,25,3,0.2'].join('\n'));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors.map((error) => [error.row, error.column])).toEqual([
        [2, null],
        [4, 'elapsed_min'],
        [5, 'stress_kpa'],
        [7, 'increment'],
      ]);
      expect(result.errorCount).toBe(4);
    }
  });

  it('rejects a file with a header and no readings', () => {
    expect(readingsFromCsv(`${HEADER}\n`).ok).toBe(false);
  });
});

describe('dialReadingsToDeformation(readings, gauge)', () => {
  it('turns a falling gauge into positive compression: 5.00 → 4.53 mm is 0.47 mm', () => {
    const [reading] = dialReadingsToDeformation([{ elapsedMin: 1, dialReading: 4.53 }], { zeroReading: 5, mmPerDivision: 1, compressionIncreasesReading: false });
    expect(reading?.deformationMm).toBeCloseTo(0.47, 12);
  });

  it('scales divisions: 250 divisions of 0.002 mm above zero on a rising gauge is 0.5 mm', () => {
    const [reading] = dialReadingsToDeformation([{ elapsedMin: 1, dialReading: 1250 }], { zeroReading: 1000, mmPerDivision: 0.002, compressionIncreasesReading: true });
    expect(reading?.deformationMm).toBeCloseTo(0.5, 12);
  });

  it('throws a RangeError for a zero division size', () => {
    expect(() => dialReadingsToDeformation([], { zeroReading: 0, mmPerDivision: 0, compressionIncreasesReading: true })).toThrow('dialReadingsToDeformation requires');
  });
});
