/** Query keys of a project's design work; every one starts with the organisation, so switching it drops them all. */
export const designKeys = {
  project: (orgId: string, projectId: string) => ['orgs', orgId, 'projects', projectId, 'design'] as const,
  records: (orgId: string, projectId: string) => [...designKeys.project(orgId, projectId), 'records'] as const,
  groundModels: (orgId: string, projectId: string) => [...designKeys.project(orgId, projectId), 'ground-models'] as const,
  groundModel: (orgId: string, projectId: string, modelId: string, revision: number | null) => [...designKeys.groundModels(orgId, projectId), modelId, revision ?? 'current'] as const,
  sets: (orgId: string, projectId: string) => [...designKeys.project(orgId, projectId), 'characteristic-sets'] as const,
  set: (orgId: string, projectId: string, setId: string, revision: number | null) => [...designKeys.sets(orgId, projectId), setId, revision ?? 'current'] as const,
  checks: (orgId: string, projectId: string) => [...designKeys.project(orgId, projectId), 'checks'] as const,
  check: (orgId: string, projectId: string, checkId: string) => [...designKeys.checks(orgId, projectId), checkId] as const,
  revision: (orgId: string, projectId: string, checkId: string, revision: number) => [...designKeys.check(orgId, projectId, checkId), 'revisions', revision] as const,
  issued: (orgId: string, projectId: string, checkId: string, revision: number) => [...designKeys.revision(orgId, projectId, checkId, revision), 'issued'] as const,
  footing: (orgId: string, projectId: string, checkId: string, revision: number, footingId: string) => [...designKeys.revision(orgId, projectId, checkId, revision), 'footings', footingId] as const,
  trace: (orgId: string, projectId: string, kind: 'record' | 'set', id: string) => [...designKeys.project(orgId, projectId), 'trace', kind, id] as const,
};
