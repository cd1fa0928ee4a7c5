import type { ConsolidationIncrementInput } from '@porestack/geo-core';
import { loadIncrements as loadStoredIncrements } from '../readings/readings.service.js';

/** The test's stored readings as geo-core increments (owned by the readings module). */
export function loadIncrements(orgId: string, testId: string): Promise<ConsolidationIncrementInput[]> {
  return loadStoredIncrements(orgId, testId) as Promise<ConsolidationIncrementInput[]>;
}
