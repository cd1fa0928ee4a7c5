import { createHash } from 'node:crypto';
import { analyzeConsolidationTest, GEO_CORE_VERSION, type ConsolidationTestInput } from '@porestack/geo-core';
import { ConsolidationTestResultSchema, type Analysis, type AnalysisSummary, type ConsolidationTestResult, type Picks } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import { NotFoundError } from '../../errors/domain-error.js';
import { BoreholeEntity } from '../boreholes/borehole.entity.js';
import type { ConsolidationTestEntity } from '../consolidation-tests/consolidation-test.entity.js';
import { specimenIncomplete } from '../consolidation-tests/consolidation-test.exception.js';
import { findTestOrThrow } from '../consolidation-tests/consolidation-tests.service.js';
import { lockTest, moveTest } from '../consolidation-tests/test-transition.js';
import { assertTestOpenable, type Viewer } from '../projects/project-scope.js';
import { inSituStress } from '../samples/in-situ-stress.js';
import { SampleEntity } from '../samples/sample.entity.js';
import { analysisRejected, noAnalysis, noReadings, readingsChanged } from './analysis.exception.js';
import { AnalysisEntity } from './analysis.entity.js';
import { canonicalJson } from './canonical-json.js';
import { keyParametersFrom } from './key-parameters.js';
import { loadIncrements } from './readings-source.js';

export type ProgressReporter = (progress: number, message: string) => Promise<void>;

/** What geo-core gets from a test's specimen columns; missing fields are named. */
function specimenInput(test: ConsolidationTestEntity, inSituKpa: number | null): ConsolidationTestInput['specimen'] {
  const missing: string[] = [];
  if (test.initialHeightMm === null) missing.push('initialHeightMm');
  if (test.diameterMm === null) missing.push('diameterMm');
  if (test.specificGravity === null) missing.push('specificGravity');
  if (test.dryMassG === null && (test.wetMassG === null || test.initialWaterContent === null)) missing.push('dryMassG');
  if (missing.length > 0) throw specimenIncomplete(missing);
  return {
    initialHeightMm: test.initialHeightMm as number,
    diameterMm: test.diameterMm as number,
    specificGravity: test.specificGravity as number,
    drainage: test.drainage,
    ...(test.dryMassG !== null ? { dryMassG: test.dryMassG } : {}),
    ...(test.initialWaterContent !== null ? { initialWaterContent: test.initialWaterContent } : {}),
    ...(test.wetMassG !== null ? { wetMassG: test.wetMassG } : {}),
    ...(test.finalWaterContent !== null ? { finalWaterContent: test.finalWaterContent } : {}),
    ...(inSituKpa !== null ? { inSituVerticalEffectiveStressKpa: inSituKpa } : {}),
  };
}

function hasPicks(picks: Picks): boolean {
  return Object.values(picks).some((value) => value !== undefined && !(Array.isArray(value) && value.length === 0));
}

/** SHA-256 of the canonical input and the geo-core version: equal hashes mean equal results. */
export function inputsHash(input: ConsolidationTestInput): string {
  return createHash('sha256').update(canonicalJson({ geoCoreVersion: GEO_CORE_VERSION, input })).digest('hex');
}

/** The geo-core input of the test as it stands: specimen, stored readings, compliance and picks. */
export async function analysisInput(orgId: string, test: ConsolidationTestEntity): Promise<ConsolidationTestInput> {
  const sample = await dataSource.getRepository(SampleEntity).findOneByOrFail({ organisationId: orgId, id: test.sampleId });
  const borehole = await dataSource.getRepository(BoreholeEntity).findOneByOrFail({ organisationId: orgId, id: sample.boreholeId });
  const specimen = specimenInput(test, inSituStress(sample, borehole.waterTableDepthM).kpa);
  const increments = await loadIncrements(orgId, test.id);
  if (increments.length === 0) throw noReadings();
  return {
    specimen,
    increments,
    ...(test.compliance.length > 0 ? { compliance: test.compliance } : {}),
    ...(hasPicks(test.picks) ? { picks: test.picks } : {}),
  };
}

