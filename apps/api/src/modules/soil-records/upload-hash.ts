import type { EntityManager } from 'typeorm';

/**
 * SHA-256 of the uploaded file the approved readings came from (uploads is the import
 * module's table). Read with SQL so the records do not depend on the import's code.
 */
export async function uploadSha256(manager: EntityManager, orgId: string, uploadId: string): Promise<string | null> {
  const rows = (await manager.query('SELECT sha256 FROM uploads WHERE organisation_id = $1 AND id = $2', [orgId, uploadId])) as Array<{ sha256: string }>;
  return rows[0]?.sha256 ?? null;
}
