import type { SameFile } from '@porestack/types';
import { dataSource } from '../../data-source.js';

/**
 * For each upload, the uploads of other tests of the organisation with the same SHA-256:
 * the same bytes filed under two tests is most often the wrong file in one of them. Uploads
 * of the same test are left out (a file sent again, or mapped again, is no mix-up).
 */
export async function sameFilesOf(orgId: string, uploads: ReadonlyArray<{ id: string; testId: string; sha256: string }>): Promise<Map<string, SameFile[]>> {
  const found = new Map<string, SameFile[]>();
  if (uploads.length === 0) return found;
  const rows = (await dataSource.query(
    `SELECT u.id, u.test_id, u.sha256, u.original_name, u.created_at, t.reference
       FROM uploads u JOIN consolidation_tests t ON t.id = u.test_id AND t.organisation_id = u.organisation_id
      WHERE u.organisation_id = $1 AND u.sha256 = ANY($2)
      ORDER BY u.created_at`,
    [orgId, [...new Set(uploads.map((upload) => upload.sha256))]],
  )) as Array<{ id: string; test_id: string; sha256: string; original_name: string; created_at: Date; reference: string }>;
  for (const upload of uploads) {
    const others = rows
      .filter((row) => row.sha256 === upload.sha256 && row.test_id !== upload.testId)
      .map((row) => ({ testId: row.test_id, testReference: row.reference, uploadId: row.id, originalName: row.original_name, uploadedAt: row.created_at.toISOString() }));
    found.set(upload.id, others);
  }
  return found;
}
