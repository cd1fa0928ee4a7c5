import { Readable } from 'node:stream';
import { zipEntry } from './zip-entry.js';

/** What exceljs 4.4's streaming WorkbookReader parses from the workbook's small parts (its own methods). */
interface WorkbookReaderParts {
  workbookRels?: unknown;
  model?: unknown;
  sharedStrings?: unknown;
  _parseRels(entry: Readable): Promise<void>;
  _parseWorkbook(entry: Readable): Promise<void>;
  _parseStyles(entry: Readable): Promise<void>;
  _parseSharedStrings(entry: Readable): AsyncIterable<unknown>;
}

/** Shared strings larger than this (uncompressed) are left to the streaming reader. */
const MAX_SHARED_STRINGS_BYTES = 64 * 1024 * 1024;

/**
 * Gives exceljs's streaming reader the workbook's relationships, sheet list, styles and
 * shared strings before it streams the worksheets. The reader learns them only when it meets
 * those parts in the zip; when they come after the worksheets (the order varies with the
 * writer), it read sheets without names, strings as `{ sharedString: n }` and styles without
 * date formats, or threw "Cannot read properties of undefined (reading 'sheets')". The whole
 * file is in memory already, so the parts are read from the zip's directory (zipEntry). With
 * all of them known, every worksheet is parsed as it streams (no temporary files).
 */
export async function primeWorkbookReader(reader: unknown, bytes: Buffer): Promise<void> {
  const parts = reader as WorkbookReaderParts;
  const part = (name: string, maxBytes?: number): Readable | null => {
    try {
      const content = zipEntry(bytes, name, maxBytes);
      return content ? Readable.from([content]) : null;
    } catch {
      // A damaged part: the streaming reader says what it makes of the file.
      return null;
    }
  };
  try {
    const rels = part('xl/_rels/workbook.xml.rels');
    if (rels) await parts._parseRels(rels);
    const workbook = part('xl/workbook.xml');
    if (workbook) await parts._parseWorkbook(workbook);
    const styles = part('xl/styles.xml');
    if (styles) await parts._parseStyles(styles);
    const strings = part('xl/sharedStrings.xml', MAX_SHARED_STRINGS_BYTES);
    if (strings) for await (const _string of parts._parseSharedStrings(strings)) void _string;
  } catch {
    // A damaged part: forget what was primed and let the streaming reader meet the file as it
    // is (the parse thread's deadline stops it if it never settles).
    parts.workbookRels = undefined;
    parts.model = undefined;
    parts.sharedStrings = undefined;
  }
}
