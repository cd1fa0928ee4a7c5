import { generateSyntheticConsolidationTest, type SyntheticConsolidationParameters } from '@porestack/geo-core';
import type { ReviewOutcome, TestStatus } from '@porestack/types';
import type { DataSource } from 'typeorm';
import { runAnalysis } from '../modules/analyses/analyses.service.js';
import { AnalysisEntity } from '../modules/analyses/analysis.entity.js';
import { BoreholeEntity } from '../modules/boreholes/borehole.entity.js';
import { ConsolidationTestEntity } from '../modules/consolidation-tests/consolidation-test.entity.js';
import { lockTest, moveTest } from '../modules/consolidation-tests/test-transition.js';
import { ProjectMemberEntity } from '../modules/projects/project-member.entity.js';
import { ProjectEntity } from '../modules/projects/project.entity.js';
import { ReviewEventEntity } from '../modules/reviews/review-event.entity.js';
import { SampleEntity } from '../modules/samples/sample.entity.js';
import { queueReport } from '../modules/reports/reports.service.js';
import { createVersion } from '../modules/soil-records/soil-records.service.js';
import { ensureBucket } from '../storage/storage.js';
import type { DemoOrganisation } from './demo-organisation.seed.js';
import { storeReadings } from './lab-readings-store.js';

/** A fixed id: a later run finds the project and adds nothing. */
export const DEMO_PROJECT_ID = '5eed0000-0000-4000-8000-00000000a001';

type Target = TestStatus | 'approved_twice';

interface DemoTest {
  borehole: string;
  sample: string;
  topDepthM: number;
  description: string;
  target: Target;
  /** Chosen so the soil stiffens and drains more slowly with depth. */
  soil: Partial<SyntheticConsolidationParameters>;
}

/**
 * What every demo test shares, for geo-core's synthetic-test generator (seating, immediate
 * compression, the rounded σ′p transition and the reading noise are its defaults). Cα is 4 % of
 * each increment's own compression slope, so it is small on recompression and ≈ 0.018 on the
 * virgin line; every increment is held 24 h, long enough for primary to end in all of them.
 */
const BASE_SOIL: Partial<SyntheticConsolidationParameters> = {
  initialHeightMm: 20,
  diameterMm: 75,
  specificGravity: 2.69,
  initialVoidRatio: 1.12,
  compressionIndex: 0.46,
  recompressionIndex: 0.05,
  swellIndex: 0.08,
  preconsolidationStressKpa: 90,
  cvM2PerYr: 2.4,
  secondaryToCompressionRatio: 0.04,
  startingEffectiveStressKpa: 4,
  drainage: 'double',
  stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 1600, 400, 100, 25],
};

const BOREHOLES = [
  { name: 'BH01', groundLevelMOd: 3.4, waterTableDepthM: 1.2 },
  { name: 'BH02', groundLevelMOd: 3.9, waterTableDepthM: 1.8 },
  { name: 'BH03', groundLevelMOd: 4.6, waterTableDepthM: null },
];

const TESTS: DemoTest[] = [
  { borehole: 'BH01', sample: 'U1', topDepthM: 3.0, description: 'Soft grey silty CLAY with shell fragments', target: 'approved_twice', soil: {} },
  { borehole: 'BH01', sample: 'U2', topDepthM: 6.0, description: 'Soft to firm grey CLAY', target: 'approved', soil: { initialVoidRatio: 1.0, compressionIndex: 0.38, preconsolidationStressKpa: 130, cvM2PerYr: 1.8 } },
  { borehole: 'BH02', sample: 'U1', topDepthM: 4.5, description: 'Soft dark grey organic CLAY', target: 'submitted', soil: { initialVoidRatio: 1.35, compressionIndex: 0.62, preconsolidationStressKpa: 70, cvM2PerYr: 1.1 } },
  { borehole: 'BH02', sample: 'U2', topDepthM: 7.5, description: 'Firm grey CLAY with silt partings', target: 'changes_requested', soil: { initialVoidRatio: 0.92, compressionIndex: 0.31, preconsolidationStressKpa: 160, cvM2PerYr: 3.2 } },
  { borehole: 'BH03', sample: 'U1', topDepthM: 2.5, description: 'Firm brown mottled CLAY (desiccated crust)', target: 'analysed', soil: { initialVoidRatio: 0.85, compressionIndex: 0.24, preconsolidationStressKpa: 220, cvM2PerYr: 4.5 } },
  { borehole: 'BH03', sample: 'U2', topDepthM: 5.0, description: 'Soft grey CLAY', target: 'readings_uploaded', soil: { compressionIndex: 0.44, preconsolidationStressKpa: 105 } },
  { borehole: 'BH03', sample: 'U3', topDepthM: 8.0, description: 'Firm grey CLAY', target: 'draft', soil: {} },
];

const RANK: Record<Target, number> = { draft: 0, readings_uploaded: 1, analysed: 2, submitted: 3, changes_requested: 4, approved: 4, approved_twice: 4 };

/**
 * The demo laboratory: an invented project (fictional client and site) with three boreholes
 * and a test in every status, whose readings come from geo-core's synthetic-test generator
 * (Terzaghi's theory) with the parameters above; analyses are run by the service itself (no
 * worker needed), two tests are approved, one of them twice so its first version is
 * superseded. No e-mails are sent.
 * @returns how many tests were created (0 when the project was already there).
 */
