import type { DesignRecord, DesignRecordQuery, RecordVersionTrace } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';

/**
 * Approved soil record versions as design work reads them: the parameters, the sample's
 * mid-depth and borehole, and the chain back to the test, the approver and the readings file.
 * Always within one project, so a designer can only pin versions of a project they work on.
 */
export interface DesignVersion {
  versionId: string;
  recordId: string;
  version: number;
  currentVersion: number;
  testId: string;
  testReference: string;
  analysisId: string;
  geoCoreVersion: string;
  boreholeName: string;
  sampleReference: string;
  depthM: number;
  e0: number;
  cc: number | null;
  cr: number | null;
  cs: number | null;
  preconsolidationKpa: number | null;
  ocr: number | null;
  cvMinM2PerYr: number | null;
  cvMaxM2PerYr: number | null;
  cAlpha: number | null;
  sampleQuality: string | null;
  approvedByName: string;
  approvedAt: Date;
  readingsFileName: string | null;
  readingsSha256: string | null;
}

const SELECT = `
  SELECT v.id AS version_id, v.record_id, v.version, r.current_version, v.test_id, t.reference AS test_reference,
         v.analysis_id, v.geo_core_version, b.name AS borehole_name, s.reference AS sample_reference,
         (s.top_depth_m + s.bottom_depth_m) / 2 AS depth_m,
         v.initial_void_ratio, v.compression_index, v.recompression_index, v.swell_index,
         v.preconsolidation_adopted_kpa, v.overconsolidation_ratio, v.cv_min_m2_per_yr, v.cv_max_m2_per_yr,
         v.secondary_compression_index, v.sample_quality, COALESCE(u.name, '') AS approver_name, v.approved_at,
         up.original_name AS readings_file_name, v.upload_sha256
    FROM soil_record_versions v
    JOIN soil_records r ON r.id = v.record_id
    JOIN consolidation_tests t ON t.id = v.test_id
    JOIN samples s ON s.id = r.sample_id
    JOIN boreholes b ON b.id = s.borehole_id
    LEFT JOIN users u ON u.id = v.approved_by_id
    LEFT JOIN uploads up ON up.id = v.upload_id
   WHERE v.organisation_id = $1 AND r.project_id = $2`;

function toDesignVersion(row: Record<string, unknown>): DesignVersion {
  const number = (key: string) => (row[key] === null ? null : Number(row[key]));
  return {
    versionId: row['version_id'] as string,
    recordId: row['record_id'] as string,
    version: Number(row['version']),
    currentVersion: Number(row['current_version']),
    testId: row['test_id'] as string,
    testReference: row['test_reference'] as string,
    analysisId: row['analysis_id'] as string,
    geoCoreVersion: row['geo_core_version'] as string,
    boreholeName: row['borehole_name'] as string,
    sampleReference: row['sample_reference'] as string,
    depthM: Number(row['depth_m']),
    e0: Number(row['initial_void_ratio']),
    cc: number('compression_index'),
    cr: number('recompression_index'),
    cs: number('swell_index'),
    preconsolidationKpa: number('preconsolidation_adopted_kpa'),
    ocr: number('overconsolidation_ratio'),
    cvMinM2PerYr: number('cv_min_m2_per_yr'),
    cvMaxM2PerYr: number('cv_max_m2_per_yr'),
    cAlpha: number('secondary_compression_index'),
    sampleQuality: (row['sample_quality'] as string | null) ?? null,
    approvedByName: row['approver_name'] as string,
    approvedAt: row['approved_at'] as Date,
    readingsFileName: (row['readings_file_name'] as string | null) ?? null,
    readingsSha256: (row['upload_sha256'] as string | null) ?? null,
  };
}

