import { describe, expect, it } from 'vitest';
import { CANONICAL_MAPPING, detectLayout } from '../detect-layout.js';
import { LOGGER_MAPPING } from '../demo-files.js';
import { ImportProblem } from '../import-problem.js';
import { parseXlsxTable } from '../parse-xlsx-table.js';
import { readReadings } from '../read-readings.js';
import { fixture, workbook } from './import-test-files.js';

const LIMITS = { maxFileBytes: 40 * 1024 * 1024, maxRows: 500_000 };

async function problemOf(run: () => Promise<unknown>): Promise<ImportProblem> {
  const error = await run().then(
    () => null,
    (caught: unknown) => caught,
  );
  if (error instanceof ImportProblem) return error;
  throw error ?? new Error('expected an ImportProblem');
}

describe('parseXlsxTable(bytes)', () => {
  it('reads the canonical first sheet with no questions, and the specimen sheet as key/values', async () => {
    const parsed = await parseXlsxTable(fixture('canonical.xlsx'), LIMITS);
    expect(detectLayout(parsed)).toBe('canonical');
    expect(readReadings(parsed, CANONICAL_MAPPING).count).toBe(150);
    expect(parsed.specimen).toMatchObject({ initial_height_mm: 20, diameter_mm: 50, specific_gravity: 2.7, drainage: 'double' });
  });

  it('reads the logger workbook through its mapping', async () => {
    const parsed = await parseXlsxTable(fixture('bench-logger.xlsx'), LIMITS);
    expect(detectLayout(parsed)).toBe('needs_mapping');
    const readings = readReadings(parsed, LOGGER_MAPPING);
    expect(readings.count).toBe(150);
    expect(readings.stressKpa[0]).toBeCloseTo(12.5, 3);
  });

  it('uses the saved result of a formula', async () => {
    const bytes = await workbook((sheet) => {
      sheet.addRow([1, 25, 0, 0]);
      sheet.addRow([1, 25, { formula: 'C2+1', result: 1 }, 0.1]);
    });
    const readings = readReadings(await parseXlsxTable(bytes, LIMITS), CANONICAL_MAPPING);
    expect(Array.from(readings.elapsedMin)).toEqual([0, 1]);
  });

  it('refuses a formula with no saved result, naming the cell and the formula', async () => {
    const bytes = await workbook((sheet) => {
      sheet.addRow([1, 25, 0, 0]);
      sheet.addRow([1, 25, { formula: 'C2*60' }, 0.1]);
    });
    const problem = await problemOf(() => parseXlsxTable(bytes, LIMITS));
    expect(problem.message).toBe(
      "Sheet 'readings', cell C3 holds a formula (=C2*60) with no saved result. Open the workbook in Excel or LibreOffice and save it (so results are stored), or paste the values instead of formulas, then upload again.",
    );
    expect(problem.issues[0]).toMatchObject({ row: 3, column: 'C3' });
  });

  it('refuses merged cells, naming the ranges', async () => {
    const bytes = await workbook((sheet) => {
      sheet.addRow([1, 25, 0, 0]);
      sheet.addRow([1, 25, 1, 0.1]);
      sheet.addRow([1, 25, 2, 0.2]);
      sheet.mergeCells('B2:B4');
    });
    const problem = await problemOf(() => parseXlsxTable(bytes, LIMITS));
    expect(problem.message).toBe("Sheet 'readings' has merged cells (B2:B4). Readings need one value per cell: unmerge the cells, fill in each row's value, save and upload again.");
    expect(problem.issues).toEqual([{ row: 2, column: 'B2:B4', message: 'Cells B2:B4 are merged; unmerge them and give each row its own value.' }]);
  });

  it('refuses a damaged workbook with advice to save it again', async () => {
    const bytes = fixture('canonical.xlsx').subarray(0, 3000);
    const problem = await problemOf(() => parseXlsxTable(bytes, LIMITS));
    expect(problem.message).toMatch(/^The workbook could not be read .*save it again as \.xlsx/);
  });

  it('refuses a value far to the right (column XFD) naming the row, instead of widening every row to 16,384 cells', async () => {
    const bytes = await workbook((sheet) => {
      sheet.addRow([1, 25, 0, 0]);
      sheet.getCell(3, 16_384).value = 'stray';
    });
    const problem = await problemOf(() => parseXlsxTable(bytes, LIMITS));
    expect(problem.message).toBe(
      "Sheet 'readings' has a value in column 16384 of row 3; a file of readings may be at most 256 columns wide. Delete the columns to the right of the readings (or move that value) and upload again.",
    );
  });

  it('keeps only the mapped columns of an import below the header, and drops trailing empty cells', async () => {
    const bytes = await workbook((sheet) => {
      sheet.getRow(1).getCell(6).value = 'logger note';
      sheet.addRow([1, 25, 0, 0, null, 'kept out', null, null]);
    });
    const parsed = await parseXlsxTable(bytes, LIMITS, { keepColumns: { headerRow: 1, names: ['increment', 'stress_kpa', 'elapsed_min', 'deformation_mm'] } });
    expect(parsed.rows[0]?.cells).toEqual(['increment', 'stress_kpa', 'elapsed_min', 'deformation_mm', null, 'logger note']);
    expect(parsed.rows[1]?.cells).toEqual([1, 25, 0, 0]);
  });

  it('stops a preview at its rows and still reads the specimen sheet after them', async () => {
    const parsed = await parseXlsxTable(fixture('canonical.xlsx'), LIMITS, { previewRows: 5 });
    expect(parsed.rows.map((row) => row.rowNumber)).toEqual([1, 2, 3, 4, 5]);
    expect(parsed.specimen).toMatchObject({ initial_height_mm: 20, drainage: 'double' });
  });
});
