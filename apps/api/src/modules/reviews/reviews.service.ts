import type { ConsolidationTestResult, ReviewEvent, ReviewQueueItem, TestStatus } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { AnalysisEntity } from '../analyses/analysis.entity.js';
import { noAnalysis } from '../analyses/analysis.exception.js';
import { keyParametersFrom } from '../analyses/key-parameters.js';
import type { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';
import { ownChanges, ownTest } from '../consolidation-tests/consolidation-test.exception.js';
import { contributionsThisRound } from '../consolidation-tests/test-contributions.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { lockTest, moveTest } from '../consolidation-tests/test-transition.js';
import { assertTestOpenable, type Viewer } from '../projects/project-scope.js';
import { queueReport } from '../reports/reports.service.js';
import { createVersion } from '../soil-records/soil-records.service.js';
import { notifyApproved, notifyChangesRequested, notifySubmitted, testContext } from './lab-notifications.js';
import { ReviewEventEntity } from './review-event.entity.js';

async function lockedWithAnalysis(manager: EntityManager, orgId: string, testId: string): Promise<{ test: ConsolidationTestEntity; analysis: AnalysisEntity | null }> {
  const test = await lockTest(manager, orgId, testId);
  if (!test) throw new NotFoundError('test');
  const analysis = test.latestAnalysisId
    ? await manager.getRepository(AnalysisEntity).findOneBy({ organisationId: orgId, id: test.latestAnalysisId })
    : null;
  return { test, analysis };
}

async function recordEvent(manager: EntityManager, test: ConsolidationTestEntity, decision: ReviewEventEntity['decision'], actorId: string, analysisId: string | null, comment: string | null) {
  await manager.getRepository(ReviewEventEntity).insert({ organisationId: test.organisationId, testId: test.id, decision, actorId, analysisId, comment });
}

/** The technician hands the analysed test to the lab managers (who are e-mailed). */
export async function submitTest(orgId: string, testId: string, actor: Actor): Promise<void> {
  const warningCount = await dataSource.transaction(async (manager) => {
    const { test, analysis } = await lockedWithAnalysis(manager, orgId, testId);
    // The move is checked first, so a test in another state hears why it cannot be submitted.
    await moveTest(manager, test, 'submitted', actor.id, {
      changes: { submittedAt: new Date(), submittedById: actor.id },
      details: { analysisId: analysis?.id ?? null },
    });
    if (!analysis) throw noAnalysis();
    await recordEvent(manager, test, 'submitted', actor.id, analysis.id, null);
    return analysis.warningCount;
  });
  await notifySubmitted(await testContext(orgId, testId), warningCount);
}

/**
 * Nobody reviews a test they ran or submitted, nor one whose set-up, picks or readings they
 * changed since its last approval (test_contributions), whoever its technician is.
 */
async function assertNotOwn(manager: EntityManager, test: ConsolidationTestEntity, actor: Actor): Promise<void> {
  if (test.technicianId === actor.id || test.submittedById === actor.id) throw ownTest();
  const changed = await contributionsThisRound(manager, test.organisationId, test.id, actor.id);
  if (changed.length > 0) throw ownChanges(changed);
}

/** Approval: the next soil record version, e-mails to the technician and the project's designers. */
export async function approveTest(orgId: string, testId: string, actor: Actor & { name: string }, comment: string | null): Promise<{ recordId: string; version: number }> {
  const outcome = await dataSource.transaction(async (manager) => {
    const { test, analysis } = await lockedWithAnalysis(manager, orgId, testId);
    await assertNotOwn(manager, test, actor);
    await moveTest(manager, test, 'approved', actor.id, { details: { analysisId: analysis?.id ?? null, comment } });
    if (!analysis) throw noAnalysis();
    await recordEvent(manager, test, 'approved', actor.id, analysis.id, comment);
    const [{ project_id: projectId } = { project_id: '' }] = (await manager.query(
      'SELECT b.project_id FROM samples s JOIN boreholes b ON b.id = s.borehole_id WHERE s.id = $1',
      [test.sampleId],
    )) as Array<{ project_id: string }>;
    const created = await createVersion(manager, test, analysis, projectId, actor.id);
    // The test report is printed once, by a job queued in this transaction.
    await queueReport(manager, { orgId, kind: 'test-report', subjectId: created.version.id, testId, requestedById: actor.id });
    return created;
  });
  await notifyApproved(await testContext(orgId, testId), actor.name, comment, outcome.record.id, outcome.version, outcome.supersededVersion);
  return { recordId: outcome.record.id, version: outcome.version.version };
}

export async function requestChanges(orgId: string, testId: string, actor: Actor & { name: string }, comment: string): Promise<void> {
  await dataSource.transaction(async (manager) => {
    const { test, analysis } = await lockedWithAnalysis(manager, orgId, testId);
    await assertNotOwn(manager, test, actor);
    await moveTest(manager, test, 'changes_requested', actor.id, { details: { comment } });
    await recordEvent(manager, test, 'changes_requested', actor.id, analysis?.id ?? null, comment);
  });
  await notifyChangesRequested(await testContext(orgId, testId), actor.name, comment);
}

/**
 * The test's review history. Lab staff read all of it; a designer (who opens the test only while it
 * stands approved) reads the approvals, not the lab's submissions and change requests.
 */
export async function listReviewEvents(viewer: Viewer, testId: string): Promise<ReviewEvent[]> {
  const view = await assertTestOpenable(viewer, testId);
  const orgId = viewer.orgId;
  const { entities, raw } = await dataSource
    .getRepository(ReviewEventEntity)
    .createQueryBuilder('e')
    .leftJoin('users', 'u', 'u.id = e.actor_id')
    .addSelect('u.name', 'actor_name')
    .where('e.organisation_id = :orgId AND e.test_id = :testId', { orgId, testId })
    .andWhere(view === 'lab' ? 'TRUE' : "e.decision = 'approved'")
    .orderBy('e.at', 'ASC')
    .getRawAndEntities();
  return entities.map((e, index) => ({
    id: e.id,
    decision: e.decision,
    comment: e.comment,
    actorId: e.actorId,
    actorName: (raw[index] as { actor_name: string | null }).actor_name ?? '',
    analysisId: e.analysisId,
    at: e.at.toISOString(),
  }));
}

/** Submitted tests, oldest first: what the lab managers have to decide on. */
export async function reviewQueue(orgId: string): Promise<ReviewQueueItem[]> {
  const rows = (await dataSource.query(
    `SELECT t.id AS test_id, t.reference AS test_reference, p.id AS project_id, p.name AS project_name, s.reference AS sample_reference,
            b.name AS borehole_name, s.top_depth_m, s.bottom_depth_m, u.id AS technician_id, u.name AS technician_name,
            t.submitted_at, a.result, a.warning_count
       FROM consolidation_tests t
       JOIN samples s ON s.id = t.sample_id
       JOIN boreholes b ON b.id = s.borehole_id
       JOIN projects p ON p.id = b.project_id
       JOIN users u ON u.id = t.technician_id
       LEFT JOIN analyses a ON a.id = t.latest_analysis_id
      WHERE t.organisation_id = $1 AND t.status = $2
      ORDER BY t.submitted_at ASC`,
    [orgId, 'submitted' satisfies TestStatus],
  )) as Array<Record<string, unknown>>;
  return rows.map((row) => ({
    testId: row['test_id'] as string,
    testReference: row['test_reference'] as string,
    projectId: row['project_id'] as string,
    projectName: row['project_name'] as string,
    sampleReference: row['sample_reference'] as string,
    boreholeName: row['borehole_name'] as string,
    topDepthM: row['top_depth_m'] as number,
    bottomDepthM: row['bottom_depth_m'] as number,
    technicianId: row['technician_id'] as string,
    technicianName: row['technician_name'] as string,
    submittedAt: (row['submitted_at'] as Date).toISOString(),
    // analyses.result is stored only after ConsolidationTestResultSchema has checked it (runAnalysis).
    keyParameters: keyParametersFrom((row['result'] as ConsolidationTestResult | null) ?? null),
    warningCount: (row['warning_count'] as number | null) ?? 0,
  }));
}
