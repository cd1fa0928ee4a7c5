import type { ReportState } from '@porestack/types';
import { DomainError } from '../../errors/domain-error.js';

export function reportNotReady(state: ReportState): DomainError {
  return new DomainError(
    'report_not_ready',
    state === 'failed'
      ? 'The report could not be generated. A lab manager can ask for it again from the soil record page.'
      : 'The report is still being prepared. Try again in a minute.',
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
