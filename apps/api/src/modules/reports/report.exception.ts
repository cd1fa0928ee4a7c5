import type { ReportKind, ReportState } from '@porestack/types';
import { DomainError } from '../../errors/domain-error.js';

/** Who can ask again for a report that failed to print, and where. */
export const REPORT_RETRY_HINT: Record<ReportKind, string> = {
  'test-report': 'A lab manager can try again from the soil record page.',
  'settlement-check': 'A designer of the project can try again from the check’s results.',
};

export function reportNotReady(state: ReportState, kind: ReportKind = 'test-report'): DomainError {
  return new DomainError(
    'report_not_ready',
    state === 'failed' ? `The report could not be generated. ${REPORT_RETRY_HINT[kind]}` : 'The report is still being prepared. Try again in a minute.',
  );
}

export function reportNotFailed(state: ReportState): DomainError {
  return new DomainError(
    'invalid_transition',
    state === 'ready'
      ? 'This report has already been issued; an issued report is never generated again. Download it instead.'
      : 'This report is already being prepared; wait for it to finish.',
  );
}
