import { holdsAnyRole, LAB_STAFF_ROLES, type Role, type TestStatus } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import type { Request } from 'express';
import { currentTenant, currentUser, type TenantContext } from '../../http/request-context.js';

/**
 * Project scope — the one place that decides what of the organisation a member may read.
 *
 * | what                                   | lab staff (admin, technician, lab manager) | designer of the project            | client the project is shared with |
 * |----------------------------------------|--------------------------------------------|------------------------------------|-----------------------------------|
 * | projects, boreholes, samples           | the whole organisation                     | their projects                     | their projects                    |
 * | soil records, approved versions        | all                                        | their projects'                    | their projects'                   |
 * | a version's test summary and curves    | all                                        | their projects'                    | their projects'                   |
 * | tests list, a test, analysis, readings | all                                        | their projects' tests *as approved* | never                            |
 * | review history                         | all                                        | the approvals only (no comments of change requests, no submissions) | never |
 * | background jobs                        | all                                        | the jobs they started              | never                             |
 *
 * "As approved": a designer opens a test only while it stands approved — its stored analysis and
 * readings are then exactly those the current version was approved from. While the lab re-works
 * it (re-analysis after approval, new readings, with the manager again) the test answers 404 like a
 * missing one; the soil record versions stay readable. Anything outside the scope answers 404 as a
 * missing object does, so ids of other projects reveal nothing.
 *
 * Project places come from project_members: a 'designer' row (the project's designers list) and
 * a 'client' row (a project shared with a client). A row counts only while the member holds that
 * role, so a designer whose role changed to client does not keep a designer's view.
 */

/** Roles that work across the whole organisation: the laboratory's own staff. */
export const ORGANISATION_WIDE_ROLES: readonly Role[] = LAB_STAFF_ROLES;

/** How a member reads one project: the laboratory's whole view, a designer's, or a client's. */
export type ProjectView = 'lab' | 'designer' | 'client';

/**
 * Which projects a member may see. Lab staff: every project of the organisation (a member holding
 * any lab role beside designer or client too); designers and clients: the projects they are on,
 * and in which of them they read as a designer (a designer-and-client reads each project by the
 * place they hold on it).
 */
export type ProjectScope =
  | { readonly kind: 'organisation' }
  | { readonly kind: 'projects'; readonly projectIds: readonly string[]; readonly designerProjectIds: readonly string[] };

/** Who is reading, in which organisation, with which scope: what every scoped read service takes first. */
export interface Viewer {
  readonly orgId: string;
  readonly userId: string;
  readonly scope: ProjectScope;
}

export function seesWholeOrganisation(tenant: TenantContext): boolean {
  return holdsAnyRole(tenant.roles, ORGANISATION_WIDE_ROLES);
}

export async function projectScope(tenant: TenantContext, userId: string, manager: EntityManager = dataSource.manager): Promise<ProjectScope> {
  if (seesWholeOrganisation(tenant)) return { kind: 'organisation' };
  const placeRoles = tenant.roles.filter((role) => role === 'designer' || role === 'client');
  const rows = (await manager.query('SELECT project_id, role FROM project_members WHERE organisation_id = $1 AND user_id = $2 AND role = ANY($3::text[])', [
    tenant.orgId,
    userId,
    placeRoles,
  ])) as Array<{ project_id: string; role: string }>;
  return {
    kind: 'projects',
    projectIds: [...new Set(rows.map((row) => row.project_id))],
    designerProjectIds: rows.filter((row) => row.role === 'designer').map((row) => row.project_id),
  };
}

export async function viewerOf(tenant: TenantContext, userId: string, manager?: EntityManager): Promise<Viewer> {
  return { orgId: tenant.orgId, userId, scope: await projectScope(tenant, userId, manager) };
}

/** The viewer of a request whose route is declared with roles. */
export function viewerFor(req: Request): Promise<Viewer> {
  return viewerOf(currentTenant(req), currentUser(req).id);
}

/** A viewer with the laboratory's whole view, for services answering lab-only routes. */
export function labViewer(orgId: string, userId: string): Viewer {
  return { orgId, userId, scope: { kind: 'organisation' } };
}

export function scopeIncludes(scope: ProjectScope, projectId: string): boolean {
  return scope.kind === 'organisation' || scope.projectIds.includes(projectId);
}

