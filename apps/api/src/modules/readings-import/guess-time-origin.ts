import type { DateOrder, SheetLayout, TimeFormat, TimeOrigin } from '@porestack/types';
import type { GuessedColumns } from './guess-columns.js';
import { cellText, headerOf, type RawRow, type RawTable } from './raw-table.js';
import { timeCellMinutes } from './read-time.js';

/**
 * How many of the data rows belong to the first increment: up to where the increment
 * column (else the stress column) first changes; all of them for a sheet per increment.
 */
export function firstIncrementRows(dataRows: readonly RawRow[], header: readonly string[], columns: GuessedColumns, layout: SheetLayout): number {
  if (layout === 'each') return dataRows.length;
  const key = columns.increment ?? columns.stress;
  if (!key) return dataRows.length;
  const position = header.indexOf(key.name);
  const first = cellText(dataRows[0]?.cells[position]);
  const boundary = dataRows.findIndex((row) => cellText(row.cells[position]) !== first);
  return boundary === -1 ? dataRows.length : boundary;
}

interface TimeReadingGuess {
  readonly format: TimeFormat;
  readonly minutesPerUnit: number;
  readonly decimalComma: boolean;
  readonly dateOrder: DateOrder;
}

/**
 * Whether the clock restarts with every increment or runs on from the start of the test:
 * the time of the second increment's first reading against the first increment's last.
 * Date-times always count from each increment's first reading.
 */
export function guessTimeOrigin(table: RawTable, header: readonly string[], headerRow: number, columns: GuessedColumns, layout: SheetLayout, time: TimeReadingGuess): { origin: TimeOrigin; reason: string } {
  if (time.format === 'datetime') return { origin: 'test', reason: 'Date-times: each increment counts from its own first reading.' };
  const column = columns.elapsedTime?.name;
  if (!column) return { origin: 'increment', reason: 'Each increment’s clock is taken to start at zero.' };
  const minutes = (row: RawRow | undefined, sheetHeader: readonly string[]) => {
    const value = timeCellMinutes(row?.cells[sheetHeader.indexOf(column)], time.format, time.minutesPerUnit, time.decimalComma, time.dateOrder);
    return typeof value === 'number' ? value : null;
  };
  const firstRows = (table.sheets[0]?.rows ?? []).filter((row) => row.rowNumber > headerRow);
  let before: number | null = null;
  let after: number | null = null;
  if (layout === 'each') {
    const second = table.sheets[1];
    const secondHeader = headerOf(second?.rows ?? [], headerRow);
    before = minutes(firstRows[firstRows.length - 1], header);
    after = minutes(second?.rows.find((row) => row.rowNumber > headerRow), secondHeader);
  } else {
    const boundary = firstIncrementRows(firstRows, header, columns, layout);
    if (boundary < firstRows.length) {
      before = minutes(firstRows[boundary - 1], header);
      after = minutes(firstRows[boundary], header);
    }
  }
  if (before === null || after === null) {
    return { origin: 'increment', reason: 'The rows read show one increment only: its clock is taken to start at zero with each load. If the clock runs on through the test, choose “from the start of the test”.' };
  }
  return after < before
    ? { origin: 'increment', reason: `The clock restarts with the second increment (${formatMinutes(after)} after ${formatMinutes(before)}).` }
    : { origin: 'test', reason: `The clock runs on into the second increment (${formatMinutes(after)} after ${formatMinutes(before)}): each increment counts from its first reading.` };
}

function formatMinutes(value: number): string {
  return `${Number(value.toPrecision(6))}`;
}
