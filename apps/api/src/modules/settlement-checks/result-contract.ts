import type { SettlementCheckResult, UniformLoadSettlementResult } from '@porestack/geo-core';
import type { CheckRunResult, SettlementCheckResult as StoredCheckResult, UniformLoadSettlementResult as StoredUniformResult } from '@porestack/types';

/**
 * The settlement-check result has one contract from geo-core to the screen: the zod schemas in
 * @porestack/types (SettlementCheckResultSchema, UniformLoadSettlementResultSchema) must
 * describe exactly geo-core's result types, readonly aside. If geo-core renames, adds or drops
 * a field, one of the assertions below stops `tsc`, here, before the browser ever sees it.
 */
type DeepReadonly<T> = T extends readonly (infer U)[] ? T extends readonly [infer A, infer B] ? readonly [DeepReadonly<A>, DeepReadonly<B>] : ReadonlyArray<DeepReadonly<U>> : T extends object ? { readonly [K in keyof T]: DeepReadonly<T[K]> } : T;
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
type Assert<T extends true> = T;

export type FootingCheckContract = Assert<Same<DeepReadonly<SettlementCheckResult>, DeepReadonly<StoredCheckResult>>>;
export type UniformLoadContract = Assert<Same<DeepReadonly<UniformLoadSettlementResult>, DeepReadonly<StoredUniformResult>>>;

/** geo-core's result in the stored shape; the contract above makes the conversion a type-level identity. */
export function asStoredResult(run: { kind: 'footings'; check: SettlementCheckResult } | { kind: 'uniform'; check: UniformLoadSettlementResult }): CheckRunResult {
  return run as unknown as CheckRunResult;
}
