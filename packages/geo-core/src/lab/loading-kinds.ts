/** Where an increment sits on the stress path. */
export type LoadingKind = 'loading' | 'unloading' | 'reloading';

/**
 * Classify each increment of a stress path: `loading` when it takes the
 * specimen to a new maximum stress (first loading and the virgin line beyond
 * an unload–reload loop), `unloading` when the stress drops from the previous
 * increment, `reloading` when it rises (or holds) below or at an earlier
 * maximum. The test starts from zero stress.
 *
 * @param stressesKpa applied stresses in test order, kPa.
 * @returns one kind per increment.
 * @example loadingKinds([25, 50, 25, 50, 100]) // ['loading', 'loading', 'unloading', 'reloading', 'loading']
 */
export function loadingKinds(stressesKpa: readonly number[]): LoadingKind[] {
  let maximum = 0;
  let previous = 0;
  return stressesKpa.map((stress) => {
    const kind: LoadingKind = stress > maximum ? 'loading' : stress < previous ? 'unloading' : 'reloading';
    maximum = Math.max(maximum, stress);
    previous = stress;
    return kind;
  });
}
