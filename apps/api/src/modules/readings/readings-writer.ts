import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { PoolClient } from 'pg';
import { from as copyFrom } from 'pg-copy-streams';
import type { EntityManager } from 'typeorm';
import { currentTenantOrg, TENANT_ROLE } from '../../db/tenant-wall.js';
import type { ParsedReadings } from '../readings-import/read-readings.js';

export interface ReadingsTarget {
  orgId: string;
  testId: string;
  uploadId: string;
}

/** Rows per COPY chunk: ~60 kB of text, large enough that the stream's overhead vanishes. */
const ROWS_PER_CHUNK = 1000;

/**
 * Replaces the test's readings with `readings`: deletes the old ones, then streams the new
 * ones with COPY … FROM STDIN (pg-copy-streams) — one statement, not a row at a time. Runs
 * on the connection of `manager`, which must be inside a transaction: if anything fails
 * the transaction rolls back and the test keeps exactly the readings it had.
 * @param onProgress called with the fraction written (0–1) about every 10 %.
 */
export async function replaceReadings(
  manager: EntityManager,
  target: ReadingsTarget,
  readings: ParsedReadings,
  onProgress: (fraction: number) => void = () => undefined,
): Promise<void> {
  const runner = manager.queryRunner;
  if (!runner?.isTransactionActive) throw new Error('replaceReadings must run inside a transaction');
  await manager.query('DELETE FROM readings WHERE organisation_id = $1 AND test_id = $2', [target.orgId, target.testId]);
  const client = (await runner.connect()) as PoolClient;
  // PostgreSQL refuses COPY FROM into a table under row-level security, so the COPY alone runs
  // as the login role (SET LOCAL: until this transaction ends). Every row it writes carries
  // target.orgId, which must be the organisation this work is walled to.
  const walledTo = currentTenantOrg();
  if (walledTo !== null && walledTo !== target.orgId) throw new Error(`readings of organisation ${target.orgId} written in the work of ${walledTo}`);
  if (walledTo !== null) await client.query('SET LOCAL ROLE NONE');
  const copy = client.query(
    copyFrom('COPY readings (test_id, sheet_index, row_number, organisation_id, upload_id, increment_index, stress_kpa, elapsed_min, deformation_mm) FROM STDIN'),
  );
  await pipeline(Readable.from(copyChunks(target, readings, onProgress)), copy);
  if (walledTo !== null) await client.query(`SET LOCAL ROLE ${TENANT_ROLE}`);
  // Only now has the server taken every row (the last chunks were still being checked).
  onProgress(1);
}

function* copyChunks(target: ReadingsTarget, readings: ParsedReadings, onProgress: (fraction: number) => void): Generator<string> {
  const prefix = `${target.testId}\t`;
  const ids = `\t${target.orgId}\t${target.uploadId}\t`;
  const reportEvery = Math.max(ROWS_PER_CHUNK, Math.ceil(readings.count / 10));
  let lines: string[] = [];
  for (let i = 0; i < readings.count; i += 1) {
    lines.push(
      `${prefix}${readings.sheetIndex[i]}\t${readings.rowNumber[i]}${ids}${readings.incrementIndex[i]}\t${readings.stressKpa[i]}\t${readings.elapsedMin[i]}\t${readings.deformationMm[i]}\n`,
    );
    if (lines.length === ROWS_PER_CHUNK) {
      yield lines.join('');
      lines = [];
      if ((i + 1) % reportEvery < ROWS_PER_CHUNK && i + 1 < readings.count) onProgress((i + 1) / readings.count);
    }
  }
  if (lines.length > 0) yield lines.join('');
}
