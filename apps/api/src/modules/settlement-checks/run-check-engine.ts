import { runSettlementCheck, settlementUnderUniformLoad, type Footing, type SettlementCheckOptions } from '@porestack/geo-core';
import type { CheckOptions, CheckRunResult, FootingRow, GroundModelContent } from '@porestack/types';
import { DomainError } from '../../errors/domain-error.js';
import { soilProfileFromContent } from '../ground-models/soil-profile-from-content.js';
import type { FootingAsRun } from './check-revision.entity.js';
import { asStoredResult } from './result-contract.js';

/** A run's result as geo-core gave it (every footing's sublayers and time curve included). */
export interface EngineRun {
  result: CheckRunResult;
  footingsAsRun: FootingAsRun[];
  warnings: string[];
  durationMs: number;
}

/** geo-core's options for a check's options. */
export function engineOptions(options: CheckOptions): SettlementCheckOptions {
  return {
    ...(options.sublayerMode === 'count' ? { sublayerCount: options.sublayerCount } : { sublayerMaxThicknessM: options.sublayerMaxThicknessM }),
    includeNeighbours: options.includeNeighbours,
    stressMethod: options.stressMethod,
    designLifeYears: options.designLifeYears,
    evaluationPoints: options.evaluationPoints,
    applyFoxDepthFactor: options.applyFoxDepthFactor,
    designAngularDistortion: 1 / options.angularDistortionDenominator,
    ...(options.totalSettlementLimitMm === null ? {} : { totalSettlementLimitM: options.totalSettlementLimitMm / 1000 }),
    ...(options.pairMaxDistanceM === null ? {} : { pairMaxDistanceM: options.pairMaxDistanceM }),
  };
}

/**
 * The footings as geo-core takes them: shape and plan, a load (kN; kN/m for a strip) or a
 * pressure (kPa), net or gross — geo-core nets a gross pressure against σv0 at founding level.
 */
export function engineFootings(footings: readonly FootingRow[]): Footing[] {
  return footings.map((row): Footing => {
    const load = row.loadKind === 'pressure' ? { pressureKpa: row.load } : row.shape === 'strip' ? { loadKnPerM: row.load } : { loadKn: row.load };
    const plan = row.shape === 'rectangle' ? { shape: 'rectangle' as const, widthM: row.widthM, lengthM: row.lengthM ?? row.widthM } : { shape: row.shape, widthM: row.widthM };
    return { id: row.id, xM: row.xM, yM: row.yM, depthM: row.depthM, pressureBasis: row.loadBasis, ...load, ...plan } as Footing;
  });
}

/**
 * Runs geo-core on a ground model revision's content with a footing schedule and options: the
 * footing check (runSettlementCheck) or, for a uniform load, settlementUnderUniformLoad. The
 * inputs have been checked (checkInputIssues); a RangeError still thrown by geo-core is turned
 * into a message that names it, and nothing is saved.
 */
export function runCheckEngine(content: GroundModelContent, footings: readonly FootingRow[], options: CheckOptions): EngineRun {
  const started = performance.now();
  const { profile, warnings: profileWarnings } = soilProfileFromContent(content, { immediate: options.immediate, secondary: options.secondary });
  try {
    if (options.loading === 'uniform') {
      const check = settlementUnderUniformLoad({
        profile,
        stressIncreaseKpa: options.uniformStressIncreaseKpa ?? 0,
        options: {
          ...(options.sublayerMode === 'count' ? { sublayerCount: options.sublayerCount } : { sublayerMaxThicknessM: options.sublayerMaxThicknessM }),
          designLifeYears: options.designLifeYears,
        },
      });
      return { result: asStoredResult({ kind: 'uniform', check }), footingsAsRun: [], warnings: [...profileWarnings, ...check.warnings], durationMs: performance.now() - started };
    }
    const check = runSettlementCheck({ profile, footings: engineFootings(footings), options: engineOptions(options) });
    return {
      result: asStoredResult({ kind: 'footings', check }),
      footingsAsRun: check.footings.map((f) => ({ id: f.id, shape: f.shape, grossPressureKpa: f.grossPressureKpa ?? f.pressureKpa, overburdenKpa: f.overburdenRemovedKpa ?? 0, netPressureKpa: f.pressureKpa })),
      warnings: [...profileWarnings, ...check.warnings],
      durationMs: performance.now() - started,
    };
  } catch (error) {
    if (error instanceof RangeError) {
      throw new DomainError('validation_failed', `The settlement engine refused the input: ${error.message}. Check the ground model and the schedule against this, then run again.`);
    }
    throw error;
  }
}
