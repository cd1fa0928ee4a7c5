import type { PicksUpdate } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { enqueueAnalysis } from '../../jobs/analyse-test-queue.js';
import { audit } from '../audit/audit.service.js';
import { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { recordContribution } from '../consolidation-tests/test-contributions.js';
import { lockTest } from '../consolidation-tests/test-transition.js';
import { assertMove } from '../consolidation-tests/test-status-machine.js';
import { noReadings } from './analysis.exception.js';

/**
 * Replaces the test's picks (with the reason, audited with the old and new picks) and queues
 * the re-analysis. Only where a re-analysis may follow: not in draft, not while submitted.
 * @returns the job id the page follows.
 */
export async function setPicks(orgId: string, testId: string, input: PicksUpdate, actor: Actor): Promise<string> {
  return dataSource.transaction(async (manager) => {
    const test = await lockTest(manager, orgId, testId);
    if (!test) throw new NotFoundError('test');
    if (test.status === 'draft') throw noReadings();
    assertMove(test.status, 'analysed');
    await manager.getRepository(ConsolidationTestEntity).update({ organisationId: orgId, id: testId }, { picks: input.picks, pickReason: input.reason });
    await recordContribution(manager, test, actor.id, 'picks');
    await audit.record(
      {
        organisationId: orgId,
        actorUserId: actor.id,
        action: 'test.picks_changed',
        objectType: 'consolidation_test',
        objectId: testId,
        details: { from: test.picks, to: input.picks, reason: input.reason },
      },
      manager,
    );
    return enqueueAnalysis(orgId, testId, actor.id, manager);
  });
}

/** Queues a fresh analysis of the current readings and picks. */
export async function requestAnalysis(orgId: string, testId: string, actor: Actor): Promise<string> {
  return dataSource.transaction(async (manager) => {
    const test = await lockTest(manager, orgId, testId);
    if (!test) throw new NotFoundError('test');
    if (test.status === 'draft') throw noReadings();
    assertMove(test.status, 'analysed');
    return enqueueAnalysis(orgId, testId, actor.id, manager);
  });
}
