/*
 * Compile-time check that ConsolidationTestResultSchema is geo-core's ConsolidationTestResult.
 *
 * Why here: the contract's own package should refuse to build when geo-core's result moves, so
 * the check sits beside the schema. The dependency allows it: geo-core imports nothing from the
 * workspace, so packages/types → geo-core makes no cycle, and the import is type-only (geo-core
 * is a devDependency and a project reference of this package), so nothing of geo-core reaches
 * the JavaScript or the published declarations of @porestack/types — the exported aliases below
 * are `true` once checked. The lint allows packages/types to import geo-core with `import type`
 * only.
 *
 * Each nested type has its own line, so a failure points at the part that changed.
 */
import type {
  AppliedPick,
  CasagrandeIncrementResult,
  CasagrandePreconsolidationConstruction,
  CompressionIndexFit,
  ConsolidationIncrementResult,
  ConsolidationTestResult,
  ConsolidationWarning,
  PachecoSilvaPreconsolidationConstruction,
  RecompressionIndexFit,
  TaylorIncrementResult,
} from '@porestack/geo-core';
import type { z } from 'zod';
import type { Assert, MatchesSource } from '../type-contract.js';
import type {
  AppliedPickSchema,
  CasagrandeIncrementResultSchema,
  CasagrandePreconsolidationConstructionSchema,
  CompressionIndexFitSchema,
  ConsolidationIncrementResultSchema,
  ConsolidationTestResultSchema,
  ConsolidationWarningSchema,
  PachecoSilvaPreconsolidationConstructionSchema,
  RecompressionIndexFitSchema,
  TaylorIncrementResultSchema,
} from './consolidation-result.js';

export type TaylorIncrementResultChecked = Assert<MatchesSource<z.infer<typeof TaylorIncrementResultSchema>, TaylorIncrementResult>>;
export type CasagrandeIncrementResultChecked = Assert<MatchesSource<z.infer<typeof CasagrandeIncrementResultSchema>, CasagrandeIncrementResult>>;
export type ConsolidationIncrementResultChecked = Assert<MatchesSource<z.infer<typeof ConsolidationIncrementResultSchema>, ConsolidationIncrementResult>>;
export type CompressionIndexFitChecked = Assert<MatchesSource<z.infer<typeof CompressionIndexFitSchema>, CompressionIndexFit>>;
export type RecompressionIndexFitChecked = Assert<MatchesSource<z.infer<typeof RecompressionIndexFitSchema>, RecompressionIndexFit>>;
export type CasagrandePreconsolidationChecked = Assert<MatchesSource<z.infer<typeof CasagrandePreconsolidationConstructionSchema>, CasagrandePreconsolidationConstruction>>;
export type PachecoSilvaPreconsolidationChecked = Assert<MatchesSource<z.infer<typeof PachecoSilvaPreconsolidationConstructionSchema>, PachecoSilvaPreconsolidationConstruction>>;
export type AppliedPickChecked = Assert<MatchesSource<z.infer<typeof AppliedPickSchema>, AppliedPick>>;
export type ConsolidationWarningChecked = Assert<MatchesSource<z.infer<typeof ConsolidationWarningSchema>, ConsolidationWarning>>;
export type ConsolidationTestResultChecked = Assert<MatchesSource<z.infer<typeof ConsolidationTestResultSchema>, ConsolidationTestResult>>;
