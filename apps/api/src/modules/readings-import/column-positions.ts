import type { ImportField, ImportMapping } from '@porestack/types';
import { ImportProblem } from './import-problem.js';
import { FIELD_LABEL } from './readings-messages.js';

export type ColumnPositions = Record<ImportField, number | null>;

/**
 * Where each mapped column is in a header row: the exact name, else the name ignoring case
 * and surrounding spaces. The stress has no column when it comes from the sheet's name.
 * @throws ImportProblem naming the missing column and listing the columns found.
 */
export function columnPositions(header: readonly string[], mapping: ImportMapping, sheet: string | null): ColumnPositions {
  const positionOf = (field: ImportField): number | null => {
    if (field === 'stress' && mapping.stressFrom === 'sheetName') return null;
    const name = mapping.columns[field];
    if (name === null || name === undefined) return null;
    let position = header.indexOf(name);
    if (position === -1) position = header.findIndex((candidate) => candidate.trim().toLowerCase() === name.trim().toLowerCase());
    if (position === -1) {
      const found = header.filter((candidate) => candidate !== '').map((candidate) => `'${candidate}'`).join(', ');
      const where = sheet === null ? `row ${mapping.headerRow} of the file` : `row ${mapping.headerRow} of sheet '${sheet}'`;
      throw new ImportProblem(
        `The column '${name}' chosen for ${FIELD_LABEL[field]} is not in ${where} (found ${found || 'no column names'}). Choose one of the columns found, or the row that holds the column names.`,
        [{ row: mapping.headerRow, column: name, message: `No column named '${name}'.`, ...(sheet === null ? {} : { sheet }) }],
      );
    }
    return position;
  };
  return { increment: positionOf('increment'), stress: positionOf('stress'), elapsedTime: positionOf('elapsedTime'), deformation: positionOf('deformation') };
}
