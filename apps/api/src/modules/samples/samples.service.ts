import type { Sample, SampleCreate } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import { BoreholeEntity } from '../boreholes/borehole.entity.js';
import { assertBoreholeVisible, type Viewer } from '../projects/project-scope.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { inSituStress } from './in-situ-stress.js';
import { SampleEntity } from './sample.entity.js';

export function toSample(sample: SampleEntity, borehole: BoreholeEntity): Sample {
  const stress = inSituStress(sample, borehole.waterTableDepthM);
  return {
    id: sample.id,
    boreholeId: sample.boreholeId,
    projectId: borehole.projectId,
    reference: sample.reference,
    topDepthM: sample.topDepthM,
    bottomDepthM: sample.bottomDepthM,
    description: sample.description,
    bulkUnitWeightKnPerM3: sample.bulkUnitWeightKnPerM3,
    inSituStressKpaEntered: sample.inSituStressKpa,
    inSituStressKpa: stress.kpa,
    inSituStressSource: stress.source,
    createdAt: sample.createdAt.toISOString(),
  };
}

async function boreholeOrThrow(orgId: string, boreholeId: string): Promise<BoreholeEntity> {
  const borehole = await dataSource.getRepository(BoreholeEntity).findOneBy({ organisationId: orgId, id: boreholeId });
  if (!borehole) throw new NotFoundError('borehole');
  return borehole;
}

/** The borehole's samples, shallowest first; 404 when the borehole is missing or outside the viewer's scope. */
export async function listSamples(viewer: Viewer, boreholeId: string): Promise<Sample[]> {
  const orgId = viewer.orgId;
  await assertBoreholeVisible(viewer, boreholeId);
  const borehole = await boreholeOrThrow(orgId, boreholeId);
  const rows = await dataSource.getRepository(SampleEntity).find({ where: { organisationId: orgId, boreholeId }, order: { topDepthM: 'ASC' } });
  return rows.map((row) => toSample(row, borehole));
}

export async function createSample(orgId: string, boreholeId: string, input: SampleCreate, actor: Actor): Promise<Sample> {
  const borehole = await boreholeOrThrow(orgId, boreholeId);
  const repo = dataSource.getRepository(SampleEntity);
  if (await repo.existsBy({ boreholeId, reference: input.reference })) {
    throw new DomainError('validation_failed', `Borehole ${borehole.name} already has a sample ${input.reference}. Choose another reference.`, [
      { path: 'reference', message: 'Already used.' },
    ]);
  }
  const saved = await dataSource.transaction(async (manager) => {
    const row = await manager.getRepository(SampleEntity).save(
      manager.getRepository(SampleEntity).create({
        organisationId: orgId,
        boreholeId,
        reference: input.reference,
        topDepthM: input.topDepthM,
        bottomDepthM: input.bottomDepthM,
        description: input.description,
        bulkUnitWeightKnPerM3: input.bulkUnitWeightKnPerM3,
        inSituStressKpa: input.inSituStressKpa,
      }),
    );
    await audit.record({ organisationId: orgId, actorUserId: actor.id, action: 'sample.created', objectType: 'sample', objectId: row.id, details: { boreholeId, reference: input.reference } }, manager);
    return row;
  });
  return toSample(saved, borehole);
}
