import type { CsvDelimiter, DetectedFileType, ImportIssue, ImportMapping } from '@porestack/types';
import type { ParsedReadings } from './read-readings.js';
import type { ImportLimits, RawTable } from './raw-table.js';

/**
 * What the parse thread is asked to do with a file's bytes. It runs apart from the API's
 * and the worker's event loops (parse-pool.ts), so a damaged file can be stopped.
 */
export type ParseTask = PreviewTask | ImportParseTask;

export interface PreviewTask {
  readonly kind: 'preview';
  readonly bytes: Uint8Array;
  readonly type: DetectedFileType;
  readonly limits: ImportLimits;
  readonly delimiter: CsvDelimiter | undefined;
  readonly previewRows: number;
}

export interface ImportParseTask {
  readonly kind: 'import';
  readonly bytes: Uint8Array;
  readonly type: DetectedFileType;
  readonly limits: ImportLimits;
  /** null: the file must be in the canonical layout, or it waits for a mapping. */
  readonly mapping: ImportMapping | null;
}

/** A task as the thread receives it: `started[0]` is set to 1 when the thread begins it. */
export type StartedTask = ParseTask & { readonly started: Int32Array };

/** An ImportProblem as plain data: errors do not keep their class across threads. */
export interface ParseProblem {
  readonly message: string;
  readonly issues: readonly ImportIssue[];
  readonly issueCount: number;
  readonly kind: 'rows' | 'not_readings';
}

/** What a parse thread answers; parseOffThread turns a 'problem' back into a thrown ImportProblem. */
export type ParseOutcome = PreviewOutcome | ImportParseOutcome;

export interface PreviewOutcome {
  readonly kind: 'preview';
  readonly table: RawTable;
}

export type ImportParseOutcome =
  | { readonly kind: 'needs_mapping'; readonly specimen: RawTable['specimen'] }
  | { readonly kind: 'readings'; readonly readings: ParsedReadings; readonly specimen: RawTable['specimen'] };

export type ThreadAnswer = ParseOutcome | { readonly kind: 'problem'; readonly problem: ParseProblem };
