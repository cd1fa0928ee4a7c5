import type { SoilRecordDetail, SoilRecordSummary, SoilRecordVersion } from '@porestack/types';
import type { EntityManager } from 'typeorm';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import type { AnalysisEntity } from '../analyses/analysis.entity.js';
import { cvRange, representativeSecondaryIndex } from '../analyses/key-parameters.js';
import { audit } from '../audit/audit.service.js';
import type { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';
import { assertProjectVisible, projectView, type Viewer } from '../projects/project-scope.js';
import { uploadSha256 } from './upload-hash.js';
import { SoilRecordSupersessionEntity } from './soil-record-supersession.entity.js';
import { SoilRecordVersionEntity } from './soil-record-version.entity.js';
import { SoilRecordEntity } from './soil-record.entity.js';

/**
 * Writes the next version of the test's soil record from the approved analysis, and notes
 * that the earlier one is superseded. Inside the approval's transaction.
 */
export async function createVersion(
  manager: EntityManager,
  test: ConsolidationTestEntity,
  analysis: AnalysisEntity,
  projectId: string,
  approverId: string,
): Promise<{ record: SoilRecordEntity; version: SoilRecordVersionEntity; supersededVersion: number | null }> {
  const records = manager.getRepository(SoilRecordEntity);
  const versions = manager.getRepository(SoilRecordVersionEntity);
  // Locks the head row so two approvals cannot both write version n + 1.
  let record = await records.findOne({ where: { organisationId: test.organisationId, testId: test.id }, lock: { mode: 'pessimistic_write' } });
  const previous = record ? await versions.findOneBy({ recordId: record.id, version: record.currentVersion }) : null;
  const number = record ? record.currentVersion + 1 : 1;
  if (!record) {
    record = await records.save(records.create({ organisationId: test.organisationId, testId: test.id, sampleId: test.sampleId, projectId, currentVersion: 1 }));
  } else {
    await records.update({ id: record.id }, { currentVersion: number });
    record.currentVersion = number;
  }
  const { result } = analysis;
  const cv = cvRange(result);
  const version = await versions.save(
    versions.create({
      organisationId: test.organisationId,
      recordId: record.id,
      version: number,
      testId: test.id,
      analysisId: analysis.id,
      uploadId: analysis.uploadId,
      uploadSha256: analysis.uploadId ? await uploadSha256(manager, test.organisationId, analysis.uploadId) : null,
      geoCoreVersion: analysis.geoCoreVersion,
      initialVoidRatio: result.initialVoidRatio,
      compressionIndex: result.compressionIndex,
      recompressionIndex: result.recompressionIndex,
      swellIndex: result.swellIndex,
      preconsolidationCasagrandeKpa: result.preconsolidation.casagrandeKpa,
      preconsolidationPachecoSilvaKpa: result.preconsolidation.pachecoSilvaKpa,
      preconsolidationAdoptedKpa: result.preconsolidation.adoptedKpa,
      preconsolidationAdoptedFrom: result.preconsolidation.adoptedFrom,
      overconsolidationRatio: result.overconsolidationRatio,
      cvMinM2PerYr: cv.min,
      cvMaxM2PerYr: cv.max,
      secondaryCompressionIndex: representativeSecondaryIndex(result),
      sampleQuality: result.sampleQuality?.category ?? null,
      approvedById: approverId,
    }),
  );
  if (previous) {
    await manager.getRepository(SoilRecordSupersessionEntity).insert({ versionId: previous.id, organisationId: test.organisationId, supersededById: version.id });
  }
  await audit.record(
    {
      organisationId: test.organisationId,
      actorUserId: approverId,
      action: 'soil_record.version_created',
      objectType: 'soil_record',
      objectId: record.id,
      details: { version: number, testId: test.id, analysisId: analysis.id, supersedes: previous?.version ?? null },
    },
    manager,
  );
  return { record, version, supersededVersion: previous?.version ?? null };
}

interface VersionRow extends SoilRecordVersionEntity {
  approvedByName: string;
  supersededAt: Date | null;
  supersededByVersion: number | null;
}

async function versionRows(orgId: string, recordIds: string[]): Promise<VersionRow[]> {
  if (recordIds.length === 0) return [];
  const { entities, raw } = await dataSource
    .getRepository(SoilRecordVersionEntity)
    .createQueryBuilder('v')
    .leftJoin('users', 'approver', 'approver.id = v.approved_by_id')
    .leftJoin('soil_record_supersessions', 's', 's.version_id = v.id')
    .leftJoin('soil_record_versions', 'next', 'next.id = s.superseded_by_id')
    .addSelect('approver.name', 'approver_name')
    .addSelect('s.superseded_at', 'superseded_at')
    .addSelect('next.version', 'next_version')
    .where('v.organisation_id = :orgId AND v.record_id IN (:...recordIds)', { orgId, recordIds })
    .orderBy('v.version', 'DESC')
    .getRawAndEntities();
  return entities.map((entity, index) => {
    const extra = raw[index] as { approver_name: string | null; superseded_at: Date | null; next_version: number | null };
    return { ...entity, approvedByName: extra.approver_name ?? '', supersededAt: extra.superseded_at, supersededByVersion: extra.next_version };
  });
}

function toVersion(row: VersionRow): SoilRecordVersion {
  return {
    id: row.id,
    recordId: row.recordId,
    version: row.version,
    testId: row.testId,
    analysisId: row.analysisId,
    uploadId: row.uploadId,
    uploadSha256: row.uploadSha256,
    geoCoreVersion: row.geoCoreVersion,
    initialVoidRatio: row.initialVoidRatio,
    compressionIndex: row.compressionIndex,
    recompressionIndex: row.recompressionIndex,
    swellIndex: row.swellIndex,
    preconsolidationCasagrandeKpa: row.preconsolidationCasagrandeKpa,
    preconsolidationPachecoSilvaKpa: row.preconsolidationPachecoSilvaKpa,
    preconsolidationAdoptedKpa: row.preconsolidationAdoptedKpa,
    preconsolidationAdoptedFrom: row.preconsolidationAdoptedFrom,
    overconsolidationRatio: row.overconsolidationRatio,
    cvMinM2PerYr: row.cvMinM2PerYr,
    cvMaxM2PerYr: row.cvMaxM2PerYr,
    secondaryCompressionIndex: row.secondaryCompressionIndex,
    sampleQuality: row.sampleQuality,
    approvedById: row.approvedById,
    approvedByName: row.approvedByName,
    approvedAt: row.approvedAt.toISOString(),
    supersededAt: row.supersededAt ? new Date(row.supersededAt).toISOString() : null,
    supersededByVersion: row.supersededByVersion,
  };
}

interface RecordHead {
  id: string;
  test_id: string;
  test_reference: string;
  test_status: SoilRecordSummary['testStatus'];
  project_id: string;
  project_name: string;
  borehole_name: string;
  sample_reference: string;
  top_depth_m: number;
  current_version: number;
}

async function heads(viewer: Viewer, filter: { projectId?: string | undefined; recordId?: string }): Promise<RecordHead[]> {
  const orgId = viewer.orgId;
  const query = dataSource
    .createQueryBuilder()
    .select(['r.id AS id', 'r.test_id AS test_id', 't.reference AS test_reference', 't.status AS test_status', 'p.id AS project_id', 'p.name AS project_name'])
    .addSelect(['b.name AS borehole_name', 's.reference AS sample_reference', 's.top_depth_m AS top_depth_m', 'r.current_version AS current_version'])
    .from('soil_records', 'r')
    .innerJoin('consolidation_tests', 't', 't.id = r.test_id')
    .innerJoin('samples', 's', 's.id = r.sample_id')
    .innerJoin('boreholes', 'b', 'b.id = s.borehole_id')
    .innerJoin('projects', 'p', 'p.id = r.project_id')
    .where('r.organisation_id = :orgId', { orgId })
    .orderBy('p.name')
    .addOrderBy('b.name')
    .addOrderBy('s.top_depth_m');
  if (viewer.scope.kind === 'projects') query.andWhere('r.project_id = ANY(:scopeProjectIds::uuid[])', { scopeProjectIds: viewer.scope.projectIds });
  if (filter.projectId) query.andWhere('r.project_id = :projectId', { projectId: filter.projectId });
  if (filter.recordId) query.andWhere('r.id = :recordId', { recordId: filter.recordId });
  return query.getRawMany<RecordHead>();
}

function toSummary(viewer: Viewer, head: RecordHead, versions: SoilRecordVersion[]): SoilRecordSummary {
  const current = versions.find((v) => v.version === head.current_version);
  if (!current) throw new Error(`soil record ${head.id} has no version ${head.current_version}`);
  return {
    id: head.id,
    testId: head.test_id,
    testReference: head.test_reference,
    // Where the lab's re-work stands is not the client's to follow: they read approved versions only.
    testStatus: projectView(viewer, head.project_id) === 'client' ? null : head.test_status,
    projectId: head.project_id,
    projectName: head.project_name,
    boreholeName: head.borehole_name,
    sampleReference: head.sample_reference,
    topDepthM: head.top_depth_m,
    currentVersion: head.current_version,
    current,
  };
}

/** The soil records of the viewer's projects (of one project when asked; 404 when it is outside the scope). */
/** Every approved version of these records (of the viewer's organisation), newest first. */
export async function loadVersions(orgId: string, recordIds: string[]): Promise<SoilRecordVersion[]> {
  return (await versionRows(orgId, recordIds)).map(toVersion);
}

export async function listSoilRecords(viewer: Viewer, projectId?: string): Promise<SoilRecordSummary[]> {
  if (projectId) assertProjectVisible(viewer, projectId);
  const rows = await heads(viewer, { projectId });
  const versions = (await versionRows(viewer.orgId, rows.map((r) => r.id))).map(toVersion);
  return rows.map((head) => toSummary(viewer, head, versions.filter((v) => v.recordId === head.id)));
}

/** One record with every approved version; 404 when missing or outside the viewer's scope. */
export async function getSoilRecord(viewer: Viewer, recordId: string): Promise<SoilRecordDetail> {
  const [head] = await heads(viewer, { recordId });
  if (!head) throw new NotFoundError('soil record');
  const versions = (await versionRows(viewer.orgId, [head.id])).map(toVersion);
  return { ...toSummary(viewer, head, versions), versions };
}

export async function getSoilRecordVersion(viewer: Viewer, recordId: string, version: number): Promise<SoilRecordVersion> {
  const found = (await getSoilRecord(viewer, recordId)).versions.find((v) => v.version === version);
  if (!found) throw new NotFoundError('soil record version');
  return found;
}
