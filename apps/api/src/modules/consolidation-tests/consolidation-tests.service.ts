import type { TestCreate, TestUpdate } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { enqueueAnalysis } from '../../jobs/analyse-test-queue.js';
import { audit } from '../audit/audit.service.js';
import { fieldChanges, type FieldChange } from '../audit/field-changes.js';
import { MembershipEntity } from '../organisations/membership.entity.js';
import { SampleEntity } from '../samples/sample.entity.js';
import { ConsolidationTestEntity } from './consolidation-test.entity.js';
import { specimenLocked, technicianNotMember, technicianWithoutRole } from './consolidation-test.exception.js';
import { recordContribution } from './test-contributions.js';
import { lockTest, moveTest } from './test-transition.js';

export interface Actor {
  id: string;
}

/**
 * The test of this organisation, or a 404 (the same for one of another organisation).
 * Part of the contract with the import pipeline.
 */
export async function findTestOrThrow(orgId: string, testId: string, manager: EntityManager = dataSource.manager): Promise<ConsolidationTestEntity> {
  const test = await manager.getRepository(ConsolidationTestEntity).findOneBy({ organisationId: orgId, id: testId });
  if (!test) throw new NotFoundError('test');
  return test;
}

/**
 * New readings are in: moves the test to readings_uploaded (from draft, readings_uploaded,
 * analysed or changes_requested), records the upload, makes any earlier analysis stale,
 * audits it and queues the analysis. Called by the import after it replaced the readings.
 * Pass the import's transaction manager to make all of it part of that transaction.
 * @returns the job id of the queued analysis.
 */
export async function markReadingsUploaded(
  orgId: string,
  testId: string,
  actor: Actor,
  options: { uploadId: string; manager?: EntityManager },
): Promise<{ analysisJobId: string }> {
  const work = async (manager: EntityManager) => {
    const test = await lockTest(manager, orgId, testId);
    if (!test) throw new NotFoundError('test');
    await moveTest(manager, test, 'readings_uploaded', actor.id, {
      changes: { latestUploadId: options.uploadId, latestAnalysisId: null, submittedAt: null, submittedById: null },
      details: { uploadId: options.uploadId, staleAnalysisId: test.latestAnalysisId },
    });
    await recordContribution(manager, test, actor.id, 'readings');
    return { analysisJobId: await enqueueAnalysis(orgId, testId, actor.id, manager) };
  };
  return options.manager ? work(options.manager) : dataSource.transaction(work);
}

/** The activity log names the technician rather than quoting user ids. */
async function withTechnicianNames(manager: EntityManager, changes: FieldChange[]): Promise<FieldChange[]> {
  const nameOf = async (id: unknown) =>
    typeof id === 'string' ? (((await manager.query('SELECT name FROM users WHERE id = $1', [id])) as Array<{ name: string }>)[0]?.name ?? null) : null;
  return Promise.all(changes.map(async (c) => (c.field === 'technicianId' ? { field: 'technician', from: await nameOf(c.from), to: await nameOf(c.to) } : c)));
}

/** The test's technician must be a member holding the technician role (not, say, a client). */
async function assertTechnician(manager: EntityManager, orgId: string, userId: string): Promise<void> {
  const membership = await manager.getRepository(MembershipEntity).findOneBy({ organisationId: orgId, userId });
  if (!membership) throw technicianNotMember();
  if (!membership.roles.includes('technician')) throw technicianWithoutRole();
}

function specimenColumns(specimen: TestUpdate['specimen']): Partial<ConsolidationTestEntity> {
  const columns: Partial<ConsolidationTestEntity> = {};
  if (!specimen) return columns;
  for (const key of ['initialHeightMm', 'diameterMm', 'specificGravity', 'dryMassG', 'initialWaterContent', 'wetMassG', 'finalWaterContent'] as const) {
    if (specimen[key] !== undefined) columns[key] = specimen[key];
  }
  if (specimen.drainage !== undefined) columns.drainage = specimen.drainage;
  return columns;
}

export async function createTest(orgId: string, sampleId: string, input: TestCreate, actor: Actor): Promise<string> {
  return dataSource.transaction(async (manager) => {
    if (!(await manager.getRepository(SampleEntity).existsBy({ organisationId: orgId, id: sampleId }))) throw new NotFoundError('sample');
    const technicianId = input.technicianId ?? actor.id;
    await assertTechnician(manager, orgId, technicianId);
    const repo = manager.getRepository(ConsolidationTestEntity);
    const saved = await repo.save(
      repo.create({
        organisationId: orgId,
        sampleId,
        reference: input.reference,
        status: 'draft',
        technicianId,
        initialHeightMm: null,
        diameterMm: null,
        specificGravity: null,
        dryMassG: null,
        initialWaterContent: null,
        wetMassG: null,
        finalWaterContent: null,
        drainage: 'double',
        ...specimenColumns(input.specimen),
        apparatusName: input.apparatusName,
        compliance: input.compliance,
        startedOn: input.startedOn,
        finishedOn: input.finishedOn,
        picks: {},
      }),
    );
    await recordContribution(manager, saved, actor.id, 'set-up');
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'test.created', objectType: 'consolidation_test', objectId: saved.id, details: { reference: input.reference, sampleId } },
      manager,
    );
    return saved.id;
  });
}

/**
 * Specimen, apparatus, compliance and dates. Not while the test is with the manager.
 * A change to what the analysis uses makes the stored analysis stale and queues a new one.
 */
export async function updateTest(orgId: string, testId: string, input: TestUpdate, actor: Actor): Promise<{ analysisJobId: string | null }> {
  return dataSource.transaction(async (manager) => {
    const test = await lockTest(manager, orgId, testId);
    if (!test) throw new NotFoundError('test');
    if (test.status === 'submitted') throw specimenLocked();
    if (input.technicianId) await assertTechnician(manager, orgId, input.technicianId);
    const changes: Partial<ConsolidationTestEntity> = { ...specimenColumns(input.specimen) };
    if (input.compliance !== undefined) changes.compliance = input.compliance;
    const affectsAnalysis = Object.keys(changes).length > 0;
    if (input.reference !== undefined) changes.reference = input.reference;
    if (input.technicianId !== undefined) changes.technicianId = input.technicianId;
    if (input.apparatusName !== undefined) changes.apparatusName = input.apparatusName;
    if (input.startedOn !== undefined) changes.startedOn = input.startedOn;
    if (input.finishedOn !== undefined) changes.finishedOn = input.finishedOn;
    await manager.getRepository(ConsolidationTestEntity).update({ organisationId: orgId, id: testId }, changes);
    if (Object.keys(changes).length > 0) await recordContribution(manager, test, actor.id, 'set-up');
    await audit.record(
      {
        organisationId: orgId,
        actorUserId: actor.id,
        action: 'test.updated',
        objectType: 'consolidation_test',
        objectId: testId,
        details: { reference: test.reference, changes: await withTechnicianNames(manager, fieldChanges(test as unknown as Record<string, unknown>, changes as Record<string, unknown>)) },
      },
      manager,
    );
    const hasReadings = test.status !== 'draft';
    if (!affectsAnalysis || !hasReadings) return { analysisJobId: null };
    return { analysisJobId: await enqueueAnalysis(orgId, testId, actor.id, manager) };
  });
}