/** How the viewer reads this project, or null when it is outside their scope. */
export function projectView(viewer: Viewer, projectId: string): ProjectView | null {
  const { scope } = viewer;
  if (scope.kind === 'organisation') return 'lab';
  if (scope.designerProjectIds.includes(projectId)) return 'designer';
  return scope.projectIds.includes(projectId) ? 'client' : null;
}

/** The viewer's view of the project; the same 404 as a missing project when it is outside the scope. Does not check that it exists. */
export function assertProjectVisible(viewer: Viewer, projectId: string): ProjectView {
  const view = projectView(viewer, projectId);
  if (!view) throw new NotFoundError('project');
  return view;
}

/**
 * The same 404 as a missing project when it is outside the caller's scope, for code holding a
 * tenant rather than a viewer. Does not check that the project exists.
 */
export async function assertProjectInScope(tenant: TenantContext, userId: string, projectId: string, manager?: EntityManager): Promise<ProjectView> {
  return assertProjectVisible(await viewerOf(tenant, userId, manager), projectId);
}

/**
 * An SQL condition keeping rows whose `projectColumn` is in the viewer's scope; appends its
 * parameter to `params`. 'TRUE' for lab staff.
 */
export function projectScopeSql(viewer: Viewer, projectColumn: string, params: unknown[]): string {
  if (viewer.scope.kind === 'organisation') return 'TRUE';
  params.push(viewer.scope.projectIds);
  return `${projectColumn} = ANY($${params.length}::uuid[])`;
}

/** Whether this view may open the lab's own pages of a test in this status (see the table above). */
export function opensLabTest(view: ProjectView, status: TestStatus): boolean {
  return view === 'lab' || (view === 'designer' && status === 'approved');
}

/** The same rule as `opensLabTest` for list queries: an SQL condition on a test's project and status columns. */
export function openableTestsSql(viewer: Viewer, projectColumn: string, statusColumn: string, params: unknown[]): string {
  if (viewer.scope.kind === 'organisation') return 'TRUE';
  params.push(viewer.scope.designerProjectIds);
  return `(${projectColumn} = ANY($${params.length}::uuid[]) AND ${statusColumn} = 'approved')`;
}

async function projectOf(sql: string, params: unknown[], what: string, manager: EntityManager): Promise<Record<string, unknown> & { project_id: string }> {
  const [row] = (await manager.query(sql, params)) as Array<Record<string, unknown> & { project_id: string }>;
  if (!row) throw new NotFoundError(what);
  return row;
}

/** The borehole's project view; 404 (borehole) when missing, of another tenant or outside the scope. */
export async function assertBoreholeVisible(viewer: Viewer, boreholeId: string, manager: EntityManager = dataSource.manager): Promise<ProjectView> {
  const row = await projectOf('SELECT project_id FROM boreholes WHERE organisation_id = $1 AND id = $2', [viewer.orgId, boreholeId], 'borehole', manager);
  const view = projectView(viewer, row.project_id);
  if (!view) throw new NotFoundError('borehole');
  return view;
}

/**
 * The test's project view, when the viewer may open the lab's pages of it (lab staff; a designer
 * of its project while it stands approved); otherwise the same 404 as a missing test.
 */
export async function assertTestOpenable(viewer: Viewer, testId: string, manager: EntityManager = dataSource.manager): Promise<ProjectView> {
  const row = await projectOf(
    `SELECT b.project_id, t.status FROM consolidation_tests t JOIN samples s ON s.id = t.sample_id JOIN boreholes b ON b.id = s.borehole_id
      WHERE t.organisation_id = $1 AND t.id = $2`,
    [viewer.orgId, testId],
    'test',
    manager,
  );
  const view = projectView(viewer, row.project_id);
  if (!view || !opensLabTest(view, row['status'] as TestStatus)) throw new NotFoundError('test');
  return view;
}

/** The soil record's project view; 404 (soil record) when missing, of another tenant or outside the scope. */
export async function assertRecordVisible(viewer: Viewer, recordId: string, manager: EntityManager = dataSource.manager): Promise<ProjectView> {
  const row = await projectOf('SELECT project_id FROM soil_records WHERE organisation_id = $1 AND id = $2', [viewer.orgId, recordId], 'soil record', manager);
  const view = projectView(viewer, row.project_id);
  if (!view) throw new NotFoundError('soil record');
  return view;
}

/** Lab staff follow every job of the organisation; anyone else only the jobs they started. */
export function jobVisible(viewer: Viewer, job: { createdById: string | null }): boolean {
  return viewer.scope.kind === 'organisation' || job.createdById === viewer.userId;
}
