import { runSettlementCheck, settlementUnderUniformLoad, verticalStressAtDepth, type Footing, type SettlementCheckOptions } from '@porestack/geo-core';
import type { CheckOptions, CheckRunResult, FootingRow, GroundModelContent } from '@porestack/types';
import { DomainError } from '../../errors/domain-error.js';
import { soilProfileFromContent } from '../ground-models/soil-profile-from-content.js';
import type { FootingAsRun } from './check-revision.entity.js';
import { planAreaM2, planSides } from './footing-geometry.js';
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
 * The footings as geo-core takes them: plan sides, and the net pressure — a gross pressure less
 * the total overburden σv at founding level (the weight of the soil removed).
 */
export function engineFootings(footings: readonly FootingRow[], profile: ReturnType<typeof soilProfileFromContent>['profile']): { footings: Footing[]; asRun: FootingAsRun[]; warnings: string[] } {
  const warnings: string[] = [];
  const asRun: FootingAsRun[] = [];
  const engine = footings.map((row, index): Footing => {
    const { alongXM, alongYM } = planSides(row);
    const grossPressureKpa = row.loadKind === 'pressure' ? row.load : row.load / planAreaM2(row);
    const overburdenKpa = row.loadBasis === 'gross' ? verticalStressAtDepth(profile, row.depthM).totalStressKpa : 0;
    let netPressureKpa = grossPressureKpa - overburdenKpa;
    if (netPressureKpa < 0) {
      warnings.push(
        `Row ${index + 1} (${row.id}): the gross pressure (${grossPressureKpa.toFixed(1)} kPa) is less than the weight of soil removed (${overburdenKpa.toFixed(1)} kPa), so the net pressure is taken as zero: the footing is fully compensated and adds no settlement of its own.`,
      );
      netPressureKpa = 0;
    }
    asRun.push({ id: row.id, shape: row.shape, grossPressureKpa, overburdenKpa, netPressureKpa });
    return { id: row.id, xM: row.xM, yM: row.yM, widthM: alongXM, lengthM: alongYM, depthM: row.depthM, pressureKpa: netPressureKpa };
  });
  return { footings: engine, asRun, warnings };
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
    const prepared = engineFootings(footings, profile);
    const check = runSettlementCheck({ profile, footings: prepared.footings, options: engineOptions(options) });
    return {
      result: asStoredResult({ kind: 'footings', check }),
      footingsAsRun: prepared.asRun,
      warnings: [...profileWarnings, ...prepared.warnings, ...check.warnings],
      durationMs: performance.now() - started,
    };
  } catch (error) {
    if (error instanceof RangeError) {
      throw new DomainError('validation_failed', `The settlement engine refused the input: ${error.message}. Check the ground model and the schedule against this, then run again.`);
    }
    throw error;
  }
}
