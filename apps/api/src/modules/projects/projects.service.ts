import type { ProjectCreate, ProjectDesigner, ProjectDetail, ProjectSummary, ProjectUpdate, Role } from '@porestack/types';
import { ArrayContains, In, type EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { DomainError, NotFoundError } from '../../errors/domain-error.js';
import { audit } from '../audit/audit.service.js';
import { fieldChanges } from '../audit/field-changes.js';
import { MembershipEntity } from '../organisations/membership.entity.js';
import type { Actor } from '../consolidation-tests/consolidation-tests.service.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { ProjectEntity } from './project.entity.js';
import { assertProjectVisible, labViewer, projectScopeSql, projectView, type Viewer } from './project-scope.js';

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
  // Only the designers list: the clients the project is shared with keep their places.
  await repo.delete({ organisationId: orgId, projectId, role: 'designer' });
  if (designerIds.length > 0) await repo.insert([...new Set(designerIds)].map((userId) => ({ organisationId: orgId, projectId, userId, role: 'designer' })));
}

async function designerNames(manager: EntityManager, orgId: string, projectId: string): Promise<string[]> {
  const rows = (await manager.query(
    "SELECT u.name FROM project_members pm JOIN users u ON u.id = pm.user_id WHERE pm.organisation_id = $1 AND pm.project_id = $2 AND pm.role = 'designer' ORDER BY u.name",
    [orgId, projectId],
  )) as Array<{ name: string }>;
  return rows.map((row) => row.name);
}

/**
 * The projects the viewer may see, newest first. A client reads no designers list: who works on
 * the design is the laboratory's business with the designers.
 */
export async function listProjects(viewer: Viewer): Promise<ProjectSummary[]> {
  return summaries(viewer, null);
}

async function summaries(viewer: Viewer, onlyProjectId: string | null): Promise<ProjectSummary[]> {
  const params: unknown[] = [viewer.orgId, onlyProjectId];
  const inScope = projectScopeSql(viewer, 'p.id', params);
  const rows = (await dataSource.query(
    `SELECT p.id, p.name, p.reference, p.client_name, p.site_name, p.created_at,
            COALESCE((SELECT array_agg(pm.user_id ORDER BY pm.created_at) FROM project_members pm WHERE pm.project_id = p.id AND pm.role = 'designer'), '{}') AS designer_ids,
            (SELECT count(*)::int FROM boreholes b WHERE b.project_id = p.id) AS borehole_count,
            (SELECT count(*)::int FROM consolidation_tests t JOIN samples s ON s.id = t.sample_id JOIN boreholes b ON b.id = s.borehole_id WHERE b.project_id = p.id) AS test_count,
            (SELECT count(*)::int FROM soil_records r WHERE r.project_id = p.id) AS issued_count
       FROM projects p WHERE p.organisation_id = $1 AND ($2::uuid IS NULL OR p.id = $2) AND ${inScope} ORDER BY p.created_at DESC, p.reference`,
    params,
  )) as Array<Record<string, unknown>>;
  return rows.map((row) => {
    const id = row['id'] as string;
    const forClient = projectView(viewer, id) === 'client';
    return {
      id,
      name: row['name'] as string,
      reference: row['reference'] as string,
      clientName: row['client_name'] as string,
      siteName: row['site_name'] as string,
      designerIds: forClient ? [] : (row['designer_ids'] as string[]),
      boreholeCount: row['borehole_count'] as number,
      // A client counts the tests issued to them (with an approved version), not the lab's work in hand.
      testCount: (forClient ? row['issued_count'] : row['test_count']) as number,
      createdAt: (row['created_at'] as Date).toISOString(),
    };
  });
}

/** The organisation's members with the designer role: who can be attached to a project. */
export async function listDesignerCandidates(orgId: string): Promise<ProjectDesigner[]> {
  const rows = (await dataSource.query(
    'SELECT u.id AS user_id, u.name, u.email FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.organisation_id = $1 AND $2 = ANY(m.roles) ORDER BY u.name',
    [orgId, 'designer' satisfies Role],
  )) as Array<{ user_id: string; name: string; email: string }>;
  return rows.map((d) => ({ userId: d.user_id, name: d.name, email: d.email }));
}

/** One project the viewer may see; 404 when it is missing or outside their scope. */
export async function getProject(viewer: Viewer, projectId: string): Promise<ProjectDetail> {
  const view = assertProjectVisible(viewer, projectId);
  const [summary] = await summaries(viewer, projectId);
  if (!summary) throw new NotFoundError('project');
  if (view === 'client') return { ...summary, designers: [] };
  const designers = (await dataSource.query(
    `SELECT u.id AS user_id, u.name, u.email FROM project_members pm JOIN users u ON u.id = pm.user_id
      WHERE pm.organisation_id = $1 AND pm.project_id = $2 AND pm.role = 'designer' ORDER BY u.name`,
    [viewer.orgId, projectId],
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
  return getProject(labViewer(orgId, actor.id), id);
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
    const changes = fieldChanges({ name: project.name, reference: project.reference, clientName: project.clientName, siteName: project.siteName }, columns);
    if (Object.keys(columns).length > 0) await repo.update({ organisationId: orgId, id: projectId }, columns);
    if (designerIds !== undefined) {
      const before = await designerNames(manager, orgId, projectId);
      await setDesigners(manager, orgId, projectId, designerIds);
      changes.push(...fieldChanges({ designers: before }, { designers: await designerNames(manager, orgId, projectId) }));
    }
    await audit.record(
      { organisationId: orgId, actorUserId: actor.id, action: 'project.updated', objectType: 'project', objectId: projectId, details: { reference: project.reference, changes } },
      manager,
    );
  });
  return getProject(labViewer(orgId, actor.id), projectId);
}