export async function seedLabDemo(dataSource: DataSource, demo: DemoOrganisation): Promise<number> {
  const orgId = demo.organisation.id;
  if (await dataSource.getRepository(ProjectEntity).existsBy({ id: DEMO_PROJECT_ID })) return 0;
  const technicianId = demo.userIds.technician;
  const managerId = demo.userIds.lab_manager;
  await ensureBucket();
  const testIds = await dataSource.transaction(async (manager) => {
    await manager.getRepository(ProjectEntity).insert({
      id: DEMO_PROJECT_ID,
      organisationId: orgId,
      name: 'Saltmarsh Lane Pumping Station',
      reference: 'PLM-2041',
      clientName: 'Orrin & Vale Water Partners',
      siteName: 'Saltmarsh Lane, Pellowmere',
      createdById: managerId,
    });
    await manager.getRepository(ProjectMemberEntity).insert([
      { organisationId: orgId, projectId: DEMO_PROJECT_ID, userId: demo.userIds.designer, role: 'designer', addedById: managerId },
      // The demo client reads this project's approved results.
      { organisationId: orgId, projectId: DEMO_PROJECT_ID, userId: demo.userIds.client, role: 'client', addedById: managerId },
    ]);
    const boreholeIds = new Map<string, string>();
    for (const borehole of BOREHOLES) {
      const saved = await manager.getRepository(BoreholeEntity).save({ organisationId: orgId, projectId: DEMO_PROJECT_ID, ...borehole });
      boreholeIds.set(borehole.name, saved.id);
    }
    const ids: string[] = [];
    for (const [position, spec] of TESTS.entries()) {
      // A seed of its own per test, so no two tests carry the same noise.
      const { input, dryMassG, parameters: soil } = generateSyntheticConsolidationTest({ ...BASE_SOIL, ...spec.soil, seed: position + 1 });
      const sample = await manager.getRepository(SampleEntity).save({
        organisationId: orgId,
        boreholeId: boreholeIds.get(spec.borehole) as string,
        reference: spec.sample,
        topDepthM: spec.topDepthM,
        bottomDepthM: spec.topDepthM + 0.45,
        description: spec.description,
        bulkUnitWeightKnPerM3: 17 + 0.2 * position,
        inSituStressKpa: null,
      });
      const test = await manager.getRepository(ConsolidationTestEntity).save({
        organisationId: orgId,
        sampleId: sample.id,
        reference: `PLM-OED-${String(position + 1).padStart(2, '0')}`,
        status: 'draft',
        technicianId,
        initialHeightMm: soil.initialHeightMm,
        diameterMm: soil.diameterMm,
        specificGravity: soil.specificGravity,
        dryMassG: Number(dryMassG.toFixed(2)),
        initialWaterContent: null,
        wetMassG: null,
        finalWaterContent: null,
        drainage: soil.drainage,
        apparatusName: position % 2 === 0 ? 'Front-loading frame A' : 'Front-loading frame B',
        compliance: [],
        startedOn: `2026-0${1 + (position % 3)}-${String(5 + position * 2).padStart(2, '0')}`,
        finishedOn: null,
        picks: {},
      });
      ids.push(test.id);
      if (RANK[spec.target] >= 1) {
        const uploadId = await storeReadings(manager, { orgId, testId: test.id, uploadedById: technicianId, fileName: `${test.reference}.csv` }, input.increments);
        await moveTest(manager, test, 'readings_uploaded', technicianId, { changes: { latestUploadId: uploadId }, details: { uploadId, seeded: true } });
      }
    }
    return ids;
  });

  const submit = (testId: string) =>
    dataSource.transaction(async (manager) => {
      const test = await lockTest(manager, orgId, testId);
      if (!test) return;
      await moveTest(manager, test, 'submitted', technicianId, { changes: { submittedAt: new Date(), submittedById: technicianId } });
      await manager.getRepository(ReviewEventEntity).insert({ organisationId: orgId, testId, decision: 'submitted', actorId: technicianId, analysisId: test.latestAnalysisId, comment: null });
    });
  const decide = (testId: string, decision: ReviewOutcome, comment: string | null) =>
    dataSource.transaction(async (manager) => {
      const test = await lockTest(manager, orgId, testId);
      if (!test) return;
      await moveTest(manager, test, decision, managerId, { details: { comment } });
      await manager.getRepository(ReviewEventEntity).insert({ organisationId: orgId, testId, decision, actorId: managerId, analysisId: test.latestAnalysisId, comment });
      if (decision === 'approved') {
        const analysis = await manager.getRepository(AnalysisEntity).findOneByOrFail({ id: test.latestAnalysisId as string });
        const { version } = await createVersion(manager, test, analysis, DEMO_PROJECT_ID, managerId);
        // As an approval through the API does: the worker prints the version's report.
        await queueReport(manager, { orgId, kind: 'test-report', subjectId: version.id, testId, requestedById: managerId });
      }
    });

  for (const [position, spec] of TESTS.entries()) {
    const testId = testIds[position] as string;
    if (RANK[spec.target] < 2) continue;
    await runAnalysis(orgId, testId, technicianId);
    if (RANK[spec.target] < 3) continue;
    await submit(testId);
    if (spec.target === 'submitted') continue;
    if (spec.target === 'changes_requested') {
      // Every seeded increment reaches primary (no "primary not reached" warning), so the request
      // is about what the readings do hold: the 0.02 mm bedding of the stones at the first load.
      await decide(testId, 'changes_requested', 'Increment 1 includes about 0.02 mm of bedding of the porous stones; check its seating and re-run.');
      continue;
    }
    await decide(testId, 'approved', null);
    if (spec.target === 'approved_twice') {
      await dataSource.getRepository(ConsolidationTestEntity).update(
        { id: testId },
        { picks: { preconsolidationStressKpa: 85 }, pickReason: 'σ′p read at the sharper bend of the strain plot' },
      );
      await runAnalysis(orgId, testId, technicianId);
      await submit(testId);
      await decide(testId, 'approved', 'Adopted σ′p revised after the second look.');
    }
  }
  return TESTS.length;
}