/** The versions with these ids in the project; ids of other projects are simply not found. */
export async function designVersions(orgId: string, projectId: string, versionIds: readonly string[], manager: EntityManager = dataSource.manager): Promise<Map<string, DesignVersion>> {
  if (versionIds.length === 0) return new Map();
  const rows = (await manager.query(`${SELECT} AND v.id = ANY($3::uuid[])`, [orgId, projectId, [...new Set(versionIds)]])) as Array<Record<string, unknown>>;
  return new Map(rows.map((row) => [row['version_id'] as string, toDesignVersion(row)]));
}

/** The current version of each of these records (for "newer parameters approved"). */
export async function currentDesignVersions(orgId: string, projectId: string, recordIds: readonly string[], manager: EntityManager = dataSource.manager): Promise<Map<string, DesignVersion>> {
  if (recordIds.length === 0) return new Map();
  const rows = (await manager.query(`${SELECT} AND v.record_id = ANY($3::uuid[]) AND v.version = r.current_version`, [orgId, projectId, [...new Set(recordIds)]])) as Array<
    Record<string, unknown>
  >;
  return new Map(rows.map((row) => [row['record_id'] as string, toDesignVersion(row)]));
}

/** The project's approved records, current versions, filtered by borehole and sample depth. */
export async function listDesignRecords(orgId: string, projectId: string, query: DesignRecordQuery): Promise<DesignRecord[]> {
  const rows = (await dataSource.query(
    `${SELECT} AND v.version = r.current_version
       AND ($3::text IS NULL OR b.name ILIKE $3)
       AND ($4::float8 IS NULL OR (s.top_depth_m + s.bottom_depth_m) / 2 >= $4)
       AND ($5::float8 IS NULL OR (s.top_depth_m + s.bottom_depth_m) / 2 <= $5)
     ORDER BY b.name, depth_m`,
    [orgId, projectId, query.borehole ? `%${query.borehole}%` : null, query.minDepthM ?? null, query.maxDepthM ?? null],
  )) as Array<Record<string, unknown>>;
  return rows.map(toDesignVersion).map((v) => ({
    recordId: v.recordId,
    versionId: v.versionId,
    version: v.version,
    boreholeName: v.boreholeName,
    sampleReference: v.sampleReference,
    testReference: v.testReference,
    depthM: v.depthM,
    e0: v.e0,
    cc: v.cc,
    cr: v.cr,
    cs: v.cs,
    preconsolidationKpa: v.preconsolidationKpa,
    ocr: v.ocr,
    cvMinM2PerYr: v.cvMinM2PerYr,
    cvMaxM2PerYr: v.cvMaxM2PerYr,
    cAlpha: v.cAlpha,
    sampleQuality: v.sampleQuality,
    approvedAt: v.approvedAt.toISOString(),
  }));
}

export function toRecordVersionTrace(v: DesignVersion): RecordVersionTrace {
  return {
    kind: 'record',
    recordId: v.recordId,
    boreholeName: v.boreholeName,
    sampleReference: v.sampleReference,
    sampleDepthM: v.depthM,
    version: v.version,
    versionId: v.versionId,
    currentVersion: v.currentVersion,
    testId: v.testId,
    testReference: v.testReference,
    analysisId: v.analysisId,
    geoCoreVersion: v.geoCoreVersion,
    approvedByName: v.approvedByName,
    approvedAt: v.approvedAt.toISOString(),
    readingsFileName: v.readingsFileName,
    readingsSha256: v.readingsSha256,
  };
}

/** record → version → test → approver → readings file hash, for one version of the project. */
export async function traceRecordVersion(orgId: string, projectId: string, versionId: string): Promise<RecordVersionTrace> {
  const found = (await designVersions(orgId, projectId, [versionId])).get(versionId);
  if (!found) throw new NotFoundError('soil record version');
  return toRecordVersionTrace(found);
}

/** People's names by id, for "created by" lines. */
export async function userNames(ids: readonly string[], manager: EntityManager = dataSource.manager): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = (await manager.query('SELECT id, name FROM users WHERE id = ANY($1::uuid[])', [[...new Set(ids)]])) as Array<{ id: string; name: string }>;
  return new Map(rows.map((row) => [row.id, row.name]));
}
