/** Which side of a parameter's spread makes a settlement check worse. */
export type UnfavourableSide = 'lower' | 'upper';

/**
 * The unfavourable side of each consolidation and stiffness parameter for a
 * settlement check — the side a cautious characteristic value is taken on
 * (EN 1997-1 §2.4.5.2: "a cautious estimate of the value affecting the
 * occurrence of the limit state").
 *
 * - cc, cs, mv, cAlpha: upper — a stiffer-looking sample understates settlement.
 * - cv: lower for the time rate — slower consolidation keeps settlement coming
 *   later (a higher cv governs only where fast settlement is the concern, e.g.
 *   drag on piles or a neighbour settling first; choose the side per check).
 * - e0: lower — H/(1 + e0) is larger, so settlement larger for the same Cc.
 * - preconsolidationKpa: lower — more of the load acts on the virgin line.
 * - elasticModulusKpa: lower — immediate settlement is inversely proportional to E.
 */
export const SETTLEMENT_UNFAVOURABLE_SIDE = {
  cc: 'upper',
  cs: 'upper',
  mv: 'upper',
  cAlpha: 'upper',
  cv: 'lower',
  e0: 'lower',
  preconsolidationKpa: 'lower',
  elasticModulusKpa: 'lower',
} as const satisfies Record<string, UnfavourableSide>;
