import { characteristicValues, SETTLEMENT_UNFAVOURABLE_SIDE } from '@porestack/geo-core';
import { SET_PARAMETERS, type ParameterStatistics, type SetMember, type SetParameter } from '@porestack/types';
import type { DesignVersion } from '../design-records/design-records.service.js';

/** The side of each parameter that makes settlement worse, and why (geo-core's SETTLEMENT_UNFAVOURABLE_SIDE). */
const SIDES: Record<SetParameter, { side: 'lower' | 'upper'; reason: string; scale: 'linear' | 'log' }> = {
  e0: { side: SETTLEMENT_UNFAVOURABLE_SIDE.e0, reason: 'lower: H/(1 + e0) is larger, so the same Cc settles more', scale: 'linear' },
  cc: { side: SETTLEMENT_UNFAVOURABLE_SIDE.cc, reason: 'upper: a steeper virgin line settles more', scale: 'linear' },
  cr: { side: SETTLEMENT_UNFAVOURABLE_SIDE.cs, reason: 'upper: a steeper recompression line settles more', scale: 'linear' },
  cs: { side: SETTLEMENT_UNFAVOURABLE_SIDE.cs, reason: 'upper: a steeper swelling line settles more', scale: 'linear' },
  ocr: { side: SETTLEMENT_UNFAVOURABLE_SIDE.preconsolidationKpa, reason: 'lower: more of the load acts on the virgin line', scale: 'linear' },
  cvM2PerYr: {
    side: SETTLEMENT_UNFAVOURABLE_SIDE.cv,
    reason: 'lower: settlement takes longer (the upper side governs only where fast settlement matters, e.g. drag on piles)',
    scale: 'log',
  },
  cAlpha: { side: SETTLEMENT_UNFAVOURABLE_SIDE.cAlpha, reason: 'upper: more creep over the design life', scale: 'linear' },
};

export function setMember(v: DesignVersion): SetMember {
  return {
    recordId: v.recordId,
    versionId: v.versionId,
    version: v.version,
    newerVersion: v.currentVersion > v.version ? v.currentVersion : null,
    testReference: v.testReference,
    boreholeName: v.boreholeName,
    sampleReference: v.sampleReference,
    depthM: v.depthM,
    values: { e0: v.e0, cc: v.cc, cr: v.cr, cs: v.cs, ocr: v.ocr, cvM2PerYr: v.cvMinM2PerYr, cAlpha: v.cAlpha, preconsolidationKpa: v.preconsolidationKpa },
  };
}

/**
 * n, mean, standard deviation, COV, the one-sided 95 % Student-t bounds on the mean and
 * Schneider's values for each parameter over the members that have it (geo-core's
 * characteristicValues; cv on a log scale). A parameter no member has gets count 0.
 */
export function setStatistics(members: readonly SetMember[]): ParameterStatistics[] {
  return SET_PARAMETERS.map((parameter): ParameterStatistics => {
    const { side, reason, scale } = SIDES[parameter];
    const values = members.map((m) => m.values[parameter]).filter((v): v is number => v !== null && Number.isFinite(v) && (scale === 'linear' || v > 0));
    const empty = {
      parameter,
      count: values.length,
      scale,
      mean: null,
      standardDeviation: null,
      coefficientOfVariation: null,
      meanLowerBound95: null,
      meanUpperBound95: null,
      schneiderLower: null,
      schneiderUpper: null,
      unfavourableSide: side,
      unfavourableReason: reason,
      characteristicStudentT: null,
      characteristicSchneider: null,
    };
    if (values.length === 0) return { ...empty, warnings: ['No member of the set has this parameter.'] };
    const stats = characteristicValues({ values, scale, unfavourableSide: side });
    return {
      ...empty,
      mean: stats.mean,
      standardDeviation: stats.standardDeviation,
      coefficientOfVariation: stats.coefficientOfVariation,
      meanLowerBound95: stats.meanLowerBound95,
      meanUpperBound95: stats.meanUpperBound95,
      schneiderLower: stats.schneiderLower,
      schneiderUpper: stats.schneiderUpper,
      characteristicStudentT: stats.characteristicStudentT,
      characteristicSchneider: stats.characteristicSchneider,
      warnings: [...stats.warnings],
    };
  });
}
