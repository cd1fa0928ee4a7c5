import type { TestStatus } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { audit } from '../audit/audit.service.js';
import { ConsolidationTestEntity } from './consolidation-test.entity.js';
import { assertMove } from './test-status-machine.js';

/**
 * Moves a test (locked by the caller in this transaction) to `to`, after checking the move,
 * and writes the audit entry in the same transaction.
 */
export async function moveTest(
  manager: EntityManager,
  test: ConsolidationTestEntity,
  to: TestStatus,
  actorId: string | null,
  extra: { changes?: Partial<ConsolidationTestEntity>; details?: Record<string, unknown> } = {},
): Promise<void> {
  const from = test.status;
  assertMove(from, to);
  await manager
    .getRepository(ConsolidationTestEntity)
    .update({ organisationId: test.organisationId, id: test.id }, { ...extra.changes, status: to });
  Object.assign(test, extra.changes, { status: to });
  await audit.record(
    {
      organisationId: test.organisationId,
      actorUserId: actorId,
      action: `test.${to}`,
      objectType: 'consolidation_test',
      objectId: test.id,
      details: { from, to, ...extra.details },
    },
    manager,
  );
}

/** The test row locked FOR UPDATE, or null. */
export function lockTest(manager: EntityManager, orgId: string, testId: string): Promise<ConsolidationTestEntity | null> {
  return manager.getRepository(ConsolidationTestEntity).findOne({ where: { organisationId: orgId, id: testId }, lock: { mode: 'pessimistic_write' } });
}
