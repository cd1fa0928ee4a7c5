import { cvAtStressRange, cvPointsFromTestResult, type ConsolidationTestResult } from '@porestack/geo-core';
import type { GroundModelContent } from '@porestack/types';
import { dataSource } from '../../data-source.js';
import type { FieldIssue } from '../../errors/domain-error.js';
import type { DesignVersion } from '../design-records/design-records.service.js';
import { effectiveStressAt } from './soil-profile-from-content.js';

/**
 * For each record-sourced layer whose cv is to be taken at the design stress range: geo-core's
 * cvAtStressRange over the approved test's first-loading increments (Taylor's cv, else
 * Casagrande's), between σ′v0 at the layer's mid-depth and the final stress the designer gives.
 * The value and how it was had are written into the layer; what stops it is returned by field.
 */
export async function cvAtDesignRange(orgId: string, content: GroundModelContent, versions: ReadonlyMap<string, DesignVersion>): Promise<FieldIssue[]> {
  const issues: FieldIssue[] = [];
  for (const [index, layer] of content.layers.entries()) {
    const p = layer.parameters;
    const source = layer.source;
    if (!p || source?.kind !== 'record' || p.cvM2PerYr.cvBasis !== 'design-range' || p.cvM2PerYr.origin === 'hand') continue;
    const label = `Layer ${index + 1} (${layer.name})`;
    const finalKpa = p.cvM2PerYr.cvFinalStressKpa;
    const initialKpa = effectiveStressAt(content, (layer.topDepthM + layer.bottomDepthM) / 2);
    if (finalKpa === null || !(finalKpa > initialKpa)) {
      issues.push({
        path: `layers.${index}.parameters.cvFinalStressKpa`,
        message: `${label}: cv at the design stress range needs the effective stress the layer ends at under the load, above its σ′v0 of ${initialKpa.toFixed(0)} kPa at mid-depth. Enter it, or take the lowest cv of the test.`,
      });
      continue;
    }
    const version = versions.get(source.versionId);
    const rows = version ? ((await dataSource.query('SELECT result FROM analyses WHERE organisation_id = $1 AND id = $2', [orgId, version.analysisId])) as Array<{ result: ConsolidationTestResult }>) : [];
    const increments = rows[0]?.result.increments ?? [];
    const points = cvPointsFromTestResult(increments, 'taylor');
    const usable = points.length > 0 ? points : cvPointsFromTestResult(increments, 'casagrande');
    if (usable.length === 0) {
      issues.push({ path: `layers.${index}.parameters.cvM2PerYr`, message: `${label}: the approved test has no cv on its first-loading increments, so no cv at the design stress range can be had. Take the lowest cv, or enter one by hand.` });
      continue;
    }
    const cv = cvAtStressRange({ points: usable, initialEffectiveStressKpa: initialKpa, finalEffectiveStressKpa: finalKpa });
    p.cvM2PerYr.value = cv.cvM2PerYr;
    p.cvM2PerYr.basis = `at the design stress range ${initialKpa.toFixed(0)}–${finalKpa.toFixed(0)} kPa (${points.length > 0 ? 'Taylor' : 'Casagrande'} cv of the test's increments; ${cv.convention})${cv.heldBeyondTestedStresses ? '; held beyond the tested stresses' : ''}`;
  }
  return issues;
}
