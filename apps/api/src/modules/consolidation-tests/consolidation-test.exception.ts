import { TEST_STATUS_LABELS, type TestStatus } from '@porestack/types';
import { DomainError } from '../../errors/domain-error.js';

const NEXT_STEP: Record<TestStatus, string> = {
  draft: 'Upload the readings first.',
  readings_uploaded: 'Wait for the analysis to finish, or run it again.',
  analysed: 'Submit it for review when the analysis looks right.',
  submitted: 'Wait for the lab manager to approve it or send it back.',
  approved: 'Re-run the analysis (for instance with new picks) to prepare a new version.',
  changes_requested: 'Make the requested changes and re-run the analysis.',
};

const ACTION: Record<TestStatus, string> = {
  draft: 'return to draft',
  readings_uploaded: 'take new readings',
  analysed: 'be analysed',
  submitted: 'be submitted',
  approved: 'be approved',
  changes_requested: 'be sent back',
};

export const invalidTransition = (from: TestStatus, to: TestStatus) =>
  new DomainError(
    'invalid_transition',
    `This test cannot ${ACTION[to]} now: it is “${TEST_STATUS_LABELS[from]}”. ${NEXT_STEP[from]}`,
  );

export const ownTest = () =>
  new DomainError(
    'own_test',
    'You cannot approve or send back a test you ran or submitted yourself. Ask another lab manager to review it.',
  );

export const technicianNotMember = () =>
  new DomainError('validation_failed', 'The technician must be a member of this organisation. Choose someone from the members list.', [
    { path: 'technicianId', message: 'Not a member of this organisation.' },
  ]);

export const specimenIncomplete = (missing: string[]) =>
  new DomainError(
    'validation_failed',
    `The specimen data is incomplete, so the test cannot be analysed: enter ${missing.join(', ')} on the test page.`,
    missing.map((path) => ({ path: `specimen.${path}`, message: 'Required for the analysis.' })),
  );

export const specimenLocked = () =>
  new DomainError(
    'invalid_transition',
    'The test is with the lab manager, so its specimen data and apparatus cannot change now. Wait for the review.',
  );
