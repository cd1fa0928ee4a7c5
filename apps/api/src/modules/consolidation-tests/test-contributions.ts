import type { EntityManager } from 'typeorm';
import { TestContributionEntity, type ContributionKind } from './test-contribution.entity.js';

/** Notes that `userId` changed the test's set-up, picks or readings (in the change's transaction). */
export async function recordContribution(manager: EntityManager, test: { organisationId: string; id: string }, userId: string, kind: ContributionKind): Promise<void> {
  await manager.getRepository(TestContributionEntity).insert({ organisationId: test.organisationId, testId: test.id, userId, kind });
}

/**
 * What `userId` changed of the test since its last approval (or ever, if never approved):
 * the kinds, with the latest time of each. Empty when they changed nothing in this round.
 */
export async function contributionsThisRound(manager: EntityManager, orgId: string, testId: string, userId: string): Promise<Array<{ kind: ContributionKind; at: Date }>> {
  return (await manager.query(
    `SELECT c.kind, max(c.at) AS at FROM test_contributions c
      WHERE c.organisation_id = $1 AND c.test_id = $2 AND c.user_id = $3
        AND c.at > COALESCE((SELECT max(e.at) FROM review_events e WHERE e.test_id = $2 AND e.decision = 'approved'), '-infinity')
      GROUP BY c.kind ORDER BY c.kind`,
    [orgId, testId, userId],
  )) as Array<{ kind: ContributionKind; at: Date }>;
}
