import type { TestStatus } from '@porestack/types';
import { DomainError } from '../../errors/domain-error.js';
import type { ImportProblem } from '../readings-import/import-problem.js';

export const fileTooLarge = (maxMb: number) =>
  new DomainError(
    'payload_too_large',
    `The file is larger than ${maxMb} MB, the most one upload may be, so it was not stored. Split the readings into smaller files (or thin out the logger's fastest readings) and upload again.`,
  );

export const malformedUpload = () =>
  new DomainError(
    'validation_failed',
    'The upload did not arrive as a well-formed form: the form was cut off on the way, or the file name holds control characters (such as NUL). Give the file a plain name and send it again from the test\'s Readings tab (one file, in the form field "file").',
    [{ path: 'file', message: 'Send one file, with a plain name, in the field "file".' }],
  );

export const fileMissing = () =>
  new DomainError('validation_failed', 'No file arrived. Choose a CSV or XLSX file of readings (form field "file") and upload again.', [
    { path: 'file', message: 'Choose a file.' },
  ]);

/** A file refused by its content: not CSV or XLSX at all (415), or one whose rows cannot be read (422). */
export function fileRefused(problem: ImportProblem): DomainError {
  const issues = problem.issues.map((issue) => ({ path: issue.column ? `row ${issue.row}, ${issue.column}` : `row ${issue.row}`, message: issue.message }));
  return new DomainError(problem.kind === 'not_readings' ? 'unsupported_file' : 'invalid_file', problem.message, issues.length > 0 ? issues : undefined);
}

export const readingsLocked = (status: TestStatus) =>
  new DomainError(
    'invalid_transition',
    `This test is ${status === 'approved' ? 'approved' : 'with the lab manager for review'}, so its readings cannot be replaced now. ${status === 'approved' ? 'Re-run the analysis to prepare a new version; new readings need a new test.' : 'Wait for the review.'}`,
  );

export const profileNameTaken = (name: string) =>
  new DomainError('profile_name_taken', `An import profile named “${name}” already exists in this organisation. Choose another name, or use the saved profile.`, [
    { path: 'name', message: 'Already in use.' },
  ]);
