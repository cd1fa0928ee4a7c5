import { DomainError, type FieldIssue } from './domain-error.js';

/**
 * Stops a save on bad input and leaves nothing written: errors always (validation_failed),
 * warnings until the person has read them and sent the request again with acceptWarnings
 * (confirmation_needed). Each issue names its field or row.
 */
export function refuseUnlessClean(errors: readonly FieldIssue[], warnings: readonly FieldIssue[], acceptWarnings: boolean, what: string): void {
  if (errors.length > 0) {
    const first = errors[0]!.message;
    const more = errors.length > 1 ? ` (and ${errors.length - 1} more problem${errors.length === 2 ? '' : 's'} listed)` : '';
    throw new DomainError('validation_failed', `The ${what} was not saved. ${first}${more}`, [...errors]);
  }
  if (warnings.length > 0 && !acceptWarnings) {
    throw new DomainError(
      'confirmation_needed',
      `The ${what} was not saved yet: ${warnings.length === 1 ? 'one value needs' : `${warnings.length} values need`} a second look. Check ${warnings.length === 1 ? 'it' : 'them'}, then save anyway if ${warnings.length === 1 ? 'it is' : 'they are'} right.`,
      [...warnings],
    );
  }
}
