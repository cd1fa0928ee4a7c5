import { generateSyntheticConsolidationTest } from '@porestack/geo-core';
import { dataSource } from '../data-source.js';
import { runAnalysis } from '../modules/analyses/analyses.service.js';
import { createBorehole } from '../modules/boreholes/boreholes.service.js';
import { createTest, markReadingsUploaded } from '../modules/consolidation-tests/consolidation-tests.service.js';
import { createProject } from '../modules/projects/projects.service.js';
import { ProjectMemberEntity } from '../modules/projects/project-member.entity.js';
import { approveTest, submitTest } from '../modules/reviews/reviews.service.js';
import { createSample } from '../modules/samples/samples.service.js';
import { storeReadings } from '../seed/lab-readings-store.js';

/**
 * A soft clay with known parameters, from geo-core's synthetic-test generator: what the
 * analysis should give back. Cα is 4 % of each increment's own slope; seating, immediate
 * compression, the rounded σ′p transition and the seeded reading noise are the generator's.
 */
export const KNOWN_TEST = generateSyntheticConsolidationTest({
  seed: 11,
  initialHeightMm: 20,
  diameterMm: 75,
  specificGravity: 2.68,
  initialVoidRatio: 1.05,
  compressionIndex: 0.42,
  recompressionIndex: 0.05,
  swellIndex: 0.07,
  preconsolidationStressKpa: 120,
  cvM2PerYr: 2,
  secondaryToCompressionRatio: 0.04,
  startingEffectiveStressKpa: 5,
  drainage: 'double',
  stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 1600, 400, 100, 25],
});
export const KNOWN_SOIL = KNOWN_TEST.parameters;

let counter = 0;

export interface LabFixture {
  projectId: string;
  boreholeId: string;
  sampleId: string;
  testId: string;
  dryMassG: number;
}

export interface FixtureOptions {
  designerIds?: string[];
  /** Another test on this sample (of an earlier fixture) instead of a new project, borehole and sample. */
  onSampleOf?: LabFixture;
}

/** Project → borehole → sample → draft test, through the services (as the routes would). */
export async function draftTest(orgId: string, technicianId: string, options: FixtureOptions = {}): Promise<LabFixture> {
  counter += 1;
  const tag = `${Date.now().toString(36)}-${counter}`;
  const actor = { id: technicianId };
  const { dryMassG } = KNOWN_TEST;
  let place = options.onSampleOf;
  if (!place) {
    const project = await createProject(orgId, { name: `Fixture project ${tag}`, reference: `FX-${tag}`, clientName: 'Fixture client', siteName: '', designerIds: options.designerIds ?? [] }, actor);
    const borehole = await createBorehole(orgId, project.id, { name: 'BH1', groundLevelMOd: 4.2, waterTableDepthM: 1.5 }, actor);
    const sample = await createSample(orgId, borehole.id, { reference: 'U1', topDepthM: 6, bottomDepthM: 6.45, description: 'Soft grey clay', bulkUnitWeightKnPerM3: 17.5, inSituStressKpa: null }, actor);
    place = { projectId: project.id, boreholeId: borehole.id, sampleId: sample.id, testId: '', dryMassG };
  }
  const testId = await createTest(
    orgId,
    place.sampleId,
    {
      reference: `T-${tag}`,
      specimen: { initialHeightMm: KNOWN_SOIL.initialHeightMm, diameterMm: KNOWN_SOIL.diameterMm, specificGravity: KNOWN_SOIL.specificGravity, dryMassG, drainage: KNOWN_SOIL.drainage },
      apparatusName: 'Frame 2',
      compliance: [],
      startedOn: '2026-03-02',
      finishedOn: null,
    },
    actor,
  );
  return { projectId: place.projectId, boreholeId: place.boreholeId, sampleId: place.sampleId, testId, dryMassG };
}

/** Stores the known soil's readings as an imported upload and calls markReadingsUploaded. */
export async function uploadKnownReadings(orgId: string, testId: string, uploaderId: string): Promise<{ uploadId: string; analysisJobId: string }> {
  return dataSource.transaction(async (manager) => {
    const uploadId = await storeReadings(manager, { orgId, testId, uploadedById: uploaderId, fileName: 'readings.csv' }, KNOWN_TEST.input.increments);
    const { analysisJobId } = await markReadingsUploaded(orgId, testId, { id: uploaderId }, { uploadId, manager });
    return { uploadId, analysisJobId };
  });
}

/** A test analysed directly (no worker): readings stored, analysis run by the service. */
export async function analysedTest(orgId: string, technicianId: string, options: FixtureOptions = {}): Promise<LabFixture> {
  const fixture = await draftTest(orgId, technicianId, options);
  await uploadKnownReadings(orgId, fixture.testId, technicianId);
  await runAnalysis(orgId, fixture.testId, technicianId);
  return fixture;
}

export async function submittedTest(orgId: string, technicianId: string, options: FixtureOptions = {}): Promise<LabFixture> {
  const fixture = await analysedTest(orgId, technicianId, options);
  await submitTest(orgId, fixture.testId, { id: technicianId });
  return fixture;
}

/** A submitted test approved by `managerId`: its soil record's first version. */
export async function approvedTest(
  orgId: string,
  technicianId: string,
  managerId: string,
  options: FixtureOptions = {},
): Promise<LabFixture & { recordId: string }> {
  const fixture = await submittedTest(orgId, technicianId, options);
  const { recordId } = await approveTest(orgId, fixture.testId, { id: managerId, name: 'Fixture manager' }, null);
  return { ...fixture, recordId };
}

/** Puts a member on a project straight in the database (as sharing or the designers list would). */
export async function placeOnProject(orgId: string, projectId: string, userId: string, role: 'client' | 'designer'): Promise<void> {
  await dataSource.getRepository(ProjectMemberEntity).insert({ organisationId: orgId, projectId, userId, role, addedById: null });
}
