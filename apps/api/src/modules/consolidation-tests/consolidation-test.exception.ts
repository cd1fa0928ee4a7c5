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

const CHANGED_WORDS: Record<string, string> = { 'set-up': 'set-up', picks: 'picks', readings: 'readings' };

/** An approver changed the test in this review round: naming what, and when. */
export const ownChanges = (changes: Array<{ kind: string; at: Date }>) =>
  new DomainError(
    'own_test',
    `You changed this test's ${changes.map((c) => CHANGED_WORDS[c.kind] ?? c.kind).join(' and ')} since it was last approved (last on ${changes
      .map((c) => c.at)
      .reduce((a, b) => (a > b ? a : b))
      .toISOString()
      .slice(0, 10)}), so you cannot approve or send it back. Ask another lab manager to review it.`,
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

export const technicianWithoutRole = () =>
  new DomainError('validation_failed', 'The technician must hold the technician role in this organisation. Choose a technician, or ask an administrator to give this member the role.', [
    { path: 'technicianId', message: 'This member is not a technician.' },
  ]);

/** What the technician reads for each specimen value the analysis cannot do without. */
const SPECIMEN_WORDS: Record<string, string> = {
  initialHeightMm: "the specimen's initial height",
  diameterMm: "the specimen's diameter",
  specificGravity: 'the specific gravity of the solids',
  dryMassG: "the specimen's dry mass, or its wet mass and initial water content",
};

export const specimenIncomplete = (missing: string[]) => {
  const words = missing.map((key) => SPECIMEN_WORDS[key] ?? key);
  const list = words.length > 1 ? `${words.slice(0, -1).join('; ')}; and ${words[words.length - 1]}` : (words[0] ?? '');
  return new DomainError(
    'validation_failed',
    `The test cannot be analysed yet. Enter ${list}, on the Set-up tab, then run the analysis again.`,
    missing.map((path) => ({ path: `specimen.${path}`, message: 'Required for the analysis.' })),
  );
};

export const specimenLocked = () =>
  new DomainError(
    'invalid_transition',
    'The test is with the lab manager, so its specimen data and apparatus cannot change now. Wait for the review.',
  );
