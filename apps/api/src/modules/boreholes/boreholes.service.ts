import type { Borehole, BoreholeCreate } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { ProjectEntity } from '../projects/project.entity.js';
import { assertProjectVisible, labViewer, type Viewer } from '../projects/project-scope.js';
import { BoreholeEntity } from './borehole.entity.js';

/** The project's boreholes; 404 when the project is missing or outside the viewer's scope. */
export async function listBoreholes(viewer: Viewer, projectId: string): Promise<Borehole[]> {
  const orgId = viewer.orgId;
  assertProjectVisible(viewer, projectId);
  if (!(await dataSource.getRepository(ProjectEntity).existsBy({ organisationId: orgId, id: projectId }))) throw new NotFoundError('project');
  const rows = (await dataSource.query(
    `SELECT b.*, (SELECT count(*)::int FROM samples s WHERE s.borehole_id = b.id) AS sample_count
       FROM boreholes b WHERE b.organisation_id = $1 AND b.project_id = $2 ORDER BY b.name`,
    [orgId, projectId],
  )) as Array<Record<string, unknown>>;
  return rows.map((row) => ({
    id: row['id'] as string,
    projectId: row['project_id'] as string,
    name: row['name'] as string,
    groundLevelMOd: row['ground_level_m_od'] as number | null,
    waterTableDepthM: row['water_table_depth_m'] as number | null,
    sampleCount: row['sample_count'] as number,
    createdAt: (row['created_at'] as Date).toISOString(),
  }));
}

export async function createBorehole(orgId: string, projectId: string, input: BoreholeCreate, actor: Actor): Promise<Borehole> {
  const id = await dataSource.transaction(async (manager) => {
    if (!(await manager.getRepository(ProjectEntity).existsBy({ organisationId: orgId, id: projectId }))) throw new NotFoundError('project');
    const repo = manager.getRepository(BoreholeEntity);
    if (await repo.existsBy({ projectId, name: input.name })) {
      throw new DomainError('validation_failed', `This project already has a borehole called ${input.name}. Choose another name.`, [{ path: 'name', message: 'Already used.' }]);
    }
    const saved = await repo.save(repo.create({ organisationId: orgId, projectId, ...input }));
    await audit.record({ organisationId: orgId, actorUserId: actor.id, action: 'borehole.created', objectType: 'borehole', objectId: saved.id, details: { projectId, name: input.name } }, manager);
    return saved.id;
  });
  const created = (await listBoreholes(labViewer(orgId, actor.id), projectId)).find((b) => b.id === id);
  if (!created) throw new NotFoundError('borehole');
  return created;
}