/**
 * geo-core's result checked against the shared contract, as the web will read it. Failing here
 * is a fault of Porestack (geo-core produced a value the contract does not allow, such as a
 * non-finite number), so it is not stored: JSON would quietly turn NaN into null.
 */
function storableResult(produced: unknown): ConsolidationTestResult {
  const checked = ConsolidationTestResultSchema.safeParse(produced);
  if (checked.success) return checked.data;
  const [issue] = checked.error.issues;
  throw new Error(`geo-core's result does not fit ConsolidationTestResultSchema at ${issue?.path.join('.') ?? '?'}: ${issue?.message ?? 'unknown problem'}`);
}

/**
 * Runs geo-core on the test's stored readings and stores the full result with the geo-core
 * version, the inputs hash and the picks; the test moves to analysed (audited). Called by
 * the analyse-test job, and directly by the seed.
 * @throws DomainError when the test cannot be analysed (no readings, incomplete specimen,
 *   a status that does not allow it, readings replaced meanwhile, geo-core refusing the data).
 */
export async function runAnalysis(
  orgId: string,
  testId: string,
  requestedById: string | null,
  report: ProgressReporter = async () => undefined,
): Promise<AnalysisEntity> {
  const before = await findTestOrThrow(orgId, testId);
  await report(0.1, 'Loading the stored readings.');
  const input = await analysisInput(orgId, before);
  await report(0.4, `Analysing ${input.increments.length} increments.`);
  let result: ConsolidationTestResult;
  try {
    result = storableResult(analyzeConsolidationTest(input));
  } catch (error) {
    if (error instanceof RangeError) throw analysisRejected(error.message);
    throw error;
  }
  await report(0.85, 'Saving the result.');
  const hash = inputsHash(input);
  return dataSource.transaction(async (manager) => {
    const test = await lockTest(manager, orgId, testId);
    if (!test) throw new NotFoundError('test');
    if (test.latestUploadId !== before.latestUploadId) throw readingsChanged();
    const repo = manager.getRepository(AnalysisEntity);
    const analysis = await repo.save(
      repo.create({
        organisationId: orgId,
        testId,
        geoCoreVersion: result.geoCoreVersion,
        inputsHash: hash,
        picks: test.picks,
        pickReason: test.pickReason,
        uploadId: test.latestUploadId,
        result,
        warningCount: result.warnings.length,
        readingCount: input.increments.reduce((sum, increment) => sum + increment.readings.length, 0),
        requestedById,
      }),
    );
    await moveTest(manager, test, 'analysed', requestedById, {
      changes: { latestAnalysisId: analysis.id },
      details: { analysisId: analysis.id, inputsHash: hash, geoCoreVersion: result.geoCoreVersion, warnings: result.warnings.length },
    });
    return analysis;
  });
}

export function toAnalysisSummary(row: AnalysisEntity): AnalysisSummary {
  return {
    id: row.id,
    createdAt: row.createdAt.toISOString(),
    geoCoreVersion: row.geoCoreVersion,
    inputsHash: row.inputsHash,
    warningCount: row.warningCount,
    keyParameters: keyParametersFrom(row.result),
  };
}

export function toAnalysis(row: AnalysisEntity): Analysis {
  return {
    id: row.id,
    testId: row.testId,
    createdAt: row.createdAt.toISOString(),
    geoCoreVersion: row.geoCoreVersion,
    inputsHash: row.inputsHash,
    picks: row.picks,
    pickReason: row.pickReason,
    uploadId: row.uploadId,
    warningCount: row.warningCount,
    result: row.result,
  };
}

/** The test's current analysis (of its current readings and picks); 404 when the viewer may not open the test. */
export async function currentAnalysis(viewer: Viewer, testId: string): Promise<AnalysisEntity> {
  await assertTestOpenable(viewer, testId);
  const orgId = viewer.orgId;
  const test = await findTestOrThrow(orgId, testId);
  if (!test.latestAnalysisId) throw noAnalysis();
  const row = await dataSource.getRepository(AnalysisEntity).findOneBy({ organisationId: orgId, id: test.latestAnalysisId });
  if (!row) throw noAnalysis();
  return row;
}
