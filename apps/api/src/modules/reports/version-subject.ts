import type { Request } from 'express';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { uuidParam } from '../../http/params.js';
import { currentTenant, currentUser } from '../../http/request-context.js';
import { assertProjectInScope } from '../projects/project-scope.js';

/**
 * The soil record version named by `:recordId` and `:version`, once the caller's project
 * scope has been checked: a version of a project outside it answers 404 like a missing one.
 */
export async function versionInScope(req: Request): Promise<{ orgId: string; versionId: string; projectId: string; testId: string }> {
  const tenant = currentTenant(req);
  const recordId = uuidParam(req, 'recordId', 'soil record');
  const version = Number(req.params['version']);
  if (!Number.isInteger(version) || version < 1) throw new NotFoundError('soil record version');
  const [row] = (await dataSource.query(
    `SELECT v.id, r.project_id, r.test_id FROM soil_records r JOIN soil_record_versions v ON v.record_id = r.id
      WHERE r.organisation_id = $1 AND r.id = $2 AND v.version = $3`,
    [tenant.orgId, recordId, version],
  )) as Array<{ id: string; project_id: string; test_id: string }>;
  if (!row) throw new NotFoundError('soil record version');
  await assertProjectInScope(tenant, currentUser(req).id, row.project_id);
  return { orgId: tenant.orgId, versionId: row.id, projectId: row.project_id, testId: row.test_id };
}
