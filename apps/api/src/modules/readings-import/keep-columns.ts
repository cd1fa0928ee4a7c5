import { cellText, type Cell } from './raw-table.js';

/** Which columns an import reads: the names in its header row. */
export interface ColumnsToKeep {
  readonly headerRow: number;
  readonly names: readonly string[];
}

/**
 * For an import, cells of columns the mapping does not read are dropped as rows arrive
 * (the header row is kept whole), so a file's memory follows the columns used rather than
 * every column the logger wrote. Names match as readReadings matches them: exactly, or
 * ignoring case and surrounding spaces. If a name is not in the header, no row below it is
 * kept (null): the import stops at the header anyway, asking for a mapping or naming the
 * missing column.
 */
export function columnKeeper(keep: ColumnsToKeep | undefined): (rowNumber: number, cells: Cell[]) => Cell[] | null {
  if (!keep) return (_rowNumber, cells) => cells;
  let positions: number[] | null = null;
  let headerSeen = false;
  return (rowNumber, cells) => {
    if (rowNumber === keep.headerRow) {
      headerSeen = true;
      const header = cells.map((cell) => cellText(cell));
      const wanted = keep.names.map((name) => {
        const exact = header.indexOf(name);
        return exact !== -1 ? exact : header.findIndex((candidate) => candidate.trim().toLowerCase() === name.trim().toLowerCase());
      });
      positions = wanted.includes(-1) ? null : wanted;
      return cells;
    }
    if (!headerSeen || rowNumber < keep.headerRow) return cells;
    if (positions === null) return null;
    const kept: Cell[] = new Array<Cell>(Math.min(cells.length, Math.max(...positions) + 1)).fill(null);
    for (const position of positions) if (position < cells.length) kept[position] = cells[position] ?? null;
    return kept;
  };
}
