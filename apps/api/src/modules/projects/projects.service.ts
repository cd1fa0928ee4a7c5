import type { ProjectCreate, ProjectDesigner, ProjectDetail, ProjectSummary, ProjectUpdate, Role } from '@porestack/types';
import { ArrayContains, In, type EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import { MembershipEntity } from '../organisations/membership.entity.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { ProjectEntity } from './project.entity.js';
import type { ProjectScope } from './project-scope.js';

const referenceTaken = (reference: string) =>
  new DomainError('validation_failed', `Project reference ${reference} is already used in this organisation. Choose another reference.`, [
    { path: 'reference', message: 'Already used.' },
  ]);

async function assertDesigners(manager: EntityManager, orgId: string, designerIds: string[]): Promise<void> {
  if (designerIds.length === 0) return;
  const found = await manager.getRepository(MembershipEntity).findBy({ organisationId: orgId, userId: In(designerIds), roles: ArrayContains(['designer']) });
  if (found.length !== new Set(designerIds).size) {
    throw new DomainError('validation_failed', 'Every designer of a project must be a member of this organisation with the designer role.', [
      { path: 'designerIds', message: 'Not all are designers of this organisation.' },
    ]);
  }
}

async function setDesigners(manager: EntityManager, orgId: string, projectId: string, designerIds: string[]): Promise<void> {
  await assertDesigners(manager, orgId, designerIds);
  const repo = manager.getRepository(ProjectMemberEntity);
  await repo.delete({ organisationId: orgId, projectId });
  if (designerIds.length > 0) await repo.insert([...new Set(designerIds)].map((userId) => ({ organisationId: orgId, projectId, userId, role: 'designer' })));
}

/** The organisation's projects, newest first; only those in `scope` (default: all of them). */
export async function listProjects(orgId: string, scope: ProjectScope = { kind: 'organisation' }): Promise<ProjectSummary[]> {
  if (scope.kind === 'projects' && scope.projectIds.length === 0) return [];
  const rows = (await dataSource.query(
    `SELECT p.id, p.name, p.reference, p.client_name, p.site_name, p.created_at,
            COALESCE((SELECT array_agg(pm.user_id ORDER BY pm.created_at) FROM project_members pm WHERE pm.project_id = p.id), '{}') AS designer_ids,
            (SELECT count(*)::int FROM boreholes b WHERE b.project_id = p.id) AS borehole_count,
            (SELECT count(*)::int FROM consolidation_tests t JOIN samples s ON s.id = t.sample_id JOIN boreholes b ON b.id = s.borehole_id WHERE b.project_id = p.id) AS test_count
       FROM projects p WHERE p.organisation_id = $1 AND ($2::uuid[] IS NULL OR p.id = ANY($2::uuid[])) ORDER BY p.created_at DESC, p.reference`,
    [orgId, scope.kind === 'projects' ? scope.projectIds : null],
  )) as Array<Record<string, unknown>>;
  return rows.map((row) => ({
    id: row['id'] as string,
    name: row['name'] as string,
    reference: row['reference'] as string,
    clientName: row['client_name'] as string,
    siteName: row['site_name'] as string,
    designerIds: row['designer_ids'] as string[],
    boreholeCount: row['borehole_count'] as number,
    testCount: row['test_count'] as number,
    createdAt: (row['created_at'] as Date).toISOString(),
  }));
}

/** The organisation's members with the designer role: who can be attached to a project. */
export async function listDesignerCandidates(orgId: string): Promise<ProjectDesigner[]> {
  const rows = (await dataSource.query(
    'SELECT u.id AS user_id, u.name, u.email FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.organisation_id = $1 AND $2 = ANY(m.roles) ORDER BY u.name',
    [orgId, 'designer' satisfies Role],
  )) as Array<{ user_id: string; name: string; email: string }>;
  return rows.map((d) => ({ userId: d.user_id, name: d.name, email: d.email }));
}

export async function getProject(orgId: string, projectId: string): Promise<ProjectDetail> {
  const summary = (await listProjects(orgId, { kind: 'projects', projectIds: [projectId] }))[0];
  if (!summary) throw new NotFoundError('project');
  const designers = (await dataSource.query(
    'SELECT u.id AS user_id, u.name, u.email FROM project_members pm JOIN users u ON u.id = pm.user_id WHERE pm.organisation_id = $1 AND pm.project_id = $2 ORDER BY u.name',
    [orgId, projectId],
  )) as Array<{ user_id: string; name: string; email: string }>;
  return { ...summary, designers: designers.map((d) => ({ userId: d.user_id, name: d.name, email: d.email })) };
}

export async function createProject(orgId: string, input: ProjectCreate, actor: Actor): Promise<ProjectDetail> {
  const id = await dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(ProjectEntity);
    if (await repo.existsBy({ organisationId: orgId, reference: input.reference })) throw referenceTaken(input.reference);
    const project = await repo.save(
      repo.create({ organisationId: orgId, name: input.name, reference: input.reference, clientName: input.clientName, siteName: input.siteName, createdById: actor.id }),
    );
    await setDesigners(manager, orgId, project.id, input.designerIds);
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'project.created', objectType: 'project', objectId: project.id, details: { reference: input.reference } },
      manager,
    );
    return project.id;
  });
  return getProject(orgId, id);
}

export async function updateProject(orgId: string, projectId: string, input: ProjectUpdate, actor: Actor): Promise<ProjectDetail> {
  await dataSource.transaction(async (manager) => {
    const repo = manager.getRepository(ProjectEntity);
    const project = await repo.findOne({ where: { organisationId: orgId, id: projectId }, lock: { mode: 'pessimistic_write' } });
    if (!project) throw new NotFoundError('project');
    if (input.reference !== undefined && input.reference !== project.reference && (await repo.existsBy({ organisationId: orgId, reference: input.reference }))) {
      throw referenceTaken(input.reference);
    }
    const { designerIds, ...given } = input;
    const columns = Object.fromEntries(Object.entries(given).filter(([, value]) => value !== undefined)) as Partial<ProjectEntity>;
    if (Object.keys(columns).length > 0) await repo.update({ organisationId: orgId, id: projectId }, columns);
    if (designerIds !== undefined) await setDesigners(manager, orgId, projectId, designerIds);
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'project.updated', objectType: 'project', objectId: projectId, details: { fields: Object.keys(input) } },
      manager,
    );
  });
  return getProject(orgId, projectId);
}
