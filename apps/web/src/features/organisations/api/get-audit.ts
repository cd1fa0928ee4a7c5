import { AuditEntrySchema, type AuditEntry } from '@porestack/types';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiPaths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

const AuditEntriesSchema = AuditEntrySchema.array();

/** The organisation's activity, newest first. */
export function getAudit(orgId: string): Promise<AuditEntry[]> {
  return api.get(apiPaths.audit(orgId), AuditEntriesSchema);
}

export const auditQueryOptions = (orgId: string) =>
  queryOptions({ queryKey: ['orgs', orgId, 'audit'], queryFn: () => getAudit(orgId) });

export function useAudit(orgId: string) {
  return useQuery(auditQueryOptions(orgId));
}
