import type { ImportIssue } from '@porestack/types';

/** At most this many rejected rows are listed; the rest are counted. */
export const MAXIMUM_LISTED_ISSUES = 200;

/**
 * A file that cannot be imported as it is: `message` says what to do; `issues` lists the
 * rejected rows (row number as a spreadsheet shows it, column name as in the file, reason).
 * Thrown by the parsers and the validator, caught by the import job, which records it.
 */
export class ImportProblem extends Error {
  constructor(
    message: string,
    readonly issues: readonly ImportIssue[] = [],
    readonly issueCount: number = issues.length,
    /** 'not_readings': the bytes are not CSV or XLSX at all (refused by content). */
    readonly kind: 'rows' | 'not_readings' = 'rows',
  ) {
    super(message);
    this.name = 'ImportProblem';
  }
}
