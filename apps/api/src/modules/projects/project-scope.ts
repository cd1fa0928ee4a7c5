import { holdsAnyRole, LAB_STAFF_ROLES, type Role } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import type { TenantContext } from '../../http/request-context.js';

/** Roles that work across the whole organisation: the laboratory's own staff. */
export const ORGANISATION_WIDE_ROLES: readonly Role[] = LAB_STAFF_ROLES;

/**
 * Which projects a member may see. Lab staff see every project of the organisation;
 * designers and clients only the projects they are on (project_members rows: a designer
 * assigned to the project, a client it was shared with). A member holding any lab role
 * beside designer or client sees the whole organisation.
 */
export type ProjectScope = { readonly kind: 'organisation' } | { readonly kind: 'projects'; readonly projectIds: readonly string[] };

export function seesWholeOrganisation(tenant: TenantContext): boolean {
  return holdsAnyRole(tenant.roles, ORGANISATION_WIDE_ROLES);
}

export async function projectScope(tenant: TenantContext, userId: string, manager: EntityManager = dataSource.manager): Promise<ProjectScope> {
  if (seesWholeOrganisation(tenant)) return { kind: 'organisation' };
  const rows = (await manager.query('SELECT project_id FROM project_members WHERE organisation_id = $1 AND user_id = $2', [tenant.orgId, userId])) as Array<{
    project_id: string;
  }>;
  return { kind: 'projects', projectIds: rows.map((row) => row.project_id) };
}

export function scopeIncludes(scope: ProjectScope, projectId: string): boolean {
  return scope.kind === 'organisation' || scope.projectIds.includes(projectId);
}

/**
 * Throws the same 404 as a missing project when the project is outside the caller's
 * scope, so ids of other projects reveal nothing. Does not check that the project exists.
 */
export async function assertProjectInScope(tenant: TenantContext, userId: string, projectId: string, manager?: EntityManager): Promise<void> {
  if (seesWholeOrganisation(tenant)) return;
  const scope = await projectScope(tenant, userId, manager);
  if (!scopeIncludes(scope, projectId)) throw new NotFoundError('project');
}
