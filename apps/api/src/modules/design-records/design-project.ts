import type { Request } from 'express';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { uuidParam } from '../../http/params.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { assertProjectInScope } from '../projects/project-scope.js';

/** The project a design route works in, once it is known to exist in this organisation and to be in the caller's scope (404 otherwise). */
export interface DesignProject {
  orgId: string;
  projectId: string;
  actor: { id: string; name: string };
}

export async function designProject(req: Request): Promise<DesignProject> {
  const tenant = currentTenant(req);
  const user = currentUser(req);
  const projectId = uuidParam(req, 'projectId', 'project');
  await assertProjectInScope(tenant, user.id, projectId);
  const rows = (await dataSource.query('SELECT 1 FROM projects WHERE organisation_id = $1 AND id = $2', [tenant.orgId, projectId])) as unknown[];
  if (rows.length === 0) throw new NotFoundError('project');
  return { orgId: tenant.orgId, projectId, actor: { id: user.id, name: user.name } };
}
