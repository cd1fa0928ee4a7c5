import type { TestStatus } from '@porestack/types';
import { invalidTransition } from './consolidation-test.exception.js';

/**
 * Every move a test's status may make. Forwards: draft → readings_uploaded → analysed →
 * submitted → approved | changes_requested. Back, for re-work: new readings may replace old
 * ones until the test is with the manager; a re-analysis (new picks) is allowed after
 * approval or a change request, so the next approval makes the next soil record version.
 * A submitted test is frozen until the manager decides.
 */
export const TEST_TRANSITIONS: Readonly<Record<TestStatus, readonly TestStatus[]>> = {
  draft: ['readings_uploaded'],
  readings_uploaded: ['readings_uploaded', 'analysed'],
  analysed: ['readings_uploaded', 'analysed', 'submitted'],
  submitted: ['approved', 'changes_requested'],
  approved: ['analysed'],
  changes_requested: ['readings_uploaded', 'analysed'],
};

export function canMove(from: TestStatus, to: TestStatus): boolean {
  return TEST_TRANSITIONS[from].includes(to);
}

/** @throws DomainError `invalid_transition` naming the current state and what to do. */
export function assertMove(from: TestStatus, to: TestStatus): void {
  if (!canMove(from, to)) throw invalidTransition(from, to);
}
