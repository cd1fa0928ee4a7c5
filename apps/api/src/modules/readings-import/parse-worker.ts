import { Buffer } from 'node:buffer';
import { CANONICAL_MAPPING, detectLayout } from './detect-layout.js';
import { ImportProblem } from './import-problem.js';
import type { StartedTask, ThreadAnswer } from './parse-task.js';
import { readReadings } from './read-readings.js';
import { readTable } from './read-table.js';

/**
 * The body of a parse thread (see parse-pool.ts): reads the file and, for an import,
 * checks every row, returning the readings as typed arrays. Imports nothing that touches
 * the database, storage or the environment, so a thread that is stopped leaves nothing.
 */
export default async function parseInThread(task: StartedTask): Promise<ThreadAnswer> {
  // The caller's deadline starts now.
  Atomics.store(task.started, 0, 1);
  const bytes = Buffer.from(task.bytes.buffer, task.bytes.byteOffset, task.bytes.byteLength);
  try {
    if (task.kind === 'preview') {
      return { kind: 'preview', table: await readTable(bytes, task.type, task.limits, { delimiter: task.delimiter, previewRows: task.previewRows }) };
    }
    const mapping = task.mapping ?? CANONICAL_MAPPING;
    const names = Object.values(mapping.columns).filter((name): name is string => typeof name === 'string' && name !== '');
    const table = await readTable(bytes, task.type, task.limits, { delimiter: task.mapping?.delimiter, keepColumns: { headerRow: mapping.headerRow, names } });
    if (task.mapping === null && detectLayout(table) !== 'canonical') return { kind: 'needs_mapping', specimen: table.specimen };
    return { kind: 'readings', readings: readReadings(table, mapping), specimen: table.specimen };
  } catch (error) {
    if (!(error instanceof ImportProblem)) throw error;
    return { kind: 'problem', problem: { message: error.message, issues: error.issues, issueCount: error.issueCount, kind: error.kind } };
  }
}
