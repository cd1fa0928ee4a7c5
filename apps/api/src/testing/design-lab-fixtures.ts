import { generateSyntheticConsolidationTest, type SyntheticConsolidationParameters } from '@porestack/geo-core';
import { dataSource } from '../data-source.js';
import { runAnalysis } from '../modules/analyses/analyses.service.js';
import { createBorehole } from '../modules/boreholes/boreholes.service.js';
import { ConsolidationTestEntity } from '../modules/consolidation-tests/consolidation-test.entity.js';
import { createTest, markReadingsUploaded } from '../modules/consolidation-tests/consolidation-tests.service.js';
import { approveTest, submitTest } from '../modules/reviews/reviews.service.js';
import { createSample } from '../modules/samples/samples.service.js';
import { storeReadings } from '../seed/lab-readings-store.js';

/** The lab people behind approved records: a technician and a lab manager of the organisation. */
export interface LabPeople {
  orgId: string;
  technicianId: string;
  managerId: string;
}

let counter = 0;

/**
 * An approved soil record in an existing project: borehole, sample at the depth given, a test
 * whose readings come from geo-core's synthetic generator with these soil parameters, analysed,
 * submitted and approved through the services (as the routes would).
 */
export async function approvedRecord(
  lab: LabPeople,
  projectId: string,
  sample: { borehole: string; topDepthM: number; soil: Partial<SyntheticConsolidationParameters> },
): Promise<{ recordId: string; testId: string; versionId: string }> {
  counter += 1;
  const technician = { id: lab.technicianId };
  const generated = generateSyntheticConsolidationTest({ seed: 100 + counter, stressesKpa: [12.5, 25, 50, 100, 200, 400, 800, 1600, 400, 100, 25], ...sample.soil });
  const borehole = await createBorehole(lab.orgId, projectId, { name: `${sample.borehole}-${counter}`, groundLevelMOd: 3, waterTableDepthM: 1.5 }, technician);
  const created = await createSample(
    lab.orgId,
    borehole.id,
    { reference: `U${counter}`, topDepthM: sample.topDepthM, bottomDepthM: sample.topDepthM + 0.4, description: 'Soft grey clay (invented)', bulkUnitWeightKnPerM3: 17.5, inSituStressKpa: null },
    technician,
  );
  const p = generated.parameters;
  const testId = await createTest(
    lab.orgId,
    created.id,
    {
      reference: `DT-${Date.now().toString(36)}-${counter}`,
      specimen: { initialHeightMm: p.initialHeightMm, diameterMm: p.diameterMm, specificGravity: p.specificGravity, dryMassG: generated.dryMassG, drainage: p.drainage },
      apparatusName: 'Frame 1',
      compliance: [],
      startedOn: '2026-03-02',
      finishedOn: null,
    },
    technician,
  );
  await dataSource.transaction(async (manager) => {
    const uploadId = await storeReadings(manager, { orgId: lab.orgId, testId, uploadedById: lab.technicianId, fileName: `readings-${counter}.csv` }, generated.input.increments);
    await markReadingsUploaded(lab.orgId, testId, technician, { uploadId, manager });
  });
  await runAnalysis(lab.orgId, testId, lab.technicianId);
  await submitTest(lab.orgId, testId, technician);
  const { recordId } = await approveTest(lab.orgId, testId, { id: lab.managerId, name: 'Fixture manager' }, null);
  return { recordId, testId, versionId: await currentVersionId(recordId) };
}

/** The id of the record's newest version. */
export async function currentVersionId(recordId: string): Promise<string> {
  const [row] = (await dataSource.query('SELECT v.id FROM soil_record_versions v JOIN soil_records r ON r.id = v.record_id AND r.current_version = v.version WHERE r.id = $1', [recordId])) as Array<{ id: string }>;
  if (!row) throw new Error(`record ${recordId} has no version`);
  return row.id;
}

/** A second look at an approved test: σ′p picked by hand, re-analysed, approved again — the record's next version. */
export async function approveNewVersion(lab: LabPeople, testId: string, preconsolidationStressKpa: number): Promise<void> {
  await dataSource.getRepository(ConsolidationTestEntity).update({ id: testId }, { picks: { preconsolidationStressKpa }, pickReason: 'σ′p read again on the strain plot' });
  await runAnalysis(lab.orgId, testId, lab.technicianId);
  await submitTest(lab.orgId, testId, { id: lab.technicianId });
  await approveTest(lab.orgId, testId, { id: lab.managerId, name: 'Fixture manager' }, 'Revised σ′p');
}
